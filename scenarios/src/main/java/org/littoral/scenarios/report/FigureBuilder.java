package org.littoral.scenarios.report;

/**
 * What every figure builder has: the size in pixels (900 x 600 unless set) and the title. Each figure's
 * {@code Builder} extends it with its own axes and data.
 *
 * @param <B> the concrete builder, returned by every setter so calls chain
 */
public abstract class FigureBuilder<B extends FigureBuilder<B>> {
    int width = 900;
    int height = 600;
    String title = "";

    FigureBuilder() {
    }

    @SuppressWarnings("unchecked")
    private B self() {
        return (B) this;
    }

    public B size(int widthPx, int heightPx) {
        width = widthPx;
        height = heightPx;
        return self();
    }

    public B title(String t) {
        title = t;
        return self();
    }
}
