package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.util.Arrays;
import java.util.Locale;

/**
 * Fan chart: percentile bands of an ensemble against a coordinate, e.g. front arrival time against
 * inland distance: 5-95 % (light), 25-75 % (darker) and the median line, with optional observed
 * points. Percentiles are Hyndman and Fan (1996) definition 7 over the members that have a value
 * (NaN: e.g. the front never arrived); the note says how many members that was where it was fewest.
 *
 * <pre>
 * FanChartFigure f = FanChartFigure.builder()
 *     .title("Front arrival by distance inland")
 *     .x(distanceKm, "Distance inland", "km").y("Arrival (local time)", "h")
 *     .samples(arrivalH)             // [nx][members]
 *     .observed("Observed 2026-07-14", siteKm, observedH)
 *     .build();
 * </pre>
 */
public final class FanChartFigure extends Figure {
    private final LineFigure inner;
    private final double[][] percentiles; // rows: p05, p25, p50, p75, p95

    private FanChartFigure(Builder b, LineFigure inner, double[][] percentiles) {
        super(b.lb.width, b.lb.height, b.lb.title);
        this.inner = inner;
        this.percentiles = percentiles;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Percentile curves drawn: rows 5, 25, 50, 75, 95 % (copies). */
    public double[][] percentiles() {
        double[][] c = new double[percentiles.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = percentiles[i].clone();
        }
        return c;
    }

    @Override
    protected void paint(Graphics2D g) {
        inner.paint(g);
    }

    /** Builder: 900 x 600 px; give either samples or the five percentile curves. */
    public static final class Builder {
        private final LineFigure.Builder lb = LineFigure.builder();
        private double[] x;
        private double[][] samples;
        private double[][] given;
        private Color color = new Color(0x2b6cb0);
        private int observedCount;
        private String note;

        private Builder() {
        }

        public Builder size(int widthPx, int heightPx) {
            lb.size(widthPx, heightPx);
            return this;
        }

        public Builder title(String t) {
            lb.title(t);
            return this;
        }

        public Builder x(double[] coords, String label, String unit) {
            x = coords.clone();
            lb.x(label, unit);
            return this;
        }

        public Builder y(String label, String unit) {
            lb.y(label, unit);
            return this;
        }

        public Builder yRange(double min, double max) {
            lb.yRange(min, max);
            return this;
        }

        /** Ensemble values at each x: {@code samples[i]} are the members' values at x[i] (NaN allowed). */
        public Builder samples(double[][] perX) {
            samples = new double[perX.length][];
            for (int i = 0; i < perX.length; i++) {
                samples[i] = perX[i].clone();
            }
            return this;
        }

        /** Precomputed 5, 25, 50, 75 and 95 % curves. */
        public Builder percentiles(double[] p05, double[] p25, double[] p50, double[] p75, double[] p95) {
            given = new double[][] {p05.clone(), p25.clone(), p50.clone(), p75.clone(), p95.clone()};
            return this;
        }

        public Builder color(Color c) {
            color = c;
            return this;
        }

        /** Observed values as points (and optional half-width error bars, may be null). */
        public Builder observed(String name, double[] ox, double[] oy, double[] yHalfWidth) {
            Marker m = observedCount++ == 0 ? Marker.DIAMOND : Marker.cycle(observedCount);
            lb.series(Series.of(name, ox, oy).noLine().marker(m).color(Theme.qualitative(observedCount))
                    .errorBars(null, yHalfWidth));
            return this;
        }

        /** Observed values drawn with a chosen marker and colour (e.g. flagged points highlighted). */
        public Builder observed(String name, double[] ox, double[] oy, double[] yHalfWidth, Marker marker, Color c) {
            observedCount++;
            lb.series(Series.of(name, ox, oy).noLine().marker(marker).color(c).errorBars(null, yHalfWidth));
            return this;
        }

        public Builder observed(String name, double[] ox, double[] oy) {
            return observed(name, ox, oy, null);
        }

        public Builder event(double at, String label) {
            lb.event(at, label);
            return this;
        }

        public Builder note(String text) {
            note = text;
            return this;
        }

        public FanChartFigure build() {
            if (x == null) {
                throw new IllegalArgumentException("fan chart needs x coordinates");
            }
            double[][] p;
            String autoNote = null;
            if (given != null) {
                p = given;
            } else if (samples != null) {
                if (samples.length != x.length) {
                    throw new IllegalArgumentException("fan chart has " + x.length + " x but samples for "
                            + samples.length);
                }
                double[] probs = {0.05, 0.25, 0.5, 0.75, 0.95};
                p = new double[5][x.length];
                int fewest = Integer.MAX_VALUE;
                int fewestAt = -1;
                int members = 0;
                for (int i = 0; i < x.length; i++) {
                    double[] s = Arrays.stream(samples[i]).filter(Double::isFinite).sorted().toArray();
                    members = Math.max(members, samples[i].length);
                    if (s.length < fewest) {
                        fewest = s.length;
                        fewestAt = i;
                    }
                    for (int j = 0; j < 5; j++) {
                        p[j][i] = s.length >= 2 ? BoxStats.quantileSorted(s, probs[j]) : Double.NaN;
                    }
                }
                if (fewestAt >= 0 && fewest < samples[fewestAt].length) {
                    autoNote = String.format(Locale.ROOT,
                            "Percentiles over members with a value; fewest: %d of %d at x = %s.", fewest,
                            samples[fewestAt].length, NiceTicks.format(x[fewestAt], 1));
                }
            } else {
                throw new IllegalArgumentException("fan chart needs samples or percentiles");
            }
            for (double[] row : p) {
                if (row.length != x.length) {
                    throw new IllegalArgumentException("each percentile curve must have " + x.length + " values");
                }
            }
            Color outer = mix(color, Color.WHITE, 0.78);
            Color innerC = mix(color, Color.WHITE, 0.5);
            LineFigure.Builder b = lb;
            // bands go first so points and events sit on top
            b.bands.add(0, new LineFigure.Band("5\u201395 %", x, p[0], p[4], outer, 1.0));
            b.bands.add(1, new LineFigure.Band("25\u201375 %", x, p[1], p[3], innerC, 1.0));
            b.series.add(0, Series.of("Median", x, p[2]).color(color.darker()).width(2.4f));
            String n = note != null ? note : autoNote;
            if (n != null) {
                b.note(n);
            }
            return new FanChartFigure(this, b.build(), p);
        }

        private static Color mix(Color a, Color b, double t) {
            return new Color((int) Math.round(a.getRed() * (1 - t) + b.getRed() * t),
                    (int) Math.round(a.getGreen() * (1 - t) + b.getGreen() * t),
                    (int) Math.round(a.getBlue() * (1 - t) + b.getBlue() * t));
        }
    }
}
