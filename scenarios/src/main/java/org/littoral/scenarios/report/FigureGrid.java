package org.littoral.scenarios.report;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

/**
 * Small multiples: several figures of the same size laid out in rows and columns under one title,
 * rendered as one image (e.g. one panel per day). Panels are drawn in the order added, left to
 * right, top to bottom.
 */
public final class FigureGrid extends Figure {
    private static final int TITLE_PX = 30;
    private final List<Figure> panels;
    private final int columns;
    private final int panelW;
    private final int panelH;

    private FigureGrid(String title, List<Figure> panels, int columns, int panelW, int panelH) {
        super(Math.max(200, columns * panelW), Math.max(150, TITLE_PX + rows(panels.size(), columns) * panelH), title);
        this.panels = List.copyOf(panels);
        this.columns = columns;
        this.panelW = panelW;
        this.panelH = panelH;
    }

    private static int rows(int n, int columns) {
        return Math.max(1, (n + columns - 1) / columns);
    }

    /**
     * A grid of {@code panels} in {@code columns} columns; every panel must have the same size.
     *
     * @throws IllegalArgumentException when there are no panels, columns < 1, or the sizes differ
     */
    public static FigureGrid of(String title, List<? extends Figure> panels, int columns) {
        if (panels.isEmpty()) {
            throw new IllegalArgumentException("a figure grid needs at least one panel");
        }
        if (columns < 1) {
            throw new IllegalArgumentException("a figure grid needs at least one column, got " + columns);
        }
        int w = panels.get(0).widthPx();
        int h = panels.get(0).heightPx();
        for (Figure f : panels) {
            if (f.widthPx() != w || f.heightPx() != h) {
                throw new IllegalArgumentException("all panels of a figure grid must be " + w + " x " + h + " px; '"
                        + f.title() + "' is " + f.widthPx() + " x " + f.heightPx());
            }
        }
        int cols = Math.min(columns, panels.size());
        long area = (long) cols * w * (TITLE_PX + (long) rows(panels.size(), cols) * h);
        if (area > 8000L * 8000L || cols * w > 8000 || TITLE_PX + rows(panels.size(), cols) * h > 8000) {
            throw new IllegalArgumentException("figure grid of " + panels.size() + " panels of " + w + " x " + h
                    + " px is larger than 8000 x 8000 px; use smaller panels or several grids");
        }
        return new FigureGrid(title, new ArrayList<>(panels), cols, w, h);
    }

    public int panelCount() {
        return panels.size();
    }

    @Override
    protected void paint(Graphics2D g) {
        g.setColor(Theme.INK);
        g.setFont(Theme.TITLE);
        FontMetrics fm = g.getFontMetrics();
        g.drawString(title, Math.max(4, (widthPx - fm.stringWidth(title)) / 2), 21);
        for (int i = 0; i < panels.size(); i++) {
            BufferedImage img = panels.get(i).toImage();
            int r = i / columns;
            int c = i % columns;
            g.drawImage(img, c * panelW, TITLE_PX + r * panelH, null);
        }
    }
}
