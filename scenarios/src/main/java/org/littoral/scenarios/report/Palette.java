package org.littoral.scenarios.report;

import java.awt.Color;

/** The report colours for callers outside this package (same Okabe-Ito palette the figures use). */
public final class Palette {
    private Palette() {
    }

    /** The i-th qualitative colour (cycles), so one site keeps its colour across panels. */
    public static Color qualitative(int i) {
        return Theme.qualitative(i);
    }
}
