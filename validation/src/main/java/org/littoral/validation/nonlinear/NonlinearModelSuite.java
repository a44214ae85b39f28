package org.littoral.validation.nonlinear;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.model.coast.Coast;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.nonlinear.CanonicalFlows;
import org.littoral.model.nonlinear.Forcing;
import org.littoral.model.nonlinear.InertialPeriod;
import org.littoral.model.nonlinear.NonlinearConfig;
import org.littoral.model.nonlinear.NonlinearModel;
import org.littoral.model.nonlinear.NonlinearSolution;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/**
 * The nonlinear breeze model against published results: lock exchange (Benjamin 1968), inertial
 * period and breeze hodograph sense (Haurwitz 1947), slab mixed-layer growth (Tennekes 1973) and the
 * ambient-flow behaviour of 2D studies (Arritt 1993; Crosman &amp; Horel 2010). Coarse grids throughout.
 */
public final class NonlinearModelSuite implements ValidationSuite {

    @Override
    public String title() {
        return "Nonlinear breeze model";
    }

    @Override
    public int order() {
        return 40;
    }

    @Override
    public List<ValidationCase> run() {
        List<ValidationCase> out = new ArrayList<>();
        lockExchange(out);
        inertial(out, 30.0);
        inertial(out, 45.0);
        hodograph(out);
        mixedLayer(out);
        ambientFlow(out);
        linearMode(out);
        return out;
    }

    private static void lockExchange(List<ValidationCase> out) {
        CanonicalFlows.LockExchange le = CanonicalFlows.lockExchange(1000.0, 1.0, 256, 100.0, 20, 1800.0);
        out.add(ValidationCase.relative("nonlinear.lock-exchange-froude", "Benjamin (1968), J. Fluid Mech. 31, 209-248",
                "full-depth lock exchange front speed / sqrt(g' H)", 0.5, 0.10, le.froudeNumber(), false,
                String.format(Locale.ROOT, "H = 1 km, 1 K contrast (sqrt(g'H) = %.2f m/s), 100 m x 50 m cells, free-slip, no mixing; "
                        + "front speed %.2f m/s fitted over 10-30 min; energy-conserving theory gives 0.5, laboratory "
                        + "heads ~0.7 sqrt(g'h) of their own depth (Britter & Simpson 1978)", le.referenceSpeedMPerS(),
                        le.frontSpeedMPerS())));
    }

    private static void inertial(List<ValidationCase> out, double lat) {
        Coast coast = new Coast(lat, 0.0, 0.0, 270.0, 172);
        double expectedH = 2 * Math.PI / Math.abs(coast.coriolisPerS()) / 3600.0; // 2 pi / f (C)
        NonlinearConfig c = NonlinearConfig.builder(coast, CanonicalFlows.allWater(293.15), HorizontalGrid.centred(8, 2000.0),
                        VerticalGrid.uniform(5, 2000.0))
                .forcing(new Forcing.None()).switches(new NonlinearConfig.Switches(true, false, false))
                .damping(new NonlinearConfig.Damping(0, 0, 0, 300, 0, 600)).solarHours(0, 2.3 * expectedH).outputIntervalS(300)
                .initialUPerturbation((x, z) -> 1.0).build();
        double period = InertialPeriod.measureHours(NonlinearModel.run(c), 0, 0);
        out.add(ValidationCase.relative("nonlinear.inertial-period-" + (int) lat + "deg",
                "2 pi / f, f = 2 Omega sin(lat) (docs/references.md section 7: 23.93 h at 30 deg, 16.92 h at 45 deg)",
                "inertial oscillation period, h", expectedH, 0.01, period, false,
                "uniform 1 m/s cross-shore perturbation, no friction; period from upward zero crossings of u"));
    }

    private static void hodograph(List<ValidationCase> out) {
        double[] north = CanonicalFlows.breezeHodographArea(45.0);
        double[] south = CanonicalFlows.breezeHodographArea(-45.0);
        String note = String.format(Locale.ROOT, "signed area of the lowest-layer (u', v') at the coast over day 2 of the classic "
                + "heating with Rayleigh friction 1/day: %.2f m2/s2 at 45 N, %.2f at 45 S (negative = clockwise); peak %.2f m/s",
                north[0], south[0], north[1]);
        boolean ok = north[0] < 0 && south[0] > 0 && north[1] > 0.5;
        out.add(new ValidationCase("nonlinear.hodograph-sense", "Haurwitz (1947), J. Meteor. 4, 1-8",
                "rotation sense of the breeze wind vector (NH / SH)", "clockwise / anticlockwise", "sign",
                (north[0] < 0 ? "clockwise" : "anticlockwise") + " / " + (south[0] > 0 ? "anticlockwise" : "clockwise"), ok, true,
                note));
    }

    private static void mixedLayer(List<ValidationCase> out) {
        double[] r = CanonicalFlows.heatedColumn(200.0, 0.005, 0.2, 12.0);
        out.add(ValidationCase.relative("nonlinear.mixed-layer-zoj", "Tennekes (1973), J. Atmos. Sci. 30, 558-567 (zero-order jump)",
                "slab mixed-layer depth at 12 solar h over uniform land, m", r[1], 0.05, r[0], true,
                String.format(Locale.ROOT, "half-sine 200 W/m2 peak from 6 h, gamma = 5 K/km, A = 0.2, h0 = 100 m; the resolved theta "
                        + "profile is well mixed (within 0.5 K) to %.0f m", r[2])));
    }

    private static void linearMode(List<ValidationCase> out) {
        double[] r = CanonicalFlows.linearModeComparison();
        String src = "LinearBreezeModel (Rotunno 1983 equations, spectral) with the same heating";
        String note = "nonlinear terms, mixing and drag off; classic heating Q0 = 2e-5 K/s, x0 = 10 km, H = 500 m; 45 N, "
                + "N = 0.01 1/s, friction = cooling = 1/(12 h); 4 km grid, day 3 of a run from rest";
        out.add(ValidationCase.relative("nonlinear.linear-mode-peak-u", src, "peak onshore u within 100 km of the coast, m/s",
                r[1], 0.10, r[0], false, note));
        out.add(ValidationCase.absolute("nonlinear.linear-mode-peak-time", src, "time of the peak, h after midnight",
                r[3], 0.5, r[2], false, note));
        boolean ok = r[4] >= 0.95;
        out.add(new ValidationCase("nonlinear.linear-mode-pattern", src, "pattern correlation of u at the peak (|x| < 150 km, z < 4 km)",
                ">= 0.95", "threshold", ValidationCase.fmt(r[4]), ok, false, note));
    }

    private static void ambientFlow(List<ValidationCase> out) {
        double t = 14 * 3600.0;
        double[] calm = CanonicalFlows.frontAt(CanonicalFlows.coarseSeaBreeze(40.0, 0.0, 270.0, 14.0), t, 150_000);
        double[] onshore = CanonicalFlows.frontAt(CanonicalFlows.coarseSeaBreeze(40.0, 5.0, 270.0, 14.0), t, 150_000);
        double[] offshore = CanonicalFlows.frontAt(CanonicalFlows.coarseSeaBreeze(40.0, 5.0, 90.0, 14.0), t, 150_000);
        double ratio = onshore[1] / calm[1];
        out.add(new ValidationCase("nonlinear.onshore-5ms-removes-front",
                "Arritt (1993), J. Appl. Meteor. 32, 116-125; Crosman & Horel (2010), BLM 137 (onshore >= 3-5 m/s removes the front)",
                "peak near-surface convergence at 14 h, onshore 5 m/s / calm", "< 0.3", "threshold", ValidationCase.fmt(ratio),
                ratio < 0.3, true, String.format(Locale.ROOT, "calm: %.2e 1/s at %.0f km; onshore 5 m/s: %.2e 1/s",
                        calm[1], calm[0] / 1000, onshore[1])));
        boolean forms = offshore[1] > 0.5 * calm[1];
        boolean nearer = offshore[0] < calm[0];
        out.add(new ValidationCase("nonlinear.offshore-5ms-front-near-coast",
                "Arritt (1993); Estoque (1962), J. Atmos. Sci. 19, 244-250 (front forms against offshore flow, stays near the coast)",
                "front against offshore 5 m/s at 14 h: forms (convergence > 0.5 calm) and lies nearer the coast than calm",
                "forms, nearer", "sign", (forms ? "forms" : "absent") + String.format(Locale.ROOT, ", %.0f km vs %.0f km calm",
                        offshore[0] / 1000, calm[0] / 1000), forms && nearer, true,
                String.format(Locale.ROOT, "convergence %.2e vs %.2e 1/s (calm); 2 km grid, prescribed 250 W/m2 land flux",
                        offshore[1], calm[1])));
    }
}
