package org.littoral.validation.timing;

import java.util.ArrayList;
import java.util.List;
import org.littoral.scenarios.timing.DensityCurrent;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/** Density-current front speeds used by the timing checks, against Benjamin (1968) and Simpson & Britter (1980). */
public final class DensityCurrentSuite implements ValidationSuite {
    private static final String BENJAMIN = "Benjamin (1968), J. Fluid Mech. 31, 209-248";
    private static final String SB = "Simpson & Britter (1980), QJRMS 106, 485-500";

    @Override
    public String title() {
        return "Density-current front speed (timing checks)";
    }

    @Override
    public int order() {
        return 80;
    }

    /** Benjamin's Froude number U / sqrt(g' h) from the closed form, a = h/H (docs/references.md section 4, C). */
    private static double ratio(double a) {
        return Math.sqrt((2 - a) * (1 - a) / (1 + a));
    }

    @Override
    public List<ValidationCase> run() {
        List<ValidationCase> out = new ArrayList<>();
        double gp = 0.06;
        double bigH = 1000.0;
        out.add(ValidationCase.absolute("timing.benjamin-thin-current", BENJAMIN + ", energy-conserving current",
                "U / sqrt(g' h) as h/H -> 0 (h/H = 1e-6)", Math.sqrt(2.0), 1e-5,
                DensityCurrent.benjaminSpeedMPerS(gp, 1e-6 * bigH, bigH) / Math.sqrt(gp * 1e-6 * bigH), false,
                "expected sqrt(2); g' = 0.06 m/s2, H = 1000 m"));
        out.add(ValidationCase.absolute("timing.benjamin-quarter-depth", BENJAMIN, "U / sqrt(g' h) at h/H = 0.25",
                ratio(0.25), 1e-9, DensityCurrent.benjaminSpeedMPerS(gp, 250.0, bigH) / Math.sqrt(gp * 250.0), false,
                "expected computed from the formula: sqrt(1.75 x 0.75 / 1.25) = 1.0247"));
        out.add(ValidationCase.absolute("timing.benjamin-half-depth", BENJAMIN, "U / sqrt(g' h) at h/H = 0.5",
                1.0 / Math.sqrt(2.0), 1e-9, DensityCurrent.benjaminSpeedMPerS(gp, 500.0, bigH) / Math.sqrt(gp * 500.0), false,
                "expected 1/sqrt(2) (computed)"));
        out.add(ValidationCase.relative("timing.benjamin-lock-exchange", BENJAMIN + " (energy-conserving lock exchange; M)",
                "half-depth current speed vs 0.5 sqrt(g' H), m/s", 0.5 * Math.sqrt(gp * bigH), 1e-9,
                DensityCurrent.benjaminSpeedMPerS(gp, 500.0, bigH), true,
                "docs/references.md section 4: front speed ~0.5 sqrt(g' H) in the energy-conserving limit (from memory)"));
        double gpSea = DensityCurrent.reducedGravity(2.0, 300.0);
        double calm = 0.87 * Math.sqrt(gpSea * 500.0);
        out.add(ValidationCase.absolute("timing.simpson-britter-opposing-wind", SB + " (from memory)",
                "front speed, dtheta_v = 2 K, h = 500 m, opposing wind 3 m/s, m/s", calm - 0.59 * 3.0, 1e-9,
                DensityCurrent.simpsonBritterSpeedMPerS(gpSea, 500.0, -3.0, DensityCurrent.SB_FROUDE, DensityCurrent.SB_WIND),
                true, "U_f = 0.87 sqrt(g' h) - 0.59 U (0.86 / 0.62 also quoted)"));
        double[] range = DensityCurrent.plausibleSpeedRangeMPerS(2.0, 0.5, 300.0, 500.0, 150.0, 1200.0, -3.0, 0.4);
        boolean overlaps = range[0] <= DensityCurrent.TYPICAL_MAX_M_PER_S && range[0] >= 0.0
                && range[2] >= DensityCurrent.TYPICAL_MIN_M_PER_S;
        out.add(new ValidationCase("timing.typical-front-speed", "Simpson (1994), Sea Breeze and Local Winds, CUP (from memory)",
                "plausible range for a typical day (2 +/- 0.5 K, 500 +/- 150 m, 3 m/s offshore), m/s",
                "overlaps 1-5 m/s", "lower end inside 0-5 m/s",
                ValidationCase.fmt(range[0]) + " - " + ValidationCase.fmt(range[2]) + " (nominal " + ValidationCase.fmt(range[1]) + ")",
                overlaps && range[1] >= DensityCurrent.TYPICAL_MIN_M_PER_S && range[1] <= DensityCurrent.TYPICAL_MAX_M_PER_S,
                true, "nominal Simpson & Britter speed must fall in the typical 1-5 m/s; the range allows friction (x 0.4)"));
        return out;
    }
}
