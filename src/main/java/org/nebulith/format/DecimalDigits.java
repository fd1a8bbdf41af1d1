package org.nebulith.format;

import java.math.BigDecimal;

/**
 * A decimal {@code unscaled * 10^-scale} with no trailing zeros in {@code unscaled} (the canonical
 * form {@link BigDecimal#stripTrailingZeros} gives), at most 18 digits, sign carried by
 * {@code unscaled}.
 *
 * @param unscaled the digits, non-zero, no trailing zeros
 * @param scale    the power of ten to divide by
 */
record DecimalDigits(long unscaled, int scale) {

    /** @return the same number as a BigDecimal */
    BigDecimal toBigDecimal() {
        return BigDecimal.valueOf(unscaled, scale);
    }

    /**
     * @param stripped a non-zero BigDecimal without trailing zeros and of at most 18 digits
     * @return the same number
     */
    static DecimalDigits of(final BigDecimal stripped) {
        return new DecimalDigits(stripped.unscaledValue().longValueExact(), stripped.scale());
    }

    /** @return the decimal exponent of the leading digit ({@code 2} for 150, {@code -4} for 0.00012) */
    int exponent() {
        return DigitsText.digitCount(Math.abs(unscaled)) - scale - 1;
    }
}
