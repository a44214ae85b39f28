package org.littoral.validation.thermo;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/** Thermodynamic formulas against Bolton (1980) and its worked example. */
public final class ThermodynamicsSuite implements ValidationSuite {
    private static final String BOLTON = "Bolton (1980), Mon. Wea. Rev. 108, 1046-1053";

    @Override
    public String title() {
        return "Thermodynamics";
    }

    @Override
    public int order() {
        return 10;
    }

    @Override
    public List<ValidationCase> run() {
        List<ValidationCase> out = new ArrayList<>();
        // Worked example p = 850 hPa, T = 20 C, Td = 18 C; expected values recomputed from Bolton eq. 10.
        double p = 85000.0;
        double t = 293.15;
        double td = 291.15;
        double e = Thermo.saturationVapourPressurePa(td);
        out.add(ValidationCase.absolute("thermo.bolton-e-at-Td18C", BOLTON + ", eq. 10", "vapour pressure e(Td = 18 C), hPa",
                20.626, 0.005, e / 100.0, false, "worked example p = 850 hPa, T = 20 C, Td = 18 C"));
        double r = Thermo.mixingRatio(e, p);
        out.add(ValidationCase.absolute("thermo.mixing-ratio-example", "r = eps e / (p - e), eps = 0.622 (common practice)",
                "mixing ratio, g/kg", 15.469, 0.005, r * 1000.0, false, "same worked example"));
        out.add(ValidationCase.absolute("thermo.bolton-TL-example", BOLTON + ", LCL temperature from T and Td",
                "T_L, K", 290.678, 0.01, Thermo.lclTemperatureK(t, td), false, "same worked example"));
        out.add(ValidationCase.absolute("thermo.bolton-theta-e-eq39", BOLTON + ", eq. 39",
                "theta-e, K", 353.92, 0.05, Thermo.equivalentPotentialTemperatureK(t, p, r), false,
                "same worked example; Davies-Jones (2009) gives 353.911 K"));
        return out;
    }
}
