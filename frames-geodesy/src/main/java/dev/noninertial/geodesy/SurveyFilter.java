package dev.noninertial.geodesy;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * A zero-phase Gaussian low-pass filter for the time series of a gravity survey, sampled at a
 * constant interval. Survey corrections computed from a logged track carry the track's noise: the
 * vertical acceleration {@code d2h/dt2} amplifies height noise by about {@code 1/h^2}
 * ({@code h} the sample interval), so that centimetres of noise at 10 Hz become hundreds of
 * m/s^2. Gravimetry therefore filters every term of the reduction with the same filter; this one
 * gives the library's terms a filter with a stated, exact response.
 *
 * <p><b>Definition.</b> The kernel is the normal density of standard deviation {@code sigma}
 * (s), sampled at the series' interval, cut at {@value #REACH} sigma on either side and scaled to
 * sum to one; the output at a sample is the weighted mean of the input around it. Constants and
 * straight lines pass unchanged (the kernel is symmetric and sums to one); a sinusoid of frequency
 * {@code f} is scaled by {@link #gainAt(double)} {@code = exp(-(2 pi f sigma)^2 / 2)}, the Fourier
 * transform of the Gaussian (the cut changes it by less than 1e-6; sampling by less than
 * {@code exp(-2 pi^2 sigma^2 / h^2)}), with no phase shift.
 *
 * <p><b>Edges.</b> Nothing is extrapolated: the output holds only the samples whose whole kernel
 * lies inside the series, {@link #margin(double)} samples fewer at each end.
 *
 * <p>Immutable, thread-safe and serializable. Results are for survey processing and analysis, not
 * for primary navigation.
 */
public final class SurveyFilter implements Serializable {

    /** Half-width of the kernel in standard deviations. */
    public static final double REACH = 5.0;
    /** Largest relative departure of a sample interval from the mean interval. */
    public static final double INTERVAL_TOLERANCE = 1e-6;

    private static final long serialVersionUID = 1L;

    /** Standard deviation of the kernel (s). */
    private final double sigma;

    private SurveyFilter(double sigma) {
        this.sigma = sigma;
    }

    /**
     * A Gaussian filter of a given standard deviation.
     *
     * @param sigma standard deviation of the kernel (s), positive and finite
     * @return the filter
     * @throws IllegalArgumentException if {@code sigma} is not positive and finite
     */
    public static SurveyFilter ofSigma(double sigma) {
        Arguments.positive("sigma (s)", sigma);
        return new SurveyFilter(sigma);
    }

    /**
     * A Gaussian filter that halves the amplitude of a sinusoid of the given period:
     * {@code sigma = P sqrt(2 ln 2) / (2 pi)}.
     *
     * @param period period whose amplitude is halved (s), positive and finite
     * @return the filter
     * @throws IllegalArgumentException if {@code period} is not positive and finite
     */
    public static SurveyFilter ofHalfGainPeriod(double period) {
        Arguments.positive("period (s)", period);
        return new SurveyFilter(period * Math.sqrt(2.0 * Math.log(2.0)) / (2.0 * Math.PI));
    }

    /**
     * Returns the standard deviation of the kernel (s).
     *
     * @return the standard deviation of the kernel (s)
     */
    public double sigma() {
        return sigma;
    }

    /**
     * The gain at a frequency: {@code exp(-(2 pi f sigma)^2 / 2)}.
     *
     * @param frequency frequency (Hz), finite
     * @return the factor on a sinusoid's amplitude, in (0, 1]
     * @throws IllegalArgumentException if {@code frequency} is not finite
     */
    public double gainAt(double frequency) {
        Arguments.finite("frequency (Hz)", frequency);
        double x = 2.0 * Math.PI * frequency * sigma;
        return Math.exp(-0.5 * x * x);
    }

    /**
     * The number of samples the output loses at each end for a series sampled at {@code interval}:
     * {@code floor(REACH sigma / interval)}.
     *
     * @param interval sample interval (s), positive and finite, at most {@code sigma}
     * @return samples left out at each end
     * @throws IllegalArgumentException if {@code interval} is out of range
     */
    public int margin(double interval) {
        Arguments.positive("interval (s)", interval);
        if (interval > sigma) {
            throw new IllegalArgumentException("interval must be at most the filter's sigma " + Formats.number(sigma)
                    + " s (a kernel narrower than one sample does not filter), got " + Formats.number(interval) + " s");
        }
        double m = Math.floor(REACH * sigma / interval);
        if (m > Integer.MAX_VALUE / 2 - 1) {
            throw new IllegalArgumentException("interval must give a kernel of fewer than " + (Integer.MAX_VALUE / 2)
                    + " samples a side, got " + Formats.number(interval) + " s for sigma " + Formats.number(sigma)
                    + " s");
        }
        return (int) m;
    }

    /**
     * Filters a series sampled at a constant interval.
     *
     * @param times sample times (s), strictly increasing at a constant interval (within
     *        {@value #INTERVAL_TOLERANCE} of the mean interval)
     * @param values the series, one value per time, finite
     * @return the filtered series at samples {@code margin .. n - 1 - margin}, {@code n - 2 margin}
     *         values
     * @throws IllegalArgumentException if the lengths differ, the interval is not constant or
     *         exceeds sigma, a value is not finite, or the series is shorter than the kernel
     */
    public double[] applyTo(double[] times, double[] values) {
        Arguments.nonNull("times", times);
        Arguments.nonNull("values", values);
        if (values.length != times.length) {
            throw new IllegalArgumentException("values must hold one value per time (" + times.length + "), got "
                    + values.length);
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException("values[" + i + "] must be finite, got " + values[i]);
            }
        }
        double[] w = kernel(times);
        return convolve(w, values);
    }

    /**
     * Filters the four survey quantities of a line (Eotvos correction, vertical acceleration,
     * gravimeter reading, normal gravity) with this filter; each output point keeps the time and
     * position of its centre sample.
     *
     * @param points a line's survey points in time order, at a constant interval
     * @return the filtered points at the samples {@code margin .. n - 1 - margin}
     * @throws IllegalArgumentException as {@link #applyTo(double[], double[])}
     */
    public List<SurveyPoint> applyTo(List<SurveyPoint> points) {
        Arguments.nonNull("points", points);
        int n = points.size();
        double[] t = new double[n];
        double[][] series = new double[4][n];
        for (int i = 0; i < n; i++) {
            SurveyPoint p = Arguments.nonNull("points[" + i + "]", points.get(i));
            t[i] = p.time();
            series[0][i] = p.eotvosCorrection();
            series[1][i] = p.verticalAcceleration();
            series[2][i] = p.gravimeterReading();
            series[3][i] = p.normalGravity();
        }
        double[] w = kernel(t);
        double[][] out = new double[4][];
        for (int k = 0; k < 4; k++) {
            out[k] = convolve(w, series[k]);
        }
        int m = w.length / 2;
        List<SurveyPoint> result = new ArrayList<>(out[0].length);
        for (int i = 0; i < out[0].length; i++) {
            SurveyPoint centre = points.get(i + m);
            result.add(new SurveyPoint(centre.time(), centre.position(), out[0][i], out[1][i], out[2][i], out[3][i]));
        }
        return result;
    }

    /** The normalised kernel for these times, {@code 2 margin + 1} weights; the times checked. */
    private double[] kernel(double[] times) {
        int n = times.length;
        if (n < 2) {
            throw new IllegalArgumentException("times must hold at least 2 samples, got " + n);
        }
        double interval = (times[n - 1] - times[0]) / (n - 1);
        if (!(interval > 0 && interval < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("times must increase and be finite, got " + times[0] + " s to "
                    + times[n - 1] + " s");
        }
        for (int i = 1; i < n; i++) {
            double step = times[i] - times[i - 1];
            if (!(Math.abs(step - interval) <= INTERVAL_TOLERANCE * interval)) {
                throw new IllegalArgumentException("times must be sampled at a constant interval (mean "
                        + Formats.number(interval) + " s, tolerance " + INTERVAL_TOLERANCE + " relative): step " + i
                        + " from " + times[i - 1] + " s to " + times[i] + " s is " + step + " s");
            }
        }
        int m = margin(interval);
        if (n < 2 * m + 1) {
            throw new IllegalArgumentException("times must span the kernel, " + (2 * m + 1) + " samples of "
                    + Formats.number(interval) + " s (" + REACH + " sigma of " + Formats.number(sigma)
                    + " s a side), got " + n + " samples");
        }
        double[] w = new double[2 * m + 1];
        double sum = 0;
        for (int j = -m; j <= m; j++) {
            double x = j * interval / sigma;
            w[j + m] = Math.exp(-0.5 * x * x);
            sum += w[j + m];
        }
        for (int j = 0; j < w.length; j++) {
            w[j] /= sum;
        }
        return w;
    }

    private static double[] convolve(double[] w, double[] values) {
        int m = w.length / 2;
        double[] out = new double[values.length - 2 * m];
        for (int i = 0; i < out.length; i++) {
            double s = 0;
            for (int j = 0; j < w.length; j++) {
                s += w[j] * values[i + j];
            }
            out[i] = s;
        }
        return out;
    }

    /**
     * A stream is untrusted input: the standard deviation is checked again.
     *
     * @param in the stream
     * @throws java.io.IOException if the stream cannot be read or holds an invalid value
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.positive("sigma (s)", sigma);
        } catch (RuntimeException e) {
            throw Arguments.refusedStream(SurveyFilter.class, e);
        }
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof SurveyFilter f && Double.compare(f.sigma, sigma) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(sigma);
    }

    @Override
    public String toString() {
        return "SurveyFilter{Gaussian, sigma " + Formats.number(sigma) + " s, half gain at "
                + Formats.number(2.0 * Math.PI * sigma / Math.sqrt(2.0 * Math.log(2.0))) + " s, cut at " + REACH
                + " sigma}";
    }
}
