package org.nebulith.format;

import java.math.BigInteger;

/**
 * 10^s as a 126-bit fixed-point number: {@code 10^s * 2^shift = G + d}, {@code 2^125 <= G < 2^126},
 * {@code 0 <= d < 1}, G kept in two 63-bit halves. Entries are made on first use (an entry is an
 * immutable object, so threads that race on the cache see either null or a whole entry).
 *
 * @param high  G / 2^63
 * @param low   G mod 2^63
 * @param shift the power of two G carries
 */
record PowerOfTen(long high, long low, int shift) {

    static final int MIN_EXPONENT = -300;
    static final int MAX_EXPONENT = 350;
    private static final int BITS = 126;
    private static final int HALF_BITS = 63;
    private static final long HALF_MASK = (1L << HALF_BITS) - 1;
    private static final PowerOfTen[] CACHE = new PowerOfTen[MAX_EXPONENT - MIN_EXPONENT + 1];

    /**
     * @param s decimal exponent, {@link #MIN_EXPONENT} to {@link #MAX_EXPONENT}
     * @return 10^s rounded down to 126 bits
     */
    static PowerOfTen of(final int s) {
        PowerOfTen power = CACHE[s - MIN_EXPONENT];
        if (power == null) {
            power = make(s);
            CACHE[s - MIN_EXPONENT] = power;
        }
        return power;
    }

    private static PowerOfTen make(final int s) {
        BigInteger ten = BigInteger.TEN.pow(Math.abs(s));
        int length = ten.bitLength();
        BigInteger g;
        int shift;
        if (s >= 0) {
            shift = BITS - length;
            g = shift >= 0 ? ten.shiftLeft(shift) : ten.shiftRight(-shift);
        } else {
            shift = BITS - 1 + length;
            g = BigInteger.ONE.shiftLeft(shift).divide(ten);
        }
        return new PowerOfTen(g.shiftRight(HALF_BITS).longValueExact(), g.longValue() & HALF_MASK, shift);
    }
}
