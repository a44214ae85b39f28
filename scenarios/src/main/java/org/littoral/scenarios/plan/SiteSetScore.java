package org.littoral.scenarios.plan;

import java.util.List;

/**
 * Scores of one candidate site set under one cadence option. Every score is monotone in the site set
 * (adding a site never lowers it) and, for nested flight schedules, in the cadence.
 *
 * @param distancesKm inland distances of the sites
 * @param cadence cadence option name
 * @param anyCaptured probability that at least one site captures the passage
 * @param expectedSitesCaptured mean number of sites that capture it
 * @param speedResolved probability that at least one pair of sites captures it and gives a propagation speed
 *                      within tolerance of the model's
 * @param bayAndSeaSeparated probability that at least one site separates the bay breeze from the sea breeze
 *                           (NaN when the coast has no bay)
 * @param flightsPerDay flights per day summed over the sites
 * @param score the ranking score (see {@link PlanScorer#rankingScore})
 */
public record SiteSetScore(List<Double> distancesKm, String cadence, Proportion anyCaptured, double expectedSitesCaptured,
                           Proportion speedResolved, Proportion bayAndSeaSeparated, int flightsPerDay, double score) {
}
