package org.littoral.scenarios.run;

import org.littoral.model.front.FieldSections;

import org.littoral.model.front.BreezeDiagnostics;

import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.scenarios.report.FieldFigure;
import org.littoral.scenarios.report.LineStyle;
import org.littoral.scenarios.report.Marker;
import org.littoral.scenarios.report.PngWriter;

/** Figures of a run (drawn with the report package's figure library). */
final class RunFigures {
    private RunFigures() {
    }

    /**
     * Cross-shore range worth plotting: where the near-surface breeze ever exceeds 5 % of its peak
     * magnitude inside the interior the diagnostics search, padded by 10 %, clamped to the domain.
     */
    static double[] plotRangeM(FieldSections fs) {
        int nx = fs.xM.length;
        double[] amp = new double[nx];
        double peak = 0;
        for (double[] row : fs.nearSurfaceU) {
            for (int i = 0; i < nx; i++) {
                if (fs.xM[i] < fs.interiorFromM || fs.xM[i] > fs.interiorToM) {
                    continue;
                }
                amp[i] = Math.max(amp[i], Math.abs(row[i]));
                peak = Math.max(peak, amp[i]);
            }
        }
        double lo = 0;
        double hi = 0;
        for (int i = 0; i < nx; i++) {
            if (amp[i] >= 0.05 * peak) {
                lo = Math.min(lo, fs.xM[i]);
                hi = Math.max(hi, fs.xM[i]);
            }
        }
        double pad = 0.1 * (hi - lo);
        return new double[] {Math.max(fs.xM[0], lo - pad), Math.min(fs.xM[nx - 1], hi + pad)};
    }

    /**
     * Writes the time-distance section of the near-surface breeze wind (with the onshore reach and, for a
     * nonlinear run, the front) and a time-height section of the breeze wind at each site.
     *
     * @return the files written
     */
    static List<Path> write(FieldSections fs, BreezeDiagnostics.Result d, List<String> siteNames, double[] siteXM, String scenario,
                            String model, Path outDir) throws IOException {
        List<Path> files = new ArrayList<>();
        double[] range = plotRangeM(fs);
        int i0 = 0;
        while (i0 < fs.xM.length - 1 && fs.xM[i0] < range[0]) {
            i0++;
        }
        int i1 = fs.xM.length - 1;
        while (i1 > i0 && fs.xM[i1] > range[1]) {
            i1--;
        }
        int nx = i1 - i0 + 1;
        int nt = fs.clockH.length;
        double[] xKm = new double[nx];
        for (int i = 0; i < nx; i++) {
            xKm[i] = fs.xM[i0 + i] / 1000.0;
        }
        double[][] u = new double[nt][nx];
        double amax = 0.5;
        for (int n = 0; n < nt; n++) {
            for (int i = 0; i < nx; i++) {
                u[n][i] = fs.nearSurfaceU[n][i0 + i];
                amax = Math.max(amax, Math.abs(u[n][i]));
            }
        }
        String note = "Idealised " + model + " model (not a forecast). u' = wind minus "
                + (fs.fronts ? "far-field reference" : "ambient wind") + ", onshore > 0; black line: u' = "
                + fmt(d.thresholdMPerS()) + " m/s.";
        FieldFigure.Builder b = FieldFigure.builder().size(1000, 640)
                .title(String.format(Locale.ROOT, "%s: near-surface (%s m) cross-shore breeze wind", scenario, fmt(fs.nearSurfaceM)))
                .x(xKm, "Distance inland", "km").y(fs.clockH.clone(), "Local time", "h").values(u)
                .colorBar("Breeze wind u'", "m/s").diverging().colorRange(-amax, amax)
                .contours(d.thresholdMPerS()).verticalLine(0.0, "coast").note(note);
        // not results: beyond the searched zone lie the far-field sponges and reference band (nonlinear) or the
        // periodic image of the coast (linear); grey them out
        double lo = xKm[0] - 0.5 * (xKm.length > 1 ? xKm[1] - xKm[0] : 1.0);
        double hi = xKm[nx - 1] + 0.5 * (xKm.length > 1 ? xKm[1] - xKm[0] : 1.0);
        if (fs.zone != null && fs.zone.fromM() / 1000.0 > lo) {
            b.greyOutX(lo, fs.zone.fromM() / 1000.0, fs.zone.seawardLimit());
        }
        if (fs.zone != null && fs.zone.toM() / 1000.0 < hi) {
            b.greyOutX(fs.zone.toM() / 1000.0, hi, fs.zone.landwardLimit());
        }
        for (int s = 0; s < siteXM.length; s++) {
            if (siteXM[s] >= range[0] && siteXM[s] <= range[1]) {
                b.verticalLine(siteXM[s] / 1000.0, siteNames.get(s));
            }
        }
        if (fs.fronts) {
            List<double[]> pts = new ArrayList<>();
            for (int n = 0; n < nt; n++) {
                if (!Double.isNaN(d.frontXM()[n]) && d.frontXM()[n] > 0) {
                    pts.add(new double[] {d.frontXM()[n] / 1000.0, fs.clockH[n]});
                }
            }
            if (pts.size() >= 2) {
                double[] px = new double[pts.size()];
                double[] py = new double[pts.size()];
                for (int k = 0; k < px.length; k++) {
                    px[k] = pts.get(k)[0];
                    py[k] = pts.get(k)[1];
                }
                b.polyline("front (docs/fronts.md)", px, py, new Color(0x1B7837), LineStyle.SOLID, Marker.CIRCLE);
            }
        }
        Path td = outDir.resolve("near_surface_breeze.png");
        PngWriter.write(b.build(), td);
        files.add(td);

        double[] zM = fs.zM;
        int nz = 0;
        double zTop = Math.min(zM[zM.length - 1], 3000.0);
        while (nz < zM.length && zM[nz] <= zTop) {
            nz++;
        }
        double[] z = java.util.Arrays.copyOf(zM, nz);
        for (int s = 0; s < siteXM.length; s++) {
            double[][] v = new double[nz][nt];
            double m = 0.5;
            for (int k = 0; k < nz; k++) {
                for (int n = 0; n < nt; n++) {
                    v[k][n] = fs.siteU[s][n][k];
                    m = Math.max(m, Math.abs(v[k][n]));
                }
            }
            FieldFigure f = FieldFigure.builder().size(1000, 560)
                    .title(String.format(Locale.ROOT, "%s: cross-shore breeze wind at %s (%s km inland)", scenario, siteNames.get(s),
                            fmt(siteXM[s] / 1000.0)))
                    .x(fs.clockH.clone(), "Local time", "h").y(z, "Height", "m").values(v)
                    .colorBar("Breeze wind u'", "m/s").diverging().colorRange(-m, m).contours(0.0)
                    .note("Idealised " + model + " model output (not a forecast). Onshore positive; bold line: u' = 0 (top of the "
                            + "onshore layer, start of the return flow).")
                    .build();
            Path p = outDir.resolve("site_" + safe(siteNames.get(s)) + "_breeze.png");
            PngWriter.write(f, p);
            files.add(p);
        }
        return files;
    }

    private static String safe(String name) {
        return org.littoral.scenarios.output.SafeNames.fileName(name);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : String.format(Locale.ROOT, "%.2f", v).replaceAll("0+$", "");
    }
}
