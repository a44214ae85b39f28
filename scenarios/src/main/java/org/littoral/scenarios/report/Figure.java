package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/**
 * A figure drawn with Java2D onto a white raster. Subclasses draw in {@link #paint}; this class
 * handles the raster, antialiasing and PNG encoding. Figures are immutable once built.
 */
public abstract class Figure {
    protected final int widthPx;
    protected final int heightPx;
    protected final String title;

    protected Figure(int widthPx, int heightPx, String title) {
        if (widthPx < 200 || heightPx < 150 || widthPx > 8000 || heightPx > 8000) {
            throw new IllegalArgumentException("figure size must be 200..8000 x 150..8000 px, got "
                    + widthPx + " x " + heightPx);
        }
        this.widthPx = widthPx;
        this.heightPx = heightPx;
        this.title = title == null ? "" : title;
    }

    public int widthPx() {
        return widthPx;
    }

    public int heightPx() {
        return heightPx;
    }

    public String title() {
        return title;
    }

    /** Draws the whole figure; the canvas is already white and antialiased. */
    protected abstract void paint(Graphics2D g);

    /** Renders to a new RGB image (allocates width x height ints). */
    public BufferedImage toImage() {
        BufferedImage img = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, widthPx, heightPx);
            paint(g);
        } finally {
            g.dispose();
        }
        return img;
    }

    /** PNG bytes of the rendered figure (for embedding in a report). */
    public byte[] toPngBytes() {
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        try {
            if (!ImageIO.write(toImage(), "png", out)) {
                throw new IllegalStateException("no PNG writer in this Java runtime");
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** Writes the PNG atomically; see {@link PngWriter}. */
    public void writePng(Path target) throws IOException {
        PngWriter.write(this, target);
    }
}
