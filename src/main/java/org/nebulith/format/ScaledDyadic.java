package org.nebulith.format;

import java.math.BigInteger;

/**
 * Exact decimal scaling of a dyadic number: {@code floor(a * 2^e * 10^s)} together with whether the
 * product had a fractional part, for the integers near 10^17 that {@link ShortestDigits} works with.
 *
 * <p>The result is <em>tagged</em>: {@code floor << 1 | (fraction != 0 ? 1 : 0)}. Scales 0 to 27
 * multiply by 5^s exactly in 128-bit long arithmetic; other scales multiply by a 126-bit 10^s
 * ({@link PowerOfTen}) and keep the result only where its error bound cannot change floor or bit;
 * the rest (an exact integer among them) is done with {@link BigInteger}. The result is always exact.
 */
final class ScaledDyadic {

    /** Returned when the floor is 2^62 or more (it could not be tagged in a long). */
    static final long TOO_LARGE = -1L;

    /** 5^0 to 5^27, the powers of five below 2^63. */
    private static final long[] FIVE_TO_THE = DigitsText.powers(5, 28);
    private static final BigInteger[] BIG_FIVE_TO_THE = new BigInteger[400];
    private static final int MAX_FLOOR_BITS = 62;
    private static final int HALF_BITS = 63;
    private static final long UNDECIDED = -2L;

    private ScaledDyadic() {
    }

    /**
     * @param a a positive integer below 2^55
     * @param e binary exponent
     * @param s decimal exponent
     * @return {@code floor(a * 2^e * 10^s)} tagged with its inexact bit, or {@link #TOO_LARGE}
     */
    static long tagged(final long a, final int e, final int s) {
        if (s >= 0 && s < FIVE_TO_THE.length) {
            return shiftedProduct(a, FIVE_TO_THE[s], e + s);
        }
        if (s >= PowerOfTen.MIN_EXPONENT && s <= PowerOfTen.MAX_EXPONENT) {
            long approximated = fromPowerOfTen(a, e, s);
            if (approximated != UNDECIDED) {
                return approximated;
            }
        }
        return viaBigInteger(a, e, s);
    }

    /**
     * a * 2^e * 10^s from the 126-bit G of 10^s: the 192-bit a * G, cut at the binary point into an
     * integer and 64 fraction bits F. With V the exact value and I that integer, V - I lies in
     * [F, F + 3) / 2^64: G falls short of 10^s * 2^shift by less than 1, a part in 2^125 of a * G,
     * which is below 2^-63 for V below 2^62, and the bits cut off weigh less than 2^-64. So floor V = I
     * and V is inexact whenever 0 &lt; F &lt;= 2^64 - 3. Otherwise V is next to an integer: for s below 0
     * that is mostly because it is one (a multiple of 10^-s, such as 1e20), which is checked exactly;
     * anything else is left to the exact path.
     *
     * @return the tagged floor, {@link #TOO_LARGE}, or {@link #UNDECIDED}
     */
    private static long fromPowerOfTen(final long a, final int e, final int s) {
        PowerOfTen power = PowerOfTen.of(s);
        long highTimesA = Math.multiplyHigh(a, power.high());
        long lowOfHigh = a * power.high();
        long highOfLow = Math.multiplyHigh(a, power.low());
        long lowOfLow = a * power.low();
        long word0 = (lowOfHigh << HALF_BITS) + lowOfLow;
        long carry0 = Long.compareUnsigned(word0, lowOfLow) < 0 ? 1 : 0;
        long shifted = (lowOfHigh >>> 1) | (highTimesA << HALF_BITS);
        long word1 = shifted + highOfLow + carry0;
        long carry1 = Long.compareUnsigned(word1, shifted) < 0 ? 1 : 0;
        long word2 = (highTimesA >>> 1) + carry1;
        int t = power.shift() - e - Long.SIZE;
        long integer;
        long fraction;
        if (t == 0) {
            integer = word2 == 0 ? word1 : -1;
            fraction = word0;
        } else if (t > 0 && t < Long.SIZE) {
            integer = (word2 >>> t) == 0 ? (word1 >>> t) | (word2 << (Long.SIZE - t)) : -1;
            fraction = (word0 >>> t) | (word1 << (Long.SIZE - t));
        } else if (t == Long.SIZE) {
            integer = word2;
            fraction = word1;
        } else if (t > Long.SIZE && t < 2 * Long.SIZE) {
            integer = word2 >>> (t - Long.SIZE);
            fraction = (word1 >>> (t - Long.SIZE)) | (word2 << (2 * Long.SIZE - t));
        } else {
            return UNDECIDED;
        }
        if ((integer >>> MAX_FLOOR_BITS) != 0) {
            return TOO_LARGE;
        }
        if (fraction != 0 && Long.compareUnsigned(fraction, -3L) <= 0) {
            return tag(integer, true);
        }
        long nearest = fraction < 0 ? integer + 1 : integer;
        return s < 0 && -s < FIVE_TO_THE.length && isMultiple(a, e, -s, nearest) ? tag(nearest, false) : UNDECIDED;
    }

    /**
     * @return whether a * 2^e equals n * 10^u, with n * 5^u as a 128-bit product (u at most 27)
     */
    private static boolean isMultiple(final long a, final int e, final int u, final long n) {
        long high = Math.multiplyHigh(n, FIVE_TO_THE[u]);
        long low = n * FIVE_TO_THE[u];
        int d = e - u;
        if (d < 0) {
            return Long.numberOfTrailingZeros(a) >= -d && high == 0 && low == a >>> -d;
        }
        if (d == 0) {
            return high == 0 && low == a;
        }
        if (d < Long.SIZE) {
            return high == a >>> (Long.SIZE - d) && low == a << d;
        }
        int up = d - Long.SIZE;
        return up < Long.SIZE && low == 0 && (a << up) >>> up == a && high == a << up;
    }

    /** a * p * 2^shift, with a * p computed as a 128-bit product (both factors positive, below 2^63). */
    private static long shiftedProduct(final long a, final long p, final int shift) {
        long high = Math.multiplyHigh(a, p);
        long low = a * p;
        if (shift >= 0) {
            boolean fits = high == 0 && shift < MAX_FLOOR_BITS && (low >>> (MAX_FLOOR_BITS - shift)) == 0;
            return fits ? (low << shift) << 1 : TOO_LARGE;
        }
        int t = -shift;
        long floor;
        boolean inexact;
        if (t < Long.SIZE) {
            if ((high >>> t) != 0) {
                return TOO_LARGE;
            }
            floor = (high << (Long.SIZE - t)) | (low >>> t);
            inexact = (low << (Long.SIZE - t)) != 0;
        } else if (t == Long.SIZE) {
            floor = high;
            inexact = low != 0;
        } else if (t < 2 * Long.SIZE) {
            floor = high >>> (t - Long.SIZE);
            inexact = low != 0 || (high << (2 * Long.SIZE - t)) != 0;
        } else {
            floor = 0;
            inexact = true;
        }
        return tag(floor, inexact);
    }

    private static long viaBigInteger(final long a, final int e, final int s) {
        BigInteger numerator = BigInteger.valueOf(a);
        int twos = e + s;
        if (s >= 0) {
            numerator = numerator.multiply(fivePower(s));
            if (twos >= 0) {
                return tag(numerator.shiftLeft(twos), false);
            }
            boolean inexact = numerator.getLowestSetBit() < -twos;
            return tag(numerator.shiftRight(-twos), inexact);
        }
        BigInteger denominator = fivePower(-s);
        if (twos >= 0) {
            numerator = numerator.shiftLeft(twos);
        } else {
            denominator = denominator.shiftLeft(-twos);
        }
        BigInteger[] quotientAndRemainder = numerator.divideAndRemainder(denominator);
        return tag(quotientAndRemainder[0], quotientAndRemainder[1].signum() != 0);
    }

    private static long tag(final BigInteger floor, final boolean inexact) {
        return floor.bitLength() > MAX_FLOOR_BITS ? TOO_LARGE : tag(floor.longValue(), inexact);
    }

    private static long tag(final long floor, final boolean inexact) {
        return (floor >>> MAX_FLOOR_BITS) != 0 ? TOO_LARGE : floor << 1 | (inexact ? 1 : 0);
    }

    /** 5^n; the array is filled lazily (BigInteger is immutable, so a racing fill is harmless). */
    private static BigInteger fivePower(final int n) {
        if (n >= BIG_FIVE_TO_THE.length) {
            return BigInteger.valueOf(5).pow(n);
        }
        BigInteger power = BIG_FIVE_TO_THE[n];
        if (power == null) {
            power = BigInteger.valueOf(5).pow(n);
            BIG_FIVE_TO_THE[n] = power;
        }
        return power;
    }
}
