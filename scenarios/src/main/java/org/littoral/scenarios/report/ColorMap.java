package org.littoral.scenarios.report;

import java.awt.Color;

/**
 * A colour map from a normalised position t in [0, 1] to a colour, by piecewise-linear
 * interpolation in sRGB between anchor colours.
 *
 * <ul>
 *   <li>{@link #diverging()}: blue - white - red for signed quantities (onshore/offshore wind,
 *       anomalies). Anchors after ColorBrewer "RdBu" (Brewer, Harrower and co., colorbrewer2.org,
 *       2003), with the centre set to pure white so zero is white; blue is negative, red positive.
 *   <li>{@link #sequential()}: perceptually ordered dark-purple - blue - green - yellow, anchors
 *       sampled from "viridis" (van der Walt and Smith, 2015, matplotlib; CC0) for scalars.
 * </ul>
 */
public final class ColorMap {
    private final String name;
    private final float[][] anchors; // rgb in [0,1]

    private ColorMap(String name, int... rgb) {
        this.name = name;
        anchors = new float[rgb.length][];
        for (int i = 0; i < rgb.length; i++) {
            Color c = new Color(rgb[i]);
            anchors[i] = c.getRGBColorComponents(null);
        }
    }

    /** Blue (t = 0) - white (t = 0.5) - red (t = 1); used centred on zero. */
    public static ColorMap diverging() {
        return new ColorMap("blue-white-red",
                0x053061, 0x2166ac, 0x4393c3, 0x92c5de, 0xd1e5f0, 0xffffff,
                0xfddbc7, 0xf4a582, 0xd6604d, 0xb2182b, 0x67001f);
    }

    /** Dark purple (t = 0) to yellow (t = 1), monotonic in lightness. */
    public static ColorMap sequential() {
        return new ColorMap("viridis",
                0x440154, 0x482878, 0x3e4989, 0x31688e, 0x26828e,
                0x1f9e89, 0x35b779, 0x6ece58, 0xb5de2b, 0xfde725);
    }

    public String name() {
        return name;
    }

    /** Colour at t (clamped to [0, 1]), as packed 0xRRGGBB. */
    public int rgb(double t) {
        if (Double.isNaN(t)) {
            throw new IllegalArgumentException("colour map position is NaN");
        }
        double s = Math.min(1, Math.max(0, t)) * (anchors.length - 1);
        int i = Math.min((int) Math.floor(s), anchors.length - 2);
        double w = s - i;
        int r = channel(anchors[i][0], anchors[i + 1][0], w);
        int g = channel(anchors[i][1], anchors[i + 1][1], w);
        int b = channel(anchors[i][2], anchors[i + 1][2], w);
        return (r << 16) | (g << 8) | b;
    }

    public Color color(double t) {
        return new Color(rgb(t));
    }

    private static int channel(float a, float b, double w) {
        return (int) Math.round(255 * (a + (b - a) * w));
    }
}
