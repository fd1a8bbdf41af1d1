package org.nebulith.planet;

/**
 * How the core is formed from the condensed inventory.
 *
 * @param sulfideInCore true (default): sulfide phases join the metal in the core; false keeps
 *                      them in the mantle
 * @param coreSiWtPct   Si in the final core [wt%], taken from the mantle budget (default 0)
 * @param coreOWtPct    O in the final core [wt%], taken from the mantle budget (default 0)
 */
public record CoreOptions(boolean sulfideInCore, double coreSiWtPct, double coreOWtPct) {
    public CoreOptions {
        if (!(coreSiWtPct >= 0) || !(coreOWtPct >= 0) || !(coreSiWtPct + coreOWtPct < 50)) {
            throw new IllegalArgumentException("core Si and O wt% must be >= 0 and together < 50, got "
                    + coreSiWtPct + " and " + coreOWtPct);
        }
    }

    /** @return sulfide in the core, no light elements added */
    public static CoreOptions defaults() {
        return new CoreOptions(true, 0, 0);
    }
}
