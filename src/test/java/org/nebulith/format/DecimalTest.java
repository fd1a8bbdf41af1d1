package org.nebulith.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class DecimalTest {

    @Test
    void plainAndScientificForms() {
        assertEquals("1500", Decimal.format(1500.0));
        assertEquals("0.1", Decimal.format(0.1));
        assertEquals("0.00012", Decimal.format(1.2e-4));
        assertEquals("1.2e-5", Decimal.format(1.2e-5));
        assertEquals("-2.5", Decimal.format(-2.5));
        assertEquals("1234567", Decimal.format(1234567.0));
        assertEquals("1.2345678e7", Decimal.format(12345678.0));
        assertEquals("6.02214076e23", Decimal.format(6.02214076e23));
        assertEquals("0", Decimal.format(-0.0));
        assertEquals("0.30000000000000004", Decimal.format(0.1 + 0.2));
        assertEquals("5e-324", Decimal.format(Double.MIN_VALUE)); // shorter than Java 17 "4.9E-324", parses back the same
        assertEquals("1.7976931348623157e308", Decimal.format(Double.MAX_VALUE));
    }

    @Test
    void everyValueRoundTripsAndIsNoLongerThanJavaText() {
        SplittableRandom random = new SplittableRandom(20240611L); // seed printed by the assertion message
        for (int i = 0; i < 20000; i++) {
            double x = Double.longBitsToDouble(random.nextLong());
            if (!Double.isFinite(x)) {
                continue;
            }
            String text = Decimal.format(x);
            assertEquals(x == 0 ? 0.0 : x, Double.parseDouble(text), "seed 20240611, value " + x);
            assertTrue(digits(text) <= digits(Double.toString(x)), text + " vs " + x);
        }
    }

    @Test
    void nonFiniteRefused() {
        assertThrows(IllegalArgumentException.class, () -> Decimal.format(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Decimal.format(Double.POSITIVE_INFINITY));
    }

    private static int digits(final String text) {
        String mantissa = text.toLowerCase(java.util.Locale.ROOT).split("e")[0].replace("-", "").replace(".", "");
        return mantissa.replaceFirst("^0+", "").replaceFirst("0+$", "").length();
    }
}
