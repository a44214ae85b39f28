package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.field.Snapshot;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

/**
 * The balanced morning (issue 11, item 2): a run starts from the steady boundary layer of each surface
 * (EkmanBalance), so without heating the wind at 10-300 m stays within 10 % and 10 deg of where it started
 * for 12 h. That holds from the first minute over the sea and the land away from the coast (30-90 km either
 * side). Within 30 km of the coast air crossing it must first adjust to the new surface (an internal boundary
 * layer, a real two-dimensional effect the one-column balance leaves out; runs therefore start 2 h before
 * sunrise): there the same holds from 2 h after the start.
 */
class BalancedStartTest {
    static final double SPEED = 8.0;

    static NonlinearConfig config(double fromDeg, NonlinearConfig.InitialWind start) {
        // sea to the west (bearing land to sea 270): from 270 is onshore, from 90 offshore, 0 and 180 shore-parallel
        Coast coast = new Coast(40.0, 0.0, 0.0, 270.0, 172);
        return NonlinearConfig.builder(coast, SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1), HorizontalGrid.centred(120, 2000.0),
                        VerticalGrid.stretched(31, 5000.0, 20.0))
                .forcing(new Forcing.None()).geostrophicWind(SPEED, fromDeg).solarHours(3, 15).outputIntervalS(1800)
                .initialWind(start).build();
    }

    /**
     * Largest relative speed change and largest turn (deg) at 10-300 m between the snapshot fromH after the start
     * and every later one, in the columns fromKm..toKm away from the coast.
     */
    static double[] worstDeparture(NonlinearSolution s, double fromH, double fromKm, double toKm) {
        double[] t = s.storedTimesSec();
        Snapshot first = s.snapshotAt(t[0] + fromH * 3600.0);
        double[] z = s.zM();
        double[] x = s.xM();
        double worstSpeed = 0;
        double worstTurn = 0;
        for (double tn : t) {
            if (tn < t[0] + fromH * 3600.0) {
                continue;
            }
            Snapshot now = s.snapshotAt(tn);
            for (int k = 0; k < z.length; k++) {
                if (z[k] < 10 || z[k] > 300) {
                    continue;
                }
                for (int i = 0; i < x.length; i++) {
                    // (the 20 km sponges of this 240 km domain begin 100 km from the coast)
                    if (Math.abs(x[i]) < fromKm * 1000 || Math.abs(x[i]) > toKm * 1000) {
                        continue;
                    }
                    int n = k * now.nx() + i;
                    double u0 = first.uMPerS()[n];
                    double v0 = first.vMPerS()[n];
                    double u1 = now.uMPerS()[n];
                    double v1 = now.vMPerS()[n];
                    double s0 = Math.hypot(u0, v0);
                    worstSpeed = Math.max(worstSpeed, Math.abs(Math.hypot(u1, v1) - s0) / s0);
                    double turn = Math.toDegrees(Math.atan2(u0 * v1 - v0 * u1, u0 * u1 + v0 * v1));
                    worstTurn = Math.max(worstTurn, Math.abs(turn));
                }
            }
        }
        return new double[] {worstSpeed, worstTurn};
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 90.0, 180.0, 270.0})
    void withoutHeatingTheWindAt10To300MStaysWithin10PercentAnd10DegreesFor12Hours(double fromDeg) {
        NonlinearSolution s = NonlinearModel.run(config(fromDeg, NonlinearConfig.InitialWind.BALANCED_BOUNDARY_LAYER));
        double[] far = worstDeparture(s, 0.0, 30, 90);
        assertTrue(far[0] <= 0.10, "30-90 km from the coast the speed changed by " + 100 * far[0] + " % (wind from " + fromDeg + " deg)");
        assertTrue(far[1] <= 10.0, "30-90 km from the coast the wind turned by " + far[1] + " deg (wind from " + fromDeg + " deg)");
        double near = worstDeparture(s, 2.0, 0, 30)[0];
        double nearTurn = worstDeparture(s, 2.0, 0, 30)[1];
        assertTrue(near <= 0.10, "near the coast the speed changed by " + 100 * near + " % after 2 h (wind from " + fromDeg + " deg)");
        assertTrue(nearTurn <= 10.0, "near the coast the wind turned by " + nearTurn + " deg after 2 h (wind from " + fromDeg + " deg)");
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 270.0})
    void startingFromTheGeostrophicWindInsteadIsFarFromBalance(double fromDeg) {
        // the check above can fail: the old start (geostrophic at every level) spins down and oscillates
        double[] d = worstDeparture(NonlinearModel.run(config(fromDeg, NonlinearConfig.InitialWind.GEOSTROPHIC)), 0.0, 30, 90);
        assertTrue(d[0] > 0.10 || d[1] > 10.0, "departure " + 100 * d[0] + " %, " + d[1] + " deg");
    }
}
