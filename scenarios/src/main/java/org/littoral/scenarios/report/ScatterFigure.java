package org.littoral.scenarios.report;

/**
 * Scatter plot: groups of points (each its own colour and marker), optional error bars and a 1:1
 * line for observed-versus-model panels. Both axes are rounded out to nice ticks.
 *
 * <pre>
 * ScatterFigure f = ScatterFigure.builder()
 *     .title("Front arrival: observed vs model")
 *     .x("Model arrival", "h").y("Observed arrival", "h")
 *     .points("Site A", model, observed)
 *     .identityLine()
 *     .build();
 * </pre>
 */
public final class ScatterFigure extends LineFigure {
    private ScatterFigure(Builder b) {
        super(b);
    }

    public static Builder builder() {
        Builder b = new Builder();
        b.xLoose = true;
        return b;
    }

    /** Builder; see {@link LineFigure.Builder} for axes, events and references. */
    public static final class Builder extends LineFigure.Builder {
        private int groups;
        private boolean identity;

        private Builder() {
        }

        public Builder points(String name, double[] x, double[] y) {
            series(Series.of(name, x, y).noLine().marker(Marker.cycle(groups++)));
            return this;
        }

        /** Points with symmetric error bars (either may be null). */
        public Builder points(String name, double[] x, double[] y, double[] xHalfWidth, double[] yHalfWidth) {
            series(Series.of(name, x, y).noLine().marker(Marker.cycle(groups++)).errorBars(xHalfWidth, yHalfWidth));
            return this;
        }

        /** The line y = x (observed equals model). */
        public Builder identityLine() {
            identity = true;
            return this;
        }

        // covariant overrides so calls chain in any order
        @Override
        public Builder size(int widthPx, int heightPx) {
            super.size(widthPx, heightPx);
            return this;
        }

        @Override
        public Builder title(String t) {
            super.title(t);
            return this;
        }

        @Override
        public Builder x(String label, String unit) {
            super.x(label, unit);
            return this;
        }

        @Override
        public Builder y(String label, String unit) {
            super.y(label, unit);
            return this;
        }

        @Override
        public Builder xRange(double min, double max) {
            super.xRange(min, max);
            return this;
        }

        @Override
        public Builder yRange(double min, double max) {
            super.yRange(min, max);
            return this;
        }

        @Override
        public Builder series(Series s) {
            super.series(s);
            return this;
        }

        @Override
        public Builder event(double x, String label) {
            super.event(x, label);
            return this;
        }

        @Override
        public Builder reference(double y, String label) {
            super.reference(y, label);
            return this;
        }

        @Override
        public Builder referenceLine(double slope, double intercept, String label) {
            super.referenceLine(slope, intercept, label);
            return this;
        }

        @Override
        public Builder note(String text) {
            super.note(text);
            return this;
        }

        @Override
        public ScatterFigure build() {
            if (identity) {
                referenceLine(1, 0, "1:1");
            }
            return new ScatterFigure(this);
        }
    }
}
