package org.littoral.validation.thermo;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.thermo.Hydrostatic;
import org.littoral.model.thermo.StandardAtmosphere;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/**
 * Thermodynamic formulas against Bolton (1980) and its worked example, against IAPWS-IF97 saturation
 * pressure computed live by python3-iapws, and against the US Standard Atmosphere 1976.
 */
public final class ThermodynamicsSuite implements ValidationSuite {
    private static final String BOLTON = "Bolton (1980), Mon. Wea. Rev. 108, 1046-1053";
    private static final String IAPWS = "IAPWS-IF97 saturation pressure, live from Debian python3-iapws (iapws.iapws97._PSat_T)";
    private static final String USSA = "US Standard Atmosphere 1976 (NOAA/NASA/USAF), tables";

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
        workedExample(out);
        iapws(out);
        mixingRatioAndThetaV(out);
        standardAtmosphere(out);
        return out;
    }

    private static void workedExample(List<ValidationCase> out) {
        // Worked example p = 850 hPa, T = 20 C, Td = 18 C; expected values recomputed from Bolton eq. 10 (docs/references.md section 6, C).
        double p = 85000.0;
        double t = 293.15;
        double td = 291.15;
        double e = Thermo.saturationVapourPressurePa(td);
        out.add(ValidationCase.absolute("thermo.bolton-e-at-Td18C", BOLTON + ", eq. 10", "vapour pressure e(Td = 18 C), hPa",
                20.626, 0.005, e / 100.0, false, "worked example p = 850 hPa, T = 20 C, Td = 18 C"));
        double r = Thermo.mixingRatio(e, p);
        out.add(ValidationCase.absolute("thermo.mixing-ratio-example", "r = eps e / (p - e), eps = 0.622 (common practice)",
                "mixing ratio, g/kg", 15.469, 0.005, r * 1000.0, false, "same worked example"));
        out.add(ValidationCase.absolute("thermo.bolton-TL-example", BOLTON + ", eq. 15 (LCL temperature from T and Td)",
                "T_L, K", 290.678, 0.01, Thermo.lclTemperatureK(t, td), false,
                "same worked example; the T, Td form is often quoted as eq. 22 from memory, but it is eq. 15 and eq. 22 is "
                        + "the T, RH form (NCAR Command Language documentation of its Bolton functions)"));
        out.add(ValidationCase.absolute("thermo.bolton-theta-e-eq39", BOLTON + ", eq. 39",
                "theta-e, K", 353.92, 0.05, Thermo.equivalentPotentialTemperatureK(t, p, r), false,
                "same worked example; Davies-Jones (2009) gives 353.911 K"));
        out.add(ValidationCase.absolute("thermo.bolton-theta-e-eq43", BOLTON + ", eq. 43",
                "theta-e, K", 353.89, 0.05, Thermo.equivalentPotentialTemperatureEq43K(t, p, r), false,
                "same worked example"));
        out.add(ValidationCase.absolute("thermo.theta-e-vs-davies-jones", "Davies-Jones (2009), Mon. Wea. Rev. 137, 3137-3148",
                "theta-e (Bolton eq. 39), K", 353.911, 0.02, Thermo.equivalentPotentialTemperatureK(t, p, r), false,
                "Davies-Jones's formula is accurate to 0.015 K; tolerance 0.02 K"));
    }

    private static void iapws(List<ValidationCase> out) {
        double[] celsius = {0, 10, 20, 30};
        double[] tk = new double[celsius.length + 1];
        for (int i = 0; i < celsius.length; i++) {
            tk[i] = celsius[i] + Thermo.T0;
        }
        tk[celsius.length] = 300.0;
        IapwsReference.Result ref = IapwsReference.saturationPressuresPa(tk);
        for (int i = 0; i < celsius.length; i++) {
            String id = "thermo.iapws-es-" + (int) celsius[i] + "C";
            String quantity = "e_s over water at " + (int) celsius[i] + " C, hPa (Bolton eq. 10 vs IAPWS)";
            if (!ref.ok()) {
                out.add(new ValidationCase(id, IAPWS, quantity, "IAPWS value", "+/- 0.1 %", "not computed", false, false,
                        ref.failure()));
                continue;
            }
            out.add(ValidationCase.relative(id, IAPWS + "; tolerance is Bolton's stated 0.1 % (-30 to 35 C)", quantity,
                    ref.pressuresPa()[i] / 100.0, 0.001, Thermo.saturationVapourPressurePa(tk[i]) / 100.0, false,
                    "reference computed live at validation time"));
        }
        String id = "thermo.iapws-psat-300K";
        if (!ref.ok()) {
            out.add(new ValidationCase(id, IAPWS, "IAPWS p_s(300 K), Pa", "3536.59", "+/- 0.01", "not computed", false, false,
                    ref.failure()));
        } else {
            out.add(ValidationCase.absolute(id, "IAPWS-IF97 (1997/2007), check value of the region-4 saturation-pressure equation",
                    "p_s(300 K) from python3-iapws, Pa", 3536.59, 0.01, ref.pressuresPa()[celsius.length], false,
                    "checks that the live reference is the IAPWS equation itself"));
        }
    }

    private static void mixingRatioAndThetaV(List<ValidationCase> out) {
        // docs/references.md section 6 (C): 14.90 g/kg uses the IAPWS e_s = 23.3921 hPa; Bolton's e_s is 0.1 % lower, which
        // lowers r by about 0.016 g/kg; tolerance 0.02 g/kg.
        out.add(ValidationCase.absolute("thermo.saturated-r-20C-1000hPa", "r = eps e_s / (p - e_s), eps = 0.622; e_s Bolton eq. 10",
                "saturation mixing ratio at 20 C, 1000 hPa, g/kg", 14.90, 0.02,
                Thermo.saturationMixingRatio(293.15, 100000.0) * 1000.0, false,
                "expected value computed with the IAPWS e_s; Bolton is 0.1 % lower"));
        out.add(ValidationCase.absolute("thermo.theta-v-example", "theta_v = theta (1 + r/eps) / (1 + r) (Wallace & Hobbs 2006, ch. 3)",
                "theta_v for theta = 300 K, r = 0.010, K", 301.805, 0.001, Thermo.virtualPotentialTemperatureK(300.0, 0.010),
                false, "exact: 300 (1 + 0.010/0.622) / 1.010 = 301.8051"));
    }

    private static void standardAtmosphere(List<ValidationCase> out) {
        double[] z = {0, 500, 1000};
        double[] t = {288.15, 284.90, 281.65};
        double[] p = {101325.0, 95460.8, 89874.6};
        double[] rho = {1.2250, 1.1673, 1.11164};
        double[] rhoTol = {5e-5, 5e-5, 5e-6};
        for (int i = 0; i < z.length; i++) {
            String at = (int) z[i] + "m";
            out.add(ValidationCase.absolute("thermo.ussa76-T-" + at, USSA, "temperature at " + at + " geopotential, K",
                    t[i], 0.005, StandardAtmosphere.temperatureK(z[i]), false, null));
            out.add(ValidationCase.absolute("thermo.ussa76-p-" + at, USSA, "pressure at " + at + ", Pa",
                    p[i], 0.1, StandardAtmosphere.pressurePa(z[i]), false, null));
            out.add(ValidationCase.absolute("thermo.ussa76-rho-" + at, USSA, "density at " + at + ", kg/m3",
                    rho[i], rhoTol[i], StandardAtmosphere.densityKgM3(z[i]), false, null));
        }
        // Hydrostatic integration through the standard temperature profile should reproduce its pressures.
        int n = 101;
        double[] zz = new double[n];
        double[] tt = new double[n];
        for (int k = 0; k < n; k++) {
            zz[k] = 10.0 * k;
            tt[k] = StandardAtmosphere.temperatureK(zz[k]);
        }
        double[] pp = Hydrostatic.pressureProfilePa(zz, tt, new double[n], StandardAtmosphere.SEA_LEVEL_PRESSURE_PA);
        out.add(ValidationCase.absolute("thermo.hydrostatic-vs-ussa76-1000m", USSA + "; hypsometric integration, 10 m layers",
                "pressure at 1000 m, Pa", 89874.6, 2.0, pp[n - 1], false,
                "R_d = 287.04 (Bolton) against the standard's 287.053 J/(kg K) accounts for about 0.5 Pa"));
    }
}
