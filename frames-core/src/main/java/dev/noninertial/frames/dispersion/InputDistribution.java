package dev.noninertial.frames.dispersion;

import java.io.Serializable;

import org.hipparchus.distribution.RealDistribution;
import org.hipparchus.distribution.continuous.NormalDistribution;
import org.hipparchus.distribution.continuous.UniformRealDistribution;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * The distribution of one input of a {@link DispersionStudy}: normal, uniform, normal truncated
 * to an interval, or any Hipparchus {@link RealDistribution}.
 *
 * <p>A value is drawn by inversion: a uniform number {@code u} in (0, 1) from the case's own
 * generator is mapped through the inverse distribution function, {@code x = F^-1(u)}. For the
 * truncated normal on [lo, hi] the uniform number is first mapped into
 * [F(lo), F(hi)]; when the interval lies above the mean the mirror image below the mean is used
 * instead, so the inversion always works in the accurate lower tail.
 *
 * <p>Immutable, thread-safe and {@link Serializable} (studies travel to cluster executors) as
 * long as a user-supplied Hipparchus distribution is (the Hipparchus ones are).
 */
public final class InputDistribution implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Smallest normal probability a truncation interval must hold (refused below). */
    public static final double MIN_TRUNCATED_MASS = 1e-9;

    /**
     * Smallest probability {@link #atProbability(double)} takes: 2^-53, the smallest value of
     * the case generator ({@link SplitMix64#nextOpenUnit()}); the largest is
     * {@code 1 - MIN_PROBABILITY}. Beyond, the inverse distribution functions of double precision
     * run to infinity (the normal one at about 1e-17).
     */
    public static final double MIN_PROBABILITY = 0x1p-53;

    /** Below this standard normal probability the inversion is refined in the tail. */
    private static final double TAIL = 0x1p-10;

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(0.0, 1.0);

    /** The distribution the values come from (for the truncated kind: the standard normal). */
    @SuppressWarnings("serial") // the Hipparchus distributions made here are serializable
    private final RealDistribution distribution;
    /** Human-readable description with the parameters. */
    private final String text;
    /** Mean (of the untruncated normal for the truncated kind). */
    private final double mean;
    /** Truncated normal: standard deviation of the untruncated normal; NaN otherwise. */
    private final double sigma;
    /** Truncated normal: standard normal probability at the (possibly mirrored) lower bound. */
    private final double lowProbability;
    /** Truncated normal: standard normal probability at the (possibly mirrored) upper bound. */
    private final double highProbability;
    /** Truncated normal: true if the interval lies above the mean and is drawn mirrored. */
    private final boolean mirrored;
    /** True for the truncated normal. */
    private final boolean truncated;

    private InputDistribution(RealDistribution distribution, String text, double mean, double sigma,
            double lowProbability, double highProbability, boolean mirrored, boolean truncated) {
        this.distribution = distribution;
        this.text = text;
        this.mean = mean;
        this.sigma = sigma;
        this.lowProbability = lowProbability;
        this.highProbability = highProbability;
        this.mirrored = mirrored;
        this.truncated = truncated;
    }

    /**
     * A normal (Gaussian) distribution.
     *
     * @param mean mean, finite
     * @param sigma standard deviation, positive and finite
     * @return the distribution
     * @throws IllegalArgumentException if an argument is out of range
     */
    public static InputDistribution normal(double mean, double sigma) {
        Arguments.finite("mean", mean);
        Arguments.positive("sigma", sigma);
        return new InputDistribution(new NormalDistribution(mean, sigma),
                "normal(mean " + Formats.number(mean) + ", sigma " + Formats.number(sigma) + ")",
                mean, sigma, 0.0, 1.0, false, false);
    }

    /**
     * A uniform distribution on [low, high].
     *
     * @param low lower bound, finite
     * @param high upper bound, finite, greater than {@code low}
     * @return the distribution
     * @throws IllegalArgumentException if a bound is not finite or {@code high <= low}
     */
    public static InputDistribution uniform(double low, double high) {
        Arguments.finite("low", low);
        Arguments.finite("high", high);
        if (!(high > low)) {
            throw new IllegalArgumentException("high must be greater than low = " + low + ", got " + high);
        }
        return new InputDistribution(new UniformRealDistribution(low, high),
                "uniform[" + Formats.number(low) + ", " + Formats.number(high) + "]",
                0.5 * (low + high), Double.NaN, 0.0, 1.0, false, false);
    }

    /**
     * A normal distribution truncated to [low, high] (renormalized to the interval).
     *
     * @param mean mean of the untruncated normal, finite
     * @param sigma standard deviation of the untruncated normal, positive and finite
     * @param low lower bound, finite
     * @param high upper bound, finite, greater than {@code low}
     * @return the distribution
     * @throws IllegalArgumentException if an argument is out of range, or if the interval holds
     *         less than {@link #MIN_TRUNCATED_MASS} of the untruncated normal's probability
     */
    public static InputDistribution truncatedNormal(double mean, double sigma, double low, double high) {
        Arguments.finite("mean", mean);
        Arguments.positive("sigma", sigma);
        Arguments.finite("low", low);
        Arguments.finite("high", high);
        if (!(high > low)) {
            throw new IllegalArgumentException("high must be greater than low = " + low + ", got " + high);
        }
        double a = (low - mean) / sigma;
        double b = (high - mean) / sigma;
        boolean mirror = a > 0.0;
        double lo = mirror ? -b : a;
        double hi = mirror ? -a : b;
        double pLow = STANDARD_NORMAL.cumulativeProbability(lo);
        double pHigh = STANDARD_NORMAL.cumulativeProbability(hi);
        if (!(pHigh - pLow >= MIN_TRUNCATED_MASS)) {
            throw new IllegalArgumentException("[low, high] = [" + low + ", " + high + "] must hold at least "
                    + MIN_TRUNCATED_MASS + " of the probability of the normal with mean " + mean + " and sigma "
                    + sigma + ", holds " + (pHigh - pLow) + " (the interval lies " + Formats.number(Math.min(
                            Math.abs(a), Math.abs(b))) + " sigma from the mean: move mean or widen sigma)");
        }
        return new InputDistribution(STANDARD_NORMAL,
                "truncatedNormal(mean " + Formats.number(mean) + ", sigma " + Formats.number(sigma)
                        + ", [" + Formats.number(low) + ", " + Formats.number(high) + "])",
                mean, sigma, pLow, pHigh, mirror, true);
    }

    /**
     * Any Hipparchus distribution, drawn by its inverse distribution function.
     *
     * @param distribution the distribution; should be {@link Serializable} for cluster runs
     * @return the input distribution
     * @throws NullPointerException if {@code distribution} is null
     */
    public static InputDistribution of(RealDistribution distribution) {
        Arguments.nonNull("distribution", distribution);
        return new InputDistribution(distribution, distribution.getClass().getSimpleName()
                + "(mean " + Formats.number(distribution.getNumericalMean()) + ")",
                distribution.getNumericalMean(), Double.NaN, 0.0, 1.0, false, false);
    }

    /**
     * The value at a probability: the inverse distribution function.
     *
     * @param u probability in [{@link #MIN_PROBABILITY}, 1 - {@link #MIN_PROBABILITY}], the range
     *        of the case generator
     * @return the value {@code x} with {@code P(X <= x) = u}, finite
     * @throws IllegalArgumentException if {@code u} is outside that range, or a distribution given
     *         to {@link #of(RealDistribution)} has an infinite value there
     */
    public double atProbability(double u) {
        if (!(u >= MIN_PROBABILITY && u <= 1.0 - MIN_PROBABILITY)) {
            throw new IllegalArgumentException("u must be in [" + MIN_PROBABILITY + ", " + (1.0 - MIN_PROBABILITY)
                    + "] (the range of the case generator), got " + u);
        }
        double x = draw(u);
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException("u = " + u + " gives the non-finite value " + x + " of " + text);
        }
        return x;
    }

    /** Inversion without the argument check (the generator only makes values in (0, 1)). */
    double draw(double u) {
        if (!truncated) {
            return distribution.inverseCumulativeProbability(u);
        }
        double p = mirrored ? lowProbability + (1.0 - u) * (highProbability - lowProbability)
                : lowProbability + u * (highProbability - lowProbability);
        double z = standardQuantile(p);
        return mirrored ? mean - sigma * z : mean + sigma * z;
    }

    /**
     * The standard normal inverse distribution function, accurate in the lower tail: Hipparchus'
     * inversion works on {@code 2p - 1}, which loses the digits of a small {@code p} (and gives
     * -infinity below about 1e-17), so there it is refined by Newton steps on
     * {@code ln Phi(z) = ln p}, with Phi from the complementary error function. {@code ln Phi} is
     * concave, so the steps converge from below without overshooting.
     */
    private static double standardQuantile(double p) {
        double z = STANDARD_NORMAL.inverseCumulativeProbability(p);
        if (p >= TAIL) {
            return z;
        }
        if (!Double.isFinite(z)) {
            z = -Math.sqrt(-2.0 * Math.log(p));   // below the root: ln Phi(z) < ln p there
        }
        double logP = Math.log(p);
        for (int i = 0; i < 60; i++) {
            double phi = STANDARD_NORMAL.cumulativeProbability(z);
            double step = (Math.log(phi) - logP) * phi / STANDARD_NORMAL.density(z);
            z -= step;
            if (!(Math.abs(step) > 1e-15 * Math.abs(z))) {
                break;
            }
        }
        return z;
    }

    /**
     * The underlying Hipparchus distribution (for a truncated normal: the standard normal that is
     * inverted before scaling).
     *
     * @return the distribution
     */
    public RealDistribution distribution() {
        return distribution;
    }

    @Override
    public String toString() {
        return text;
    }
}
