package org.littoral.validation.surface;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.mixedlayer.SlabMixedLayer;
import org.littoral.model.mixedlayer.ZeroOrderJump;
import org.littoral.model.surface.BulkFlux;
import org.littoral.model.surface.BulkFluxes;
import org.littoral.model.surface.ClearSkyRadiation;
import org.littoral.model.surface.EnergyBalance;
import org.littoral.model.surface.NetRadiation;
import org.littoral.model.surface.SolarGeometry;
import org.littoral.model.surface.SurfaceEnergyBalance;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/**
 * Surface and mixed-layer slab physics against published formulas and values (docs/references.md sections 5
 * and 10). Formulas that docs/references.md marks as recalled are flagged "from memory" even where the check
 * value is computed from them.
 */
public final class SurfacePhysicsSuite implements ValidationSuite {
    private static final String KC = "Kasten & Czeplak (1980), Solar Energy 24, 177-189";
    private static final String TENNEKES = "Tennekes (1973), J. Atmos. Sci. 30, 558-567; Carson (1973), QJRMS 99, 450-467";

    @Override
    public String title() {
        return "Surface and mixed-layer physics";
    }

    @Override
    public int order() {
        return 30;
    }

    @Override
    public List<ValidationCase> run() {
        List<ValidationCase> out = new ArrayList<>();
        solar(out);
        radiation(out);
        mixedLayer(out);
        partition(out);
        return out;
    }

    private static void solar(List<ValidationCase> out) {
        out.add(ValidationCase.absolute("surface.noon-elevation-45N", "sin(alpha) = sin(lat) sin(decl) + cos(lat) cos(decl) cos(h)"
                        + " (spherical astronomy); docs/references.md section 10 (C)",
                "solar elevation at noon, lat 45, decl 23.44 deg, deg", 68.44, 0.01,
                SolarGeometry.elevationDeg(45.0, Math.toRadians(23.44), 12.0), false, "90 - 45 + 23.44"));
        out.add(ValidationCase.absolute("surface.cooper-declination-solstice", "Cooper (1969), Solar Energy 12, 333-346",
                "declination on day 172 (21 June), deg", 23.44, 0.05,
                Math.toDegrees(SolarGeometry.declinationRad(172)), true,
                "expected: obliquity of the ecliptic (astronomical almanac); Cooper's formula from memory"));
        double len = SolarGeometry.sunsetSolarHours(45, Math.toRadians(23.44)) - SolarGeometry.sunriseSolarHours(45, Math.toRadians(23.44));
        out.add(ValidationCase.absolute("surface.day-length-45N-solstice", "cos(omega_s) = -tan(lat) tan(decl) (geometric sun centre)",
                "day length at 45 N, decl 23.44 deg, h", 15.425, 0.002, len, false,
                "2 acos(-tan 45 tan 23.44) / 15 = 15.425 h; almanac day length is ~15.6 h with refraction and the solar disc"));
    }

    private static void radiation(List<ValidationCase> out) {
        double[] elev = {30, 45, 60};
        double[] expected = {425.0, 613.5, 758.1};
        for (int i = 0; i < elev.length; i++) {
            out.add(ValidationCase.absolute("surface.kasten-czeplak-" + (int) elev[i] + "deg", KC + "; docs/references.md section 10 (C)",
                    "clear-sky global irradiance at " + (int) elev[i] + " deg elevation, W/m2", expected[i], 0.05,
                    ClearSkyRadiation.clearSkyGlobalWm2(Math.sin(Math.toRadians(elev[i]))), true,
                    "910 sin(alpha) - 30; the fit itself is from memory"));
        }
        out.add(ValidationCase.absolute("surface.kasten-czeplak-overcast", KC, "cloud factor at 8 oktas", 0.25, 1e-9,
                ClearSkyRadiation.cloudFactor(1.0), true, "1 - 0.75 (8/8)^3.4; from memory"));
        // Holtslag & van Ulden (1983) at a clear midsummer noon, 45 N, grass (albedo 0.23), 25 C.
        double k = ClearSkyRadiation.clearSkyGlobalWm2(Math.sin(Math.toRadians(68.44)));
        double q = NetRadiation.netRadiationWm2(0.23, k, 298.15, 0.0);
        out.add(new ValidationCase("surface.net-radiation-noon", "Holtslag & van Ulden (1983), J. Climate Appl. Meteor. 22, 517-529; "
                + "range: Oke (1987), Boundary Layer Climates, ch. 2", "clear midsummer noon Q* over grass, W/m2",
                "400 to 650", "range", ValidationCase.fmt(q), q > 400 && q < 650, true,
                "constants c1, c2, c3 and the typical range are from memory"));
    }

    private static void mixedLayer(List<ValidationCase> out) {
        // docs/references.md section 5 (C): H = 200 W/m2 for 6 h, rho c_p = 1206 J/m3/K, gamma = 5 K/km, h0 = 0.
        double rhoCp = 1206.0;
        double gamma = 0.005;
        double flux = 200.0 / rhoCp;
        double duration = 6 * 3600.0;
        for (double a : new double[] {0.0, 0.2}) {
            String tag = a == 0 ? "encroachment" : "A0.2";
            double published = a == 0 ? 1197.0 : 1416.0;
            double closed = ZeroOrderJump.depthM(0.0, a, gamma, flux * duration);
            out.add(ValidationCase.relative("mixedlayer.closed-form-" + tag, TENNEKES + "; docs/references.md section 5 (C)",
                    "h after 6 h of 200 W/m2, m", published, 0.01, closed, a > 0,
                    a > 0 ? "A = 0.2 is from memory" : "h = sqrt(2 Integral(H dt) / (rho c_p gamma))"));
            SlabMixedLayer ml = new SlabMixedLayer(a, gamma, 0.0);
            // Independent integration of dh/dt = (1 + 2A) F / (gamma h) by classical RK4, from a small h0.
            double h0 = 10.0;
            double h = h0;
            double dt = 60.0;
            for (double t = 0; t < duration - 1e-9; t += dt) {
                double k1 = ml.growthRateMPerS(h, flux);
                double k2 = ml.growthRateMPerS(h + 0.5 * dt * k1, flux);
                double k3 = ml.growthRateMPerS(h + 0.5 * dt * k2, flux);
                double k4 = ml.growthRateMPerS(h + dt * k3, flux);
                h += dt * (k1 + 2 * k2 + 2 * k3 + k4) / 6.0;
            }
            out.add(ValidationCase.relative("mixedlayer.ode-rk4-" + tag, TENNEKES + "; closed form with h0 = 10 m",
                    "h by RK4 of the growth ODE (60 s steps), m", ZeroOrderJump.depthM(h0, a, gamma, flux * duration), 0.01, h,
                    a > 0, "checks the growth rate that the nonlinear model steps with"));
        }
        // The model's step under a time-varying (half-sine, 12 h) flux against the closed form of its integral.
        SlabMixedLayer ml = new SlabMixedLayer(0.2, gamma, 100.0);
        double day = 12 * 3600.0;
        double peak = 300.0 / rhoCp;
        double dt = 600.0;
        double h = 100.0;
        for (double t = 0; t < day - 1e-9; t += dt) {
            h = ml.step(h, peak * Math.sin(Math.PI * (t + 0.5 * dt) / day), dt);
        }
        out.add(ValidationCase.relative("mixedlayer.step-varying-flux", TENNEKES,
                "h at sunset after a half-sine day, peak 300 W/m2, A = 0.2, 10 min steps, m",
                ZeroOrderJump.depthM(100.0, 0.2, gamma, peak * 2.0 * day / Math.PI), 0.01, h, true,
                "closed form needs only Integral(H dt) = 2 H_max T / pi; A = 0.2 from memory"));
    }

    private static void partition(List<ValidationCase> out) {
        // Bowen partition: conservation and ratio (Oke 1987 grassland beta ~0.5).
        EnergyBalance grass = SurfaceEnergyBalance.partitionByBowenRatio(500.0, 50.0, 0.5);
        out.add(ValidationCase.absolute("surface.bowen-grassland-H-share", "Oke (1987), Boundary Layer Climates: H = beta/(1 + beta) (Q* - G)",
                "H for Q* - G = 450 W/m2, beta = 0.5, W/m2", 150.0, 1e-9, grass.sensibleHeatFluxWm2(), true,
                "Bowen ratio of grassland from memory"));
        out.add(ValidationCase.absolute("surface.bowen-energy-closure", "surface energy balance Q* = G + H + LE",
                "Q* - G - H - LE, W/m2", 0.0, 1e-9,
                grass.netRadiationWm2() - grass.groundHeatFluxWm2() - grass.sensibleHeatFluxWm2() - grass.latentHeatFluxWm2(),
                false, null));
        EnergyBalance wet = SurfaceEnergyBalance.partitionByPriestleyTaylor(450.0, 45.0, 1.0, 293.15, 101325.0);
        double beta = wet.bowenRatio();
        out.add(new ValidationCase("surface.priestley-taylor-wet-grass-bowen",
                "de Bruin & Holtslag (1982), J. Appl. Meteor. 21, 1610-1621; range: Oke (1987)",
                "Bowen ratio of well-watered grass (alpha = 1, 20 C)", "0.1 to 0.6", "range", ValidationCase.fmt(beta),
                beta > 0.1 && beta < 0.6, true, "alpha, beta' = 20 W/m2 and Oke's ranges are from memory"));
        // Tropical ocean: SST 28 C, air 1 K cooler at 10 m, RH 80 %, 7 m/s.
        double p = 101325.0;
        double tAir = 300.15;
        double theta = Thermo.potentialTemperatureK(tAir, p);
        double r = Thermo.mixingRatioFromRelativeHumidity(0.8, tAir, p);
        BulkFluxes f = BulkFlux.overWater(7.0, 10.0, 301.15, theta, r, p, 2e-4);
        double b = f.sensibleHeatFluxWm2() / f.latentHeatFluxWm2();
        out.add(new ValidationCase("surface.bulk-tropical-ocean-bowen",
                "Large & Pond (1982), J. Phys. Oceanogr. 12, 464-482 coefficients; range: Oke (1987) tropical ocean ~0.1",
                "Bowen ratio over a 28 C sea, air 27 C, RH 80 %, 7 m/s", "0.03 to 0.2", "range", ValidationCase.fmt(b),
                b > 0.03 && b < 0.2, true, "LE = " + ValidationCase.fmt(f.latentHeatFluxWm2()) + " W/m2; coefficients and range from memory"));
    }
}
