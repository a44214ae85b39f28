package org.littoral.scenarios.report;

import java.awt.Color;

/**
 * One data series for {@link LineFigure} / {@link ScatterFigure}: x and y (NaN breaks the line),
 * optional error bars, and its look. Unset colours come from the Okabe-Ito palette; series with the
 * same {@link #group} share a colour and differ by dash pattern (a second category, e.g. colour by
 * site and dash by scenario).
 */
public final class Series {
    final String name;
    final double[] x;
    final double[] y;
    Color color;
    LineStyle style = LineStyle.SOLID;
    boolean line = true;
    Marker marker = Marker.NONE;
    boolean markerFilled = true;
    float width = 2f;
    String group;
    double[] xErr;
    double[] yErr;
    boolean inLegend = true;

    private Series(String name, double[] x, double[] y) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("series '" + name + "' has " + x.length + " x but " + y.length
                    + " y values");
        }
        this.name = name == null ? "" : name;
        this.x = x.clone();
        this.y = y.clone();
    }

    public static Series of(String name, double[] x, double[] y) {
        return new Series(name, x, y);
    }

    public Series color(Color c) {
        color = c;
        return this;
    }

    public Series style(LineStyle s) {
        style = s;
        return this;
    }

    public Series dashed() {
        style = LineStyle.DASHED;
        return this;
    }

    public Series width(float px) {
        width = px;
        return this;
    }

    public Series marker(Marker m) {
        marker = m;
        return this;
    }

    /** Markers drawn white-filled with a coloured edge. */
    public Series openMarkers() {
        markerFilled = false;
        return this;
    }

    /** Points only, no connecting line (a scatter series). */
    public Series noLine() {
        line = false;
        if (marker == Marker.NONE) {
            marker = Marker.CIRCLE;
        }
        return this;
    }

    /** Series of one group share a colour; the dash pattern then tells them apart. */
    public Series group(String g) {
        group = g;
        return this;
    }

    /** Symmetric error bars (half-widths, same unit as the data); null for none. */
    public Series errorBars(double[] xHalfWidth, double[] yHalfWidth) {
        if ((xHalfWidth != null && xHalfWidth.length != x.length)
                || (yHalfWidth != null && yHalfWidth.length != y.length)) {
            throw new IllegalArgumentException("error bars of series '" + name + "' must match its length "
                    + x.length);
        }
        xErr = xHalfWidth == null ? null : xHalfWidth.clone();
        yErr = yHalfWidth == null ? null : yHalfWidth.clone();
        return this;
    }

    public Series hideInLegend() {
        inLegend = false;
        return this;
    }
}
