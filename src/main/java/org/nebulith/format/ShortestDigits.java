package org.nebulith.format;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The digits {@link Decimal#format} writes: the exact decimal value of a double rounded half-even to
 * the fewest significant digits p (found by bisection over 1 to 17) that read back to the double.
 *
 * <p>{@link #reference} is the definition, computed with {@link BigDecimal}. {@link #of} gives the
 * same digits with long arithmetic: the exact value, and the two ends of the interval of reals that
 * round to the double (halfway to each neighbour; the nearer one below a power of two), are scaled by
 * the one power of ten that brings the exact value into [10^17, 10^18) and kept as floor plus an
 * inexact bit ({@link ScaledDyadic}). A rounding to p digits then reads back to the double exactly
 * when it lies inside that interval, ends included when the double's significand is even (the
 * round-half-even rule of {@link Double#parseDouble}), so the bisection needs no parsing. Where that
 * scaling does not fit, {@link #of} falls back to the reference.
 */
final class ShortestDigits {

    private static final int MAX_DIGITS = 17;
    private static final int SCALED_DIGITS = 18;
    private static final long[] TEN_TO_THE = DigitsText.TEN_TO_THE;
    private static final long SCALED_MIN = TEN_TO_THE[SCALED_DIGITS - 1];
    private static final long SCALED_LIMIT = TEN_TO_THE[SCALED_DIGITS];
    private static final int SIGNIFICAND_BITS = 52;
    private static final long FRACTION_MASK = (1L << SIGNIFICAND_BITS) - 1;
    private static final int SUBNORMAL_EXPONENT = -1074;
    private static final int SCALE_ATTEMPTS = 3;

    private ShortestDigits() {
    }

    /**
     * @param value a finite, non-zero double
     * @return the shortest round-trip digits, trailing zeros stripped, sign kept (as {@link #reference})
     */
    static DecimalDigits of(final double value) {
        double magnitude = Math.abs(value);
        long bits = Double.doubleToRawLongBits(magnitude);
        int biased = (int) (bits >>> SIGNIFICAND_BITS);
        long fraction = bits & FRACTION_MASK;
        long significand = biased == 0 ? fraction : fraction | (1L << SIGNIFICAND_BITS);
        int exponent = biased == 0 ? SUBNORMAL_EXPONENT : SUBNORMAL_EXPONENT - 1 + biased;
        int scale = SCALED_DIGITS - 1 - (int) Math.floor(Math.log10(magnitude));
        for (int attempt = 0; attempt < SCALE_ATTEMPTS; attempt++) {
            long exact = ScaledDyadic.tagged(significand, exponent, scale);
            if (exact == ScaledDyadic.TOO_LARGE || (exact >> 1) >= SCALED_LIMIT) {
                scale--;
            } else if ((exact >> 1) < SCALED_MIN) {
                scale++;
            } else {
                boolean narrowBelow = fraction == 0 && biased > 1;
                DecimalDigits digits = withinInterval(significand, exponent, scale, exact, narrowBelow);
                if (digits == null) {
                    break;
                }
                return value < 0 ? new DecimalDigits(-digits.unscaled(), digits.scale()) : digits;
            }
        }
        return DecimalDigits.of(reference(value));
    }

    /**
     * Scales the ends of the interval that rounds to significand * 2^exponent and bisects.
     *
     * @return the digits, or null if an end does not fit the scale
     */
    private static DecimalDigits withinInterval(final long significand, final int exponent, final int scale,
            final long exact, final boolean narrowBelow) {
        long lower = narrowBelow ? ScaledDyadic.tagged(4 * significand - 1, exponent - 2, scale)
                : ScaledDyadic.tagged(2 * significand - 1, exponent - 1, scale);
        long upper = ScaledDyadic.tagged(2 * significand + 1, exponent - 1, scale);
        if (lower == ScaledDyadic.TOO_LARGE || upper == ScaledDyadic.TOO_LARGE) {
            return null;
        }
        return bisect(exact, lower, upper, (significand & 1) == 0, scale);
    }

    /** The reference bisection of {@link #reference}, on scaled integers (see the class comment). */
    private static DecimalDigits bisect(final long exact, final long lower, final long upper, final boolean even,
            final int scale) {
        int low = 1;
        int high = MAX_DIGITS;
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (readsBack(rounded(exact, mid) * TEN_TO_THE[SCALED_DIGITS - mid], lower, upper, even)) {
                high = mid;
            } else {
                low = mid + 1;
            }
        }
        return stripped(rounded(exact, low), scale - SCALED_DIGITS + low);
    }

    private static DecimalDigits stripped(final long unscaled, final int scale) {
        long digits = unscaled;
        int shorter = scale;
        while (digits % 10 == 0) {
            digits /= 10;
            shorter--;
        }
        return new DecimalDigits(digits, shorter);
    }

    /**
     * @param exact  tagged scaled exact value (10^17 to 10^18)
     * @param digits significant digits, 1 to 17
     * @return the exact value rounded half-even to that many digits (up to 10^digits after a carry)
     */
    private static long rounded(final long exact, final int digits) {
        long floor = exact >> 1;
        boolean inexact = (exact & 1) != 0;
        long unit = TEN_TO_THE[SCALED_DIGITS - digits];
        long quotient = floor / unit;
        long remainder = floor - quotient * unit;
        long half = unit >> 1;
        boolean up = remainder > half || (remainder == half && (inexact || (quotient & 1) != 0));
        return up ? quotient + 1 : quotient;
    }

    /**
     * @param candidate an integer on the scale of the interval ends
     * @param lower     tagged lower end of the interval that rounds to the double
     * @param upper     tagged upper end
     * @param even      whether the double's significand is even (then ties at the ends round to it)
     * @return whether the candidate reads back to the double
     */
    private static boolean readsBack(final long candidate, final long lower, final long upper, final boolean even) {
        long lowerFloor = lower >> 1;
        boolean lowerExact = (lower & 1) == 0;
        long upperFloor = upper >> 1;
        boolean upperExact = (upper & 1) == 0;
        boolean aboveLower = candidate > lowerFloor || (candidate == lowerFloor && lowerExact && even);
        boolean belowUpper = candidate < upperFloor || (candidate == upperFloor && (!upperExact || even));
        return aboveLower && belowUpper;
    }

    /**
     * The definition: bisection over BigDecimal roundings of the exact binary value.
     *
     * @param value a finite, non-zero double
     * @return the shortest round-trip digits, trailing zeros stripped, sign kept
     */
    static BigDecimal reference(final double value) {
        BigDecimal exact = new BigDecimal(value);
        int low = 1;
        int high = MAX_DIGITS;
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (round(exact, mid).doubleValue() == value) {
                high = mid;
            } else {
                low = mid + 1;
            }
        }
        return round(exact, low).stripTrailingZeros();
    }

    private static BigDecimal round(final BigDecimal exact, final int digits) {
        return exact.round(new MathContext(digits, RoundingMode.HALF_EVEN));
    }
}
