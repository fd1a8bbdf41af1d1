package org.nebulith.format;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Numbers for people: four significant figures, temperatures to 0.1 K, values to their resolution. */
class DecimalForPeopleTest {

    @Test
    void fourSignificantFiguresWithTrailingZerosKept() {
        assertEquals("992.5", Decimal.forPeople(992.484375));
        assertEquals("1.150", Decimal.forPeople(1.15));
        assertEquals("1.000", Decimal.forPeople(0.99999));
        assertEquals("0.001235", Decimal.forPeople(0.0012345678));
        assertEquals("123500", Decimal.forPeople(123456.0));
        assertEquals("1.000e-12", Decimal.forPeople(1e-12));
        assertEquals("0", Decimal.forPeople(0.0));
        assertEquals("-2.500", Decimal.forPeople(-2.5));
    }

    @Test
    void temperaturesToATenthOfAKelvin() {
        assertEquals("992.5", Decimal.kelvin(992.484375));
        assertEquals("2000.0", Decimal.kelvin(2000));
    }

    @Test
    void bisectedValuesToTheirBracket() {
        // a 0.05 K bracket resolves hundredths of a kelvin
        assertEquals("992.48", Decimal.toResolution(992.484375, 0.05));
        assertEquals("1650", Decimal.toResolution(1650.0, 0.05));
    }

    @Test
    void settingsInTheShortestText() {
        assertEquals("1e-4", Decimal.shortest(1e-4));
        assertEquals("2000", Decimal.shortest(2000.0));
        assertEquals("0.05", Decimal.shortest(0.05));
        assertEquals("1.5e6", Decimal.shortest(1.5e6));
    }
}
