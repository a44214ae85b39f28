package org.littoral.model.nonlinear;

/**
 * The face fluxes shared by the advection schemes, and the row copies their loops read.
 *
 * <p>On JDK 17 a loop compiles to vector instructions only when every array access in it uses one index
 * expression, so the advection loops read each neighbour from a shifted row copy ({@link #shift}).
 */
final class AdvectionFluxes {
    private AdvectionFluxes() {
    }

    private static final double ONE_TWELFTH = 1.0 / 12.0;

    /** Third-order upwind-biased flux, Wicker &amp; Skamarock (2002) eq. 4: 4th-order centred plus |a| dissipation. */
    static double flux3(double a, double fm1, double f0, double fp1, double fp2) {
        // one multiplication by 1/12 rather than two divisions by 12: a round-off-level difference that
        // lets the flux loops run as vector instructions
        return (a * (7.0 * (f0 + fp1) - (fm1 + fp2)) + Math.abs(a) * ((fp2 - fm1) - 3.0 * (fp1 - f0))) * ONE_TWELFTH;
    }

    /** Monotonised-central limited slope (van Leer 1977): minmod(2 dm, 2 dp, (dm + dp) / 2). */
    static double mcSlope(double dm, double dp) {
        if (dm * dp <= 0.0) {
            return 0.0;
        }
        double c = 0.5 * (dm + dp);
        double lim = 2.0 * Math.min(Math.abs(dm), Math.abs(dp));
        return Math.abs(c) < lim ? c : Math.copySign(lim, c);
    }

    /** out[i] = s[o + (i + d) mod nx] for one row of nx values and a shift |d| &lt;= 2. */
    static void shift(double[] s, int o, int d, double[] out, int nx) {
        if (d > 0) {
            System.arraycopy(s, o + d, out, 0, nx - d);
            System.arraycopy(s, o, out, nx - d, d);
        } else {
            int e = -d;
            System.arraycopy(s, o + nx - e, out, 0, e);
            System.arraycopy(s, o, out, e, nx - e);
        }
    }
}
