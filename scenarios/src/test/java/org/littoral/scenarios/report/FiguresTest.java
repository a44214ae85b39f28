package org.littoral.scenarios.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FiguresTest {
    static double[] range(double a, double step, int n) {
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = a + i * step;
        }
        return r;
    }

    static FieldFigure sineField(int w, int h) {
        double[] x = range(-20, 1, 41);
        double[] y = {10, 20, 40, 80, 160, 320, 640, 1280};
        double[][] v = new double[y.length][x.length];
        for (int k = 0; k < y.length; k++) {
            for (int i = 0; i < x.length; i++) {
                v[k][i] = 5 * Math.sin(x[i] / 6) * Math.exp(-y[k] / 600);
            }
        }
        v[3][4] = Double.NaN;
        return FieldFigure.builder().size(w, h).title("sine").x(x, "Distance inland", "km").y(y, "Height", "m")
                .values(v).colorBar("u", "m s-1").diverging().contours(-2, 0, 2).verticalLine(5, "Site A").build();
    }

    @Test
    void pngDecodesBackAtTheRequestedSize(@TempDir Path dir) throws Exception {
        FieldFigure f = sineField(900, 600);
        Path p = dir.resolve("sub/field.png");
        PngWriter.write(f, p);
        BufferedImage img = ImageIO.read(p.toFile());
        assertEquals(900, img.getWidth());
        assertEquals(600, img.getHeight());
        BufferedImage fromBytes = ImageIO.read(new ByteArrayInputStream(sineField(640, 420).toPngBytes()));
        assertEquals(640, fromBytes.getWidth());
        assertEquals(420, fromBytes.getHeight());
        try (var files = Files.list(p.getParent())) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void divergingColourRangeIsSymmetricAboutZero() {
        double[] r = sineField(900, 600).colorRange();
        assertEquals(-r[0], r[1], 0);
        assertTrue(r[1] >= 5 * Math.sin(20 / 6.0) * Math.exp(-10 / 600.0) - 1e-9 || r[1] >= 4.9);
    }

    @Test
    void cellEdgesLieHalfWayBetweenUnevenPoints() {
        assertArrayEquals(new double[] {5, 15, 30, 60, 100}, FieldFigure.edges(new double[] {10, 20, 40, 80}), 1e-12);
    }

    // A linear field v = x - 2.5 has its zero contour exactly on x = 2.5 (marching squares
    // interpolates linearly along cell edges, so it is exact for linear data).
    @Test
    void zeroContourOfALinearFieldIsTheStraightLineWhereItVanishes() {
        double[] x = range(0, 1, 6);
        double[] y = {0, 0.5, 2, 3};
        double[][] v = new double[y.length][x.length];
        for (int k = 0; k < y.length; k++) {
            for (int i = 0; i < x.length; i++) {
                v[k][i] = x[i] - 2.5 + 0 * y[k];
            }
        }
        List<Contours.Line> lines = Contours.trace(x, y, v, 0);
        assertEquals(1, lines.size(), "segments are chained into one polyline");
        Contours.Line l = lines.get(0);
        assertEquals(4, l.x.length);
        for (int j = 0; j < l.x.length; j++) {
            assertEquals(2.5, l.x[j], 1e-12);
        }
    }

    // A circular bump: the level set is a closed loop; every traced point lies near radius r.
    @Test
    void contourOfARadialBumpIsAClosedLoopAtTheRightRadius() {
        double[] x = range(-5, 0.1, 101);
        double[] y = range(-5, 0.1, 101);
        double[][] v = new double[101][101];
        for (int k = 0; k < 101; k++) {
            for (int i = 0; i < 101; i++) {
                v[k][i] = x[i] * x[i] + y[k] * y[k];
            }
        }
        List<Contours.Line> lines = Contours.trace(x, y, v, 9);
        assertEquals(1, lines.size());
        Contours.Line l = lines.get(0);
        assertEquals(l.x[0], l.x[l.x.length - 1], 1e-12, "closed");
        for (int j = 0; j < l.x.length; j++) {
            assertEquals(3, Math.hypot(l.x[j], l.y[j]), 0.01);
        }
    }

    @Test
    void fieldRejectsValuesOfTheWrongShapeNamingTheShape() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> FieldFigure.builder()
                .x(new double[] {0, 1}, "x", "km").y(new double[] {0, 1, 2}, "z", "m")
                .values(new double[2][2]).build());
        assertTrue(e.getMessage().contains("[ny][nx]"), e.getMessage());
    }

    @Test
    void fieldRejectsNonIncreasingCoordinates() {
        assertThrows(IllegalArgumentException.class, () -> FieldFigure.builder()
                .x(new double[] {0, 2, 1}, "x", "km").y(new double[] {0, 1}, "z", "m")
                .values(new double[2][3]).build());
    }

    @Test
    void colourBarShowsNegativeAsBlueAndPositiveAsRed() {
        double[] x = range(0, 1, 20);
        double[] y = range(0, 1, 20);
        double[][] v = new double[20][20];
        for (int k = 0; k < 20; k++) {
            for (int i = 0; i < 20; i++) {
                v[k][i] = i < 10 ? -3 : 3;
            }
        }
        BufferedImage img = FieldFigure.builder().x(x, "x", "km").y(y, "y", "h").values(v).diverging()
                .colorBar("u", "m s-1").build().toImage();
        // sample a quarter and three quarters across, half-way up
        int row = img.getHeight() / 2;
        int left = img.getRGB(img.getWidth() / 4, row) & 0xffffff;
        int right = img.getRGB(img.getWidth() / 2 + 60, row) & 0xffffff;
        assertTrue((left & 0xff) > (left >> 16), String.format("left blue: %06x", left));
        assertTrue((right >> 16) > (right & 0xff), String.format("right red: %06x", right));
    }

    // Freedman and Diaconis (1981): h = 2 IQR n^(-1/3). For 1..1000, IQR (type 7) = 499.5,
    // h = 2 * 499.5 / 10 = 99.9 -> nice number 100; counts sum to n.
    @Test
    void histogramUsesFreedmanDiaconisWidthRoundedToANiceNumber() {
        double[] v = range(1, 1, 1000);
        HistogramFigure h = HistogramFigure.builder().x("v", "").data("all", v).build();
        double[] e = h.edges();
        assertEquals(100, e[1] - e[0], 1e-9);
        double sum = 0;
        for (double c : h.heights(0)) {
            sum += c;
        }
        assertEquals(1000, sum, 0);
    }

    @Test
    void densityHistogramIntegratesToOne() {
        Random r = new Random(3);
        double[] v = new double[500];
        for (int i = 0; i < v.length; i++) {
            v[i] = r.nextGaussian();
        }
        HistogramFigure h = HistogramFigure.builder().x("v", "m").data("g", v).mode(HistogramFigure.Mode.DENSITY)
                .build();
        double[] e = h.edges();
        double[] d = h.heights(0);
        double integral = 0;
        for (int i = 0; i < d.length; i++) {
            integral += d[i] * (e[i + 1] - e[i]);
        }
        assertEquals(1, integral, 1e-12);
    }

    @Test
    void fanChartMedianIsTheSampleMedianIgnoringNan() {
        double[] x = {0, 10};
        double[][] s = {{1, 2, 3, 4, 5}, {10, Double.NaN, 30, 20, Double.NaN}};
        FanChartFigure f = FanChartFigure.builder().x(x, "Distance inland", "km").y("Arrival", "h").samples(s).build();
        double[][] p = f.percentiles();
        assertEquals(3, p[2][0], 0);
        assertEquals(20, p[2][1], 0);
        // Hyndman-Fan 7 on {1..5}: 5 % at h = 0.2 -> 1.2
        assertEquals(1.2, p[0][0], 1e-12);
        assertNotEquals(0, f.toPngBytes().length);
    }

    @Test
    void everyFigureTypeRendersWithoutError() {
        double[] x = range(0, 1, 30);
        double[] y = new double[30];
        for (int i = 0; i < 30; i++) {
            y[i] = Math.sin(i / 5.0);
        }
        List<Figure> figs = List.of(
                LineFigure.builder().x("t", "h").y("T", "K").line("a", x, y).band("b", x, y, y).event(3, "e").build(),
                ScatterFigure.builder().x("m", "h").y("o", "h").points("p", x, y).identityLine().build(),
                BoxPlotFigure.builder().y("dT", "K").group("a", y).group("empty", new double[0]).build());
        for (Figure f : figs) {
            BufferedImage img = f.toImage();
            assertEquals(900, img.getWidth());
        }
    }
}
