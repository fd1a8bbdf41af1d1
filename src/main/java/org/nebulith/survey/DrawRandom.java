package org.nebulith.survey;

import java.nio.charset.StandardCharsets;

/**
 * The random stream of one Monte Carlo draw, derived only from (seed, star name, draw index), so
 * that a star's draws are the same on any thread, in any order, on any machine.
 *
 * <p>Derivation (stable; changing it changes every survey result):
 * <pre>
 *   h = FNV-1a-64(UTF-8 bytes of the star name)      offset basis 0xcbf29ce484222325, prime 0x100000001b3
 *   a = mix(seed + G),  b = mix((a ^ h) + G),  state = mix((b ^ draw) + G)
 *   next() : state += G; return mix(state)           (SplitMix64, Steele, Lea &amp; Flood 2014)
 * </pre>
 * with G = 0x9E3779B97F4A7C15 and mix the SplitMix64 finaliser (shifts 30, 27, 31; multipliers
 * 0xBF58476D1CE4E5B9, 0x94D049BB133111EB). From a given state the sequence equals
 * {@code new java.util.SplittableRandom(state).nextLong()}. Normal deviates come from the
 * Box-Muller transform (both values used, cosine first) of uniforms u1 = (k + 1) 2^-53 in (0, 1]
 * and u2 = k 2^-53 in [0, 1), k the top 53 bits; {@link StrictMath} makes them bit-identical on
 * every Java platform. Not thread-safe: one instance per draw.
 */
public final class DrawRandom {

    static final long GOLDEN = 0x9E3779B97F4A7C15L;
    private static final double ULP53 = 0x1.0p-53;

    private long state;
    private double spare;
    private boolean hasSpare;

    private DrawRandom(long state) {
        this.state = state;
    }

    /**
     * @param seed the run's seed
     * @param star the star's name
     * @param draw the draw index (0-based)
     * @return the draw's generator
     */
    public static DrawRandom forDraw(long seed, String star, long draw) {
        long a = mix(seed + GOLDEN);
        long b = mix((a ^ fnv1a64(star)) + GOLDEN);
        return new DrawRandom(mix((b ^ draw) + GOLDEN));
    }

    /** @return the generator starting from a raw SplitMix64 state (tests) */
    static DrawRandom fromState(long state) {
        return new DrawRandom(state);
    }

    /** @return the next 64 random bits */
    public long nextLong() {
        state += GOLDEN;
        return mix(state);
    }

    /** @return a standard normal deviate (mean 0, standard deviation 1) */
    public double nextGaussian() {
        if (hasSpare) {
            hasSpare = false;
            return spare;
        }
        double u1 = ((nextLong() >>> 11) + 1) * ULP53;
        double u2 = (nextLong() >>> 11) * ULP53;
        double r = StrictMath.sqrt(-2.0 * StrictMath.log(u1));
        double angle = 2.0 * StrictMath.PI * u2;
        spare = r * StrictMath.sin(angle);
        hasSpare = true;
        return r * StrictMath.cos(angle);
    }

    /** The SplitMix64 finaliser (Stafford's variant 13). */
    static long mix(long x) {
        long z = (x ^ (x >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** @return the 64-bit FNV-1a hash of the UTF-8 bytes of text */
    static long fnv1a64(String text) {
        long h = 0xcbf29ce484222325L;
        for (byte b : text.getBytes(StandardCharsets.UTF_8)) {
            h ^= b & 0xff;
            h *= 0x100000001b3L;
        }
        return h;
    }
}
