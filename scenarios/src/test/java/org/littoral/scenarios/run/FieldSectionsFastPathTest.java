package org.littoral.scenarios.run;

import org.littoral.model.front.FieldSections;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.SnapshotsOnly;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;

/** The time-distance and site sections of a linear run are the same by the fast path and by whole snapshots. */
class FieldSectionsFastPathTest {


    @Test
    void fastAndSnapshotSectionsAgreeToRoundOff() {
        Scenario sc = ScenarioFile.parse("classic-45N", BuiltinScenarios.text("classic-45N"), false);
        BreezeSolution sol = Solver.standard().solve(sc);
        double[] hours = {9, 12, 15.5};
        double[] sites = {3e3, 20e3};
        FieldSections a = FieldSections.evaluate(sol, sc.coast(), hours, 200.0, sites, true, null);
        FieldSections b = FieldSections.evaluate(new SnapshotsOnly(sol), sc.coast(), hours, 200.0, sites, true, null);
        for (int n = 0; n < hours.length; n++) {
            for (int i = 0; i < a.xM.length; i++) {
                assertEquals(b.nearSurfaceTotalU[n][i], a.nearSurfaceTotalU[n][i], 1e-9);
                assertEquals(b.nearSurfaceTotalV[n][i], a.nearSurfaceTotalV[n][i], 1e-9);
                assertEquals(b.nearSurfaceU[n][i], a.nearSurfaceU[n][i], 1e-9);
            }
            for (int s = 0; s < sites.length; s++) {
                for (int k = 0; k < a.zM.length; k++) {
                    assertEquals(b.siteU[s][n][k], a.siteU[s][n][k], 1e-9);
                    assertEquals(b.siteV[s][n][k], a.siteV[s][n][k], 1e-9);
                    assertEquals(b.siteTheta[s][n][k], a.siteTheta[s][n][k], 1e-9);
                }
            }
        }
    }
}
