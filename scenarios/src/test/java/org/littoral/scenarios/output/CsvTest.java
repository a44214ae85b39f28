package org.littoral.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class CsvTest {
    @Test
    void aMissingNumberIsAnEmptyField() {
        assertEquals("", Csv.fixed(Double.NaN, 3));
        assertEquals("", Csv.fixed(Double.POSITIVE_INFINITY, 1));
    }

    @Test
    void negativeZeroAfterRoundingIsWrittenWithoutASign() {
        assertEquals("0.00", Csv.fixed(-0.001, 2));
        assertEquals("-0.01", Csv.fixed(-0.006, 2));
    }

    // General-purpose reference: java.math.BigDecimal rounding HALF_UP of the value scaled by 10^decimals, which is
    // what Math.round does for the values (not exact binary halves) drawn here.
    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2, 3, 4, 6})
    void fixedDecimalsMatchBigDecimalRounding(int decimals) {
        Random rnd = new Random(42 + decimals);
        for (int i = 0; i < 2000; i++) {
            double v = (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(7));
            BigDecimal scaled = new BigDecimal(v).movePointRight(decimals).setScale(0, RoundingMode.HALF_UP);
            String expect = scaled.movePointLeft(decimals).setScale(decimals, RoundingMode.UNNECESSARY).toPlainString();
            if (expect.startsWith("-") && scaled.signum() == 0) {
                expect = expect.substring(1);
            }
            assertEquals(expect.equals("-0") ? "0" : expect, Csv.fixed(v, decimals), "value " + v);
        }
    }

    // RFC 4180 section 2, rules 5-7.
    @Test
    void aLineQuotesOnlyTheFieldsThatNeedIt() {
        assertEquals("a,\"b,c\",\"say \"\"hi\"\"\",\n", Csv.line(new StringBuilder(), List.of("a", "b,c", "say \"hi\"", "")).toString());
    }
}
