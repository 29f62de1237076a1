package dev.noninertial.geodesy.air;

import java.io.Serializable;
import java.util.Arrays;
import java.util.Locale;

import dev.noninertial.frames.Arguments;

/**
 * A drag coefficient as a function of Mach number, from a user table, interpolated by the
 * monotone piecewise cubic Hermite method of Fritsch and Carlson ("Monotone piecewise cubic
 * interpolation", SIAM J. Numer. Anal. 17(2), 1980, pp. 238-246).
 *
 * <pre>{@code
 * DragCurve cd = DragCurve.of(new double[] {0.0, 0.8, 1.0, 1.2, 3.0},
 *                             new double[] {0.30, 0.32, 0.55, 0.60, 0.45});
 * double c = cd.at(0.9);
 * }</pre>
 *
 * <h2>Method</h2>
 * On each interval {@code [M_k, M_k+1]} the curve is the cubic Hermite polynomial through the two
 * table values with slopes {@code m_k}, {@code m_k+1}. Slopes start as the mean of the two
 * neighbouring secants {@code d_k} (the end slopes as the end secants), are set to zero where the
 * secants change sign or vanish, and are scaled by {@code 3 / sqrt(alpha^2 + beta^2)} where
 * {@code alpha^2 + beta^2 > 9}, {@code alpha = m_k / d_k}, {@code beta = m_k+1 / d_k}
 * (Fritsch and Carlson's sufficient condition). Hence the curve is monotone on every interval and
 * never leaves the range of that interval's two table values: no overshoot at a transonic rise.
 * It passes through every table point and has a continuous first derivative.
 *
 * <p>Mach numbers outside the table are refused, never extrapolated. Immutable and thread-safe;
 * {@link #at(double)} computes on primitives and allocates nothing.
 */
public final class DragCurve implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Mach numbers, strictly increasing. */
    private final double[] mach;
    /** Drag coefficients at the Mach numbers. */
    private final double[] coefficient;
    /** Fritsch-Carlson slopes dCd/dM at the Mach numbers. */
    private final double[] slope;

    private DragCurve(double[] mach, double[] coefficient) {
        this.mach = mach;
        this.coefficient = coefficient;
        this.slope = slopes(mach, coefficient);
    }

    /**
     * A drag curve from a table.
     *
     * @param machNumbers at least two Mach numbers, finite, non-negative, strictly increasing
     * @param dragCoefficients as many drag coefficients, finite and non-negative
     * @return the curve (the arrays are copied)
     * @throws IllegalArgumentException if the table is too short, the lengths differ, a Mach
     *         number is negative, not finite or not above its predecessor, or a coefficient is
     *         negative or not finite
     * @throws NullPointerException if an array is null
     */
    public static DragCurve of(double[] machNumbers, double[] dragCoefficients) {
        Arguments.nonNull("machNumbers", machNumbers);
        Arguments.nonNull("dragCoefficients", dragCoefficients);
        if (machNumbers.length < 2) {
            throw new IllegalArgumentException("machNumbers must hold at least 2 values, got " + machNumbers.length);
        }
        if (dragCoefficients.length != machNumbers.length) {
            throw new IllegalArgumentException("dragCoefficients must hold as many values as machNumbers ("
                    + machNumbers.length + "), got " + dragCoefficients.length);
        }
        for (int i = 0; i < machNumbers.length; i++) {
            Arguments.inRange("machNumbers[" + i + "]", machNumbers[i], 0.0, Double.MAX_VALUE);
            Arguments.inRange("dragCoefficients[" + i + "]", dragCoefficients[i], 0.0, Double.MAX_VALUE);
            if (i > 0 && !(machNumbers[i] > machNumbers[i - 1])) {
                throw new IllegalArgumentException("machNumbers must be strictly increasing: machNumbers[" + i
                        + "] = " + machNumbers[i] + " is not above machNumbers[" + (i - 1) + "] = "
                        + machNumbers[i - 1]);
            }
        }
        return new DragCurve(machNumbers.clone(), dragCoefficients.clone());
    }

    /**
     * The same drag coefficient at every Mach number from 0 up (a subsonic body, or a
     * coefficient folded into a ballistic coefficient).
     *
     * @param dragCoefficient the coefficient, finite and non-negative
     * @return the curve
     * @throws IllegalArgumentException if the coefficient is negative or not finite
     */
    public static DragCurve constant(double dragCoefficient) {
        Arguments.inRange("dragCoefficient", dragCoefficient, 0.0, Double.MAX_VALUE);
        return new DragCurve(new double[] {0.0, Double.MAX_VALUE}, new double[] {dragCoefficient, dragCoefficient});
    }

    /**
     * Returns the smallest Mach number of the table.
     *
     * @return the smallest Mach number of the table
     */
    public double minMach() {
        return mach[0];
    }

    /**
     * Returns the largest Mach number of the table.
     *
     * @return the largest Mach number of the table
     */
    public double maxMach() {
        return mach[mach.length - 1];
    }

    /**
     * Returns the number of table points.
     *
     * @return the number of table points
     */
    public int size() {
        return mach.length;
    }

    /**
     * The drag coefficient at a Mach number.
     *
     * @param machNumber Mach number, within [{@link #minMach()}, {@link #maxMach()}]
     * @return drag coefficient, between the two table values of the interval holding it
     * @throws IllegalArgumentException if {@code machNumber} is outside the table or NaN
     */
    public double at(double machNumber) {
        if (!(machNumber >= mach[0] && machNumber <= mach[mach.length - 1])) {
            throw new IllegalArgumentException("machNumber must be in [" + mach[0] + ", " + mach[mach.length - 1]
                    + "] (the drag table), got " + machNumber);
        }
        int k = Arrays.binarySearch(mach, machNumber);
        if (k >= 0) {
            return coefficient[k];
        }
        k = -k - 2;                       // interval [mach[k], mach[k + 1]]
        double y0 = coefficient[k];
        double y1 = coefficient[k + 1];
        if (y0 == y1) {
            return y0;                    // Fritsch-Carlson slopes are zero here: the cubic is flat
        }
        double h = mach[k + 1] - mach[k];
        double t = (machNumber - mach[k]) / h;
        double u = 1.0 - t;
        // cubic Hermite basis on [0, 1]
        return (1.0 + 2.0 * t) * u * u * y0 + t * t * (3.0 - 2.0 * t) * y1
                + h * t * u * (u * slope[k] - t * slope[k + 1]);
    }

    /**
     * The slope {@code dCd/dM} of the curve at a table point (Fritsch-Carlson).
     *
     * @param index table index, in [0, {@link #size()})
     * @return slope at that Mach number (1 per unit Mach)
     * @throws IllegalArgumentException if the index is outside the table
     */
    public double slopeAt(int index) {
        if (index < 0 || index >= mach.length) {
            throw new IllegalArgumentException("index must be in [0, " + (mach.length - 1) + "], got " + index);
        }
        return slope[index];
    }

    /** Fritsch-Carlson slopes. */
    private static double[] slopes(double[] x, double[] y) {
        int n = x.length;
        double[] d = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            d[k] = (y[k + 1] - y[k]) / (x[k + 1] - x[k]);
        }
        double[] m = new double[n];
        m[0] = d[0];
        m[n - 1] = d[n - 2];
        for (int k = 1; k < n - 1; k++) {
            m[k] = d[k - 1] * d[k] <= 0.0 ? 0.0 : 0.5 * (d[k - 1] + d[k]);
        }
        for (int k = 0; k < n - 1; k++) {
            if (d[k] == 0.0) {
                m[k] = 0.0;
                m[k + 1] = 0.0;
                continue;
            }
            double alpha = m[k] / d[k];
            double beta = m[k + 1] / d[k];
            double s = alpha * alpha + beta * beta;
            if (s > 9.0) {
                double tau = 3.0 / Math.sqrt(s);
                m[k] = tau * alpha * d[k];
                m[k + 1] = tau * beta * d[k];
            }
        }
        return m;
    }

    @Override
    public String toString() {
        if (mach[mach.length - 1] == Double.MAX_VALUE && mach.length == 2 && coefficient[0] == coefficient[1]) {
            return String.format(Locale.ROOT, "DragCurve{Cd=%s at every Mach number}", coefficient[0]);
        }
        return String.format(Locale.ROOT, "DragCurve{%d points, Mach %s to %s, Cd %s to %s, monotone cubic}",
                mach.length, mach[0], mach[mach.length - 1], Arrays.stream(coefficient).min().getAsDouble(),
                Arrays.stream(coefficient).max().getAsDouble());
    }
}
