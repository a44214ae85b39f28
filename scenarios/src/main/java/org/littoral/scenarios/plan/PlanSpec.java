package org.littoral.scenarios.plan;

import java.util.List;
import org.littoral.scenarios.sweep.SweepSpec;

/**
 * A site and cadence planning problem: an ensemble of plausible days (a sweep specification) and the
 * campaign's options and constraints.
 *
 * @param ensemble the base scenario and the uncertain inputs (the sweep machinery expands and runs it)
 * @param candidatesKm candidate inland distances, km
 * @param sitesPerSet how many sites the campaign can staff
 * @param cadences cadence options to compare
 * @param operatingStartH first launch, local clock hours
 * @param operatingEndH last launch, local clock hours
 * @param maxFlightsPerSite flights a team can fly per day at one site; options above it are infeasible there
 * @param ceilingM altitude ceiling of the profiles (the local aviation rules set the real limit)
 * @param criteria what counts as a captured passage
 * @param top how many recommendations to list
 * @param model which model runs the members: "scenario" (as the base scenario says), "linear" or "nonlinear"
 * @param pilotMembers members whose arrivals set the automatic dense windows
 */
public record PlanSpec(SweepSpec ensemble, double[] candidatesKm, int sitesPerSet, List<CadenceOption> cadences,
                       double operatingStartH, double operatingEndH, int maxFlightsPerSite, double ceilingM,
                       PlanCriteria criteria, int top, String model, int pilotMembers) {
}
