package dev.noninertial.frames.dispersion;

/**
 * The SplitMix64 pseudorandom generator (Steele, Lea and Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014): a 64-bit counter advanced by the odd constant
 * {@code 0x9e3779b97f4a7c15} (the "golden gamma"), each state passed through a bijective
 * 64-bit mixing function. The mixing function is Stafford's "variant 13" finalizer, the one
 * adopted by the reference implementation that accompanies the algorithm in the JDK
 * ({@code java.util.SplittableRandom}) and by the published C reference code; the tests check
 * this class against both.
 *
 * <p>Because output {@code n} is {@code mix(seed + (n + 1) * gamma)}, any output can be computed
 * directly without running the sequence: {@link #caseSeed(long, long)} uses this to give every
 * case of a {@link DispersionStudy} its own seed.
 *
 * <p>Not thread-safe: an instance is a small mutable counter, meant to be confined to the one
 * case (one thread) that draws from it. The static methods are pure and thread-safe.
 */
public final class SplitMix64 {

    /** The increment of the state: the odd integer closest to 2^64 / golden ratio. */
    public static final long GOLDEN_GAMMA = 0x9e3779b97f4a7c15L;

    /** 2^-52, scales a 52-bit integer into [0, 1). */
    private static final double UNIT_52 = 0x1.0p-52;

    private long state;

    private SplitMix64(long seed) {
        this.state = seed;
    }

    /**
     * A generator started at a seed; its first output is {@code mix(seed + GOLDEN_GAMMA)}.
     *
     * @param seed any 64-bit value
     * @return a new generator
     */
    public static SplitMix64 of(long seed) {
        return new SplitMix64(seed);
    }

    /**
     * The bijective 64-bit mixing function (Stafford's variant 13 finalizer).
     *
     * @param z any 64-bit value
     * @return the mixed value
     */
    public static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }

    /**
     * The seed of case {@code index} of a study: output number {@code index} (counted from 0)
     * of the SplitMix64 sequence started at {@code masterSeed}, computed directly.
     *
     * @param masterSeed the study's master seed
     * @param index case index, {@code >= 0}
     * @return the case's own seed
     * @throws IllegalArgumentException if {@code index} is negative
     */
    public static long caseSeed(long masterSeed, long index) {
        if (index < 0) {
            throw new IllegalArgumentException("index must be in [0, " + Long.MAX_VALUE + "], got " + index);
        }
        return mix(masterSeed + (index + 1) * GOLDEN_GAMMA);
    }

    /**
     * The next 64-bit output.
     *
     * @return a uniformly distributed 64-bit value
     */
    public long nextLong() {
        state += GOLDEN_GAMMA;
        return mix(state);
    }

    /**
     * The next uniform value strictly inside (0, 1): the top 52 bits of {@link #nextLong()} plus
     * one half, times 2^-52 (exact in double precision). Zero and one never occur, so inverse
     * distribution functions stay finite.
     *
     * @return a value in (0, 1): an odd multiple of 2^-53
     */
    public double nextOpenUnit() {
        return ((nextLong() >>> 12) + 0.5) * UNIT_52;
    }

    @Override
    public String toString() {
        return "SplitMix64[state=0x" + Long.toHexString(state) + "]";
    }
}
