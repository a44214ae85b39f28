package org.littoral.model.linear;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.grid.HorizontalGrid;

/**
 * The land fraction M(x) of a surface map on the periodic cross-shore domain, smoothed at every
 * shoreline by the arctan step of classic linear theory, (1/pi)(pi/2 + arctan((x - x_s)/x0)), and
 * represented by its Fourier coefficients M(x) = Sum_k Mhat_k exp(i k x).
 *
 * <p>The arctan step is the Heaviside step convolved with the Cauchy density (x0/pi)/(x^2 + x0^2),
 * whose Fourier transform is exp(-|k| x0). So the exact coefficients of the smoothed periodic mask
 * are those of the sharp land indicator on [x_first, x_first + L) times exp(-|k| x0): a sum of arctan
 * steps (a bay behind a barrier is just more steps) with their periodic images included. Where the
 * two ends of the domain differ (sea on one side, land on the other) the periodic repetition puts a
 * second, equally smoothed shoreline at the domain edge; the domain must be wide enough for it not
 * to matter near the coast. The Nyquist coefficient is set to zero.
 */
final class ShoreMask {
    final double[] re;
    final double[] im;

    private ShoreMask(double[] re, double[] im) {
        this.re = re;
        this.im = im;
    }

    /** Wavenumber (rad/m) of FFT index kk on an nx-point periodic grid of length lengthM. */
    static double wavenumber(int kk, int nx, double lengthM) {
        int j = kk < nx / 2 ? kk : kk - nx;
        return 2.0 * Math.PI * j / lengthM;
    }

    /**
     * Coefficients of the smoothed land mask. Allocates two nx arrays.
     *
     * @param halfWidthM x0 of the arctan step (same at every shoreline)
     */
    static ShoreMask of(SurfaceMap surface, HorizontalGrid grid, double halfWidthM, String halfWidthKey) {
        if (!(halfWidthM >= 0.5 * grid.dxM())) {
            throw new IllegalArgumentException(halfWidthKey + " = " + halfWidthM + " m is below half the grid spacing ("
                    + 0.5 * grid.dxM() + " m): the smoothed coast would ring; widen the transition or refine the grid");
        }
        int nx = grid.nx();
        double lx = grid.lengthM();
        double a = grid.x0M();
        double b = a + lx;
        List<double[]> land = new ArrayList<>();
        for (SurfaceSegment s : surface.segments()) {
            if (!s.isLand()) {
                continue;
            }
            double from = Math.max(a, s.fromM());
            double to = Math.min(b, s.toM());
            if (to > from) {
                land.add(new double[] {from, to});
            }
        }
        for (double xs : surface.shorelinesM()) {
            if (xs <= a || xs >= grid.lastM()) {
                throw new IllegalArgumentException("shoreline at " + xs / 1000.0 + " km lies outside the periodic domain "
                        + a / 1000.0 + " to " + grid.lastM() / 1000.0 + " km; widen the x grid");
            }
        }
        double[] re = new double[nx];
        double[] im = new double[nx];
        for (int kk = 0; kk < nx; kk++) {
            if (kk == nx / 2) {
                continue;
            }
            double k = wavenumber(kk, nx, lx);
            double sr = 0;
            double si = 0;
            for (double[] seg : land) {
                if (kk == 0) {
                    sr += (seg[1] - seg[0]) / lx;
                } else {
                    // (1/L) Integral_from^to exp(-i k x) dx = (exp(-i k from) - exp(-i k to)) / (i k L)
                    double cr = Math.cos(k * seg[0]) - Math.cos(k * seg[1]);
                    double ci = -Math.sin(k * seg[0]) + Math.sin(k * seg[1]);
                    // divide by i k L: (cr + i ci) / (i kL) = (ci - i cr) / (kL)
                    sr += ci / (k * lx);
                    si += -cr / (k * lx);
                }
            }
            double smooth = Math.exp(-Math.abs(k) * halfWidthM);
            re[kk] = sr * smooth;
            im[kk] = si * smooth;
        }
        return new ShoreMask(re, im);
    }

    /** M at arbitrary x by direct summation of the series (for checks; O(nx)). */
    double valueAt(double xM, int nx, double lengthM) {
        double s = 0;
        for (int kk = 0; kk < nx; kk++) {
            double k = wavenumber(kk, nx, lengthM);
            s += re[kk] * Math.cos(k * xM) - im[kk] * Math.sin(k * xM);
        }
        return s;
    }
}
