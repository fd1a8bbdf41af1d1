package org.nebulith.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Consumer;
import java.util.function.DoubleConsumer;

import org.junit.jupiter.api.Test;

/**
 * {@link Decimal#format} (long arithmetic, direct text) against its definition, the BigDecimal
 * bisection {@link ShortestDigits#reference} laid out by {@link Decimal#textOf}: the same text for
 * every double tried, a little over two million in all. Seeds are fixed and named in the messages.
 */
class DecimalAgreementTest {

    private static final int MISMATCHES_SHOWN = 5;

    @Test
    void randomBitPatterns() {
        SplittableRandom random = new SplittableRandom(20240612L);
        assertAgree("bit patterns, seed 20240612", sink -> {
            for (int n = 0; n < 120_000;) {
                double x = Double.longBitsToDouble(random.nextLong());
                if (Double.isFinite(x)) {
                    sink.accept(x);
                    n++;
                }
            }
        });
    }

    @Test
    void logUniformFrom1eMinus30To1e30() {
        SplittableRandom random = new SplittableRandom(20240613L);
        assertAgree("log-uniform 1e-30..1e30, seed 20240613", sink -> {
            for (int n = 0; n < 500_000; n++) {
                double x = Math.pow(10, random.nextDouble(-30, 30));
                sink.accept(random.nextBoolean() ? x : -x);
            }
        });
    }

    @Test
    void powersOfTwoAndTenWithNeighbours() {
        assertAgree("powers of two and ten", sink -> {
            for (int e = Double.MIN_EXPONENT - 52; e <= Double.MAX_EXPONENT; e++) {
                withNeighbours(Math.scalb(1.0, e), 3, sink);
            }
            for (int e = -323; e <= 308; e++) {
                withNeighbours(Double.parseDouble("1e" + e), 3, sink);
                withNeighbours(Double.parseDouble("5e" + e), 1, sink);
            }
        });
    }

    @Test
    void subnormalsAndLimits() {
        SplittableRandom random = new SplittableRandom(20240614L);
        assertAgree("subnormals and limits, seed 20240614", sink -> {
            for (int n = 0; n < 20_000; n++) {
                sink.accept(Double.longBitsToDouble(random.nextLong(1, 1L << 52)));
            }
            for (long m = 1; m <= 2000; m++) {
                sink.accept(Double.longBitsToDouble(m));
                sink.accept(Double.longBitsToDouble((1L << 52) - m));
            }
            for (double limit : new double[] {Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE}) {
                withNeighbours(limit, 5, sink);
            }
        });
    }

    @Test
    void integersAndShortDecimals() {
        SplittableRandom random = new SplittableRandom(20240615L);
        assertAgree("integers and short decimals, seed 20240615", sink -> {
            for (int i = 1; i <= 500_000; i++) {
                sink.accept(i);
            }
            for (int n = 0; n < 450_000; n++) {
                sink.accept(random.nextLong() >>> random.nextInt(64));
            }
            for (int n = 0; n < 200_000; n++) {
                long digits = random.nextLong(1, 1_000_000);
                sink.accept(digits * Math.pow(10, random.nextInt(-25, 25)));
            }
            for (int n = 0; n < 250_000; n++) {
                long digits = random.nextLong(1, 100_000_000);
                sink.accept(Double.parseDouble(digits + "e" + random.nextInt(-30, 30)));
            }
        });
    }

    /** The numbers of DecimalTest and DecimalForPeopleTest, and two where Java 17's Double.toString is long. */
    @Test
    void numbersOfTheOtherDecimalTests() {
        assertAgree("numbers of the other Decimal tests", sink -> {
            for (double x : new double[] {1500.0, 0.1, 1.2e-4, 1.2e-5, -2.5, 1234567.0, 12345678.0, 6.02214076e23,
                    0.1 + 0.2, Double.MIN_VALUE, Double.MAX_VALUE, 992.484375, 1.15, 0.99999, 0.0012345678,
                    123456.0, 1e-12, 2000, 0.05, 1e-4, 1.5e6, 2.82879384806159e17, 1e23, 2e23, 9007199254740993.0}) {
                withNeighbours(x, 2, sink);
            }
        });
    }

    /** At powers of two, round-tripping is not monotone in p; bisection must still find the fewest p. */
    @Test
    void bisectionFindsTheFewestDigitsAtEveryPowerOfTwo() {
        for (int e = Double.MIN_EXPONENT - 52; e <= Double.MAX_EXPONENT; e++) {
            double x = Math.scalb(1.0, e);
            BigDecimal exact = new BigDecimal(x);
            int fewest = 1;
            while (exact.round(new MathContext(fewest, RoundingMode.HALF_EVEN)).doubleValue() != x) {
                fewest++;
            }
            assertEquals(fewest, ShortestDigits.of(x).toBigDecimal().precision(), "2^" + e);
        }
    }

    @Test
    void digitCountsAtEveryPowerOfTen() {
        for (long power = 1, k = 0; k <= 18; k++, power *= 10) {
            for (long n : new long[] {power - 1, power, power + 1, 2 * power - 1}) {
                assertEquals(Long.toString(n).length(), DigitsText.digitCount(n), Long.toString(n));
            }
        }
        assertEquals(19, DigitsText.digitCount(Long.MAX_VALUE));
    }

    private static void withNeighbours(final double x, final int steps, final DoubleConsumer sink) {
        double up = x;
        double down = x;
        sink.accept(x);
        for (int i = 0; i < steps; i++) {
            up = Math.nextUp(up);
            down = Math.nextDown(down);
            sink.accept(up);
            sink.accept(down);
        }
    }

    private static void check(final List<String> mismatches, final double x, final String actual,
            final String expected) {
        if (!expected.equals(actual) && mismatches.size() < MISMATCHES_SHOWN) {
            mismatches.add(Double.doubleToRawLongBits(x) + " (" + x + "): " + actual + " instead of " + expected);
        }
    }

    /** Feeds every value the source produces through both paths and fails on any difference. */
    private static void assertAgree(final String what, final Consumer<DoubleConsumer> source) {
        List<String> mismatches = new ArrayList<>();
        long[] compared = {0};
        source.accept(x -> {
            if (!Double.isFinite(x)) {
                return;
            }
            compared[0]++;
            String actual = Decimal.format(x);
            if (x == 0) {
                check(mismatches, x, actual, "0");
                return;
            }
            BigDecimal digits = ShortestDigits.reference(x);
            check(mismatches, x, actual, Decimal.textOf(digits));
            if (!ShortestDigits.of(x).toBigDecimal().equals(digits)) {
                check(mismatches, x, ShortestDigits.of(x).toBigDecimal().toString(), digits.toString());
            }
        });
        assertTrue(mismatches.isEmpty(), what + ": " + mismatches);
        assertTrue(compared[0] > 0, what + ": nothing compared");
    }
}
