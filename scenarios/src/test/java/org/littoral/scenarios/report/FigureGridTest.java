package org.littoral.scenarios.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Small multiples: panel layout and size checks. */
class FigureGridTest {
    private static LineFigure panel(String t, int w, int h) {
        return LineFigure.builder().size(w, h).title(t).x("t", "h").y("y", "").line("a", new double[] {0, 1}, new double[] {0, 1})
                .build();
    }

    @Test
    void sevenPanelsInThreeColumnsMakeThreeRows() {
        List<Figure> p = new ArrayList<>();
        for (int i = 0; i < 7; i++) {
            p.add(panel("p" + i, 300, 200));
        }
        FigureGrid g = FigureGrid.of("grid", p, 3);
        assertEquals(900, g.widthPx());
        assertEquals(30 + 3 * 200, g.heightPx());
        assertEquals(7, g.panelCount());
        assertTrue(g.toPngBytes().length > 1000);
    }

    @Test
    void fewerPanelsThanColumnsUseOnlyTheColumnsNeeded() {
        FigureGrid g = FigureGrid.of("grid", List.of(panel("a", 300, 200), panel("b", 300, 200)), 4);
        assertEquals(600, g.widthPx());
    }

    @Test
    void panelsOfDifferentSizesAreRefusedWithTheirSizes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FigureGrid.of("grid", List.of(panel("a", 300, 200), panel("b", 400, 200)), 2));
        assertTrue(e.getMessage().contains("'b' is 400 x 200"), e.getMessage());
    }

    @Test
    void anEmptyGridIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> FigureGrid.of("grid", List.of(), 2));
    }
}
