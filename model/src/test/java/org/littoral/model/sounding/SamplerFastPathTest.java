package org.littoral.model.sounding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.FieldSampling;
import org.littoral.model.field.Snapshot;
import org.littoral.model.field.SnapshotsOnly;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.linear.HeatingSpec;
import org.littoral.model.linear.LinearBreezeModel;
import org.littoral.model.linear.LinearConfig;

/**
 * Sites on a linear solution are sampled through its column fast path (FieldSampling.columnAt); the
 * profiles must equal, to round-off, the ones sampled from whole snapshots.
 */
class SamplerFastPathTest {


    private static final Coast COAST = new Coast(40, 0, 0, 270, 180);

    private static BreezeSolution solution() {
        LinearConfig c = new LinearConfig(COAST, SurfaceMap.simpleCoast(293, 0.2, 1, 0.1), HorizontalGrid.centred(256, 2000),
                VerticalGrid.uniform(41, 4000), 0.01, 1e-5, 1e-5, -2.0, true, 4,
                new HeatingSpec.ClassicShape(3e-4, 5e3, 800, 6.0), 300, 0.01, -3e-6, 101325);
        return LinearBreezeModel.solve(c);
    }

    @Test
    void oneLevelSynthesesEqualThatLevelOfTheSnapshot() {
        BreezeSolution sol = solution();
        FieldSampling f = (FieldSampling) sol;
        double t = 13.5 * 3600;
        Snapshot s = sol.snapshotAt(t);
        int nx = sol.xM().length;
        for (int level : new int[] {0, 3, 20}) {
            double[] u = f.crossShoreWindAtLevel(level, t);
            double[] v = f.alongshoreWindAtLevel(level, t);
            for (int i = 0; i < nx; i++) {
                assertEquals(s.uMPerS()[level * nx + i], u[i], 1e-9);
                assertEquals(s.vMPerS()[level * nx + i], v[i], 1e-9);
            }
        }
        double vmax = 0;
        for (double x : s.vMPerS()) {
            vmax = Math.max(vmax, Math.abs(x));
        }
        assertTrue(vmax > 0.05, "Coriolis turns the breeze: v must be non-zero, got " + vmax);
    }

    @Test
    void fastPathProfilesEqualSnapshotProfiles() {
        Coast coast = COAST;
        BreezeSolution sol = solution();
        assertTrue(sol instanceof FieldSampling);
        List<VirtualSite> sites = List.of(new VirtualSite("A", 3.3e3), new VirtualSite("B", 25e3));
        FlightSchedule f = FlightSchedule.regular(60, 9, 15);
        SoundingSpec spec = SoundingSpec.of(600, "t");
        List<Profile> fast = new SoundingSampler(sol, coast, sites, f, spec, true).sampleAll();
        List<Profile> slow = new SoundingSampler(new SnapshotsOnly(sol), coast, sites, f, spec, true).sampleAll();
        assertEquals(slow.size(), fast.size());
        double maxDiff = 0;
        for (int i = 0; i < fast.size(); i++) {
            double[][] a = {fast.get(i).temperatureK(), fast.get(i).windEastMPerS(), fast.get(i).windNorthMPerS(),
                fast.get(i).mixingRatioKgPerKg(), fast.get(i).pressurePa()};
            double[][] b = {slow.get(i).temperatureK(), slow.get(i).windEastMPerS(), slow.get(i).windNorthMPerS(),
                slow.get(i).mixingRatioKgPerKg(), slow.get(i).pressurePa()};
            for (int v = 0; v < a.length; v++) {
                for (int k = 0; k < a[v].length; k++) {
                    maxDiff = Math.max(maxDiff, Math.abs(a[v][k] - b[v][k]) / Math.max(1.0, Math.abs(b[v][k])));
                }
            }
        }
        assertTrue(maxDiff < 1e-9, "largest relative difference " + maxDiff);
        double spread = 0;
        for (Profile p : fast) {
            spread = Math.max(spread, Math.abs(p.windEastMPerS()[20] - fast.get(0).windEastMPerS()[20]));
        }
        assertTrue(spread > 0.1, "the profiles must actually vary (breeze present): " + spread);
    }
}
