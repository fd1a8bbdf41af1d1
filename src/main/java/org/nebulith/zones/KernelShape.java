package org.nebulith.zones;

/** The radial weight profile of a feeding zone. */
public enum KernelShape {
    /** w = 1 for |r - r_c| &lt;= half_width, else 0. */
    TOPHAT("tophat", 1.0),
    /**
     * w = exp(-(r - r_c)^2 / (2 sigma^2)) with sigma = half_width, truncated at
     * {@link #GAUSSIAN_TRUNCATION_SIGMA} sigma (w = 0 beyond; the truncation drops 0.27 % of the
     * weight of an untruncated Gaussian).
     */
    GAUSSIAN("gaussian", 3.0);

    /** Truncation of the Gaussian kernel, in sigma. */
    public static final double GAUSSIAN_TRUNCATION_SIGMA = 3.0;

    private final String token;
    private final double supportInHalfWidths;

    KernelShape(String token, double supportInHalfWidths) {
        this.token = token;
        this.supportInHalfWidths = supportInHalfWidths;
    }

    /** @return the spelling in zone files */
    public String token() {
        return token;
    }

    /** @return the kernel's half support in units of half_width */
    public double supportInHalfWidths() {
        return supportInHalfWidths;
    }

    /**
     * @param rAU       radius [AU]
     * @param centerAU  zone centre [AU]
     * @param halfWidth half width or sigma [AU]
     * @return the weight, in [0, 1]
     */
    public double weight(double rAU, double centerAU, double halfWidth) {
        double x = Math.abs(rAU - centerAU) / halfWidth;
        if (x > supportInHalfWidths) {
            return 0.0;
        }
        return this == TOPHAT ? 1.0 : Math.exp(-0.5 * x * x);
    }

    /** @return the shape spelled token, or null */
    public static KernelShape fromToken(String token) {
        for (KernelShape k : values()) {
            if (k.token.equals(token.strip())) {
                return k;
            }
        }
        return null;
    }
}
