package dev.noninertial.frames.motion;

import java.io.IOException;
import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Reader;
import java.io.Serializable;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.function.IntFunction;

import org.hipparchus.geometry.euclidean.threed.Rotation;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;

/**
 * The motion of a frame F in its parent B known from a recording: time stamps with the origin
 * position and the attitude, optionally with measured origin velocities and angular rates.
 *
 * <h2>Conventions</h2>
 * SI units inside. Positions and velocities are those of F's origin seen from B, resolved in B
 * axes. An attitude is the orientation of F in B in the library convention (see
 * {@link Orientations}): the unit quaternion {@code (q0, q1, q2, q3)}, scalar first, of the
 * Hipparchus {@link Rotation} whose {@code applyTo} maps B components to F components; a frame
 * turned by {@code a} about unit axis {@code n} has {@code (cos(a/2), sin(a/2) n)}. Angular rates
 * are the angular velocity of F relative to B resolved in F axes (what body-fixed gyros measure).
 * With this convention the quaternion obeys {@code q' = q (0, w) / 2} (Hamilton product).
 *
 * <h2>Interpolation</h2>
 * Every output comes from one piecewise polynomial per quantity, so rates are the exact time
 * derivatives of what is reported:
 * <ul>
 *   <li>At every sample a first and a second derivative are fixed: the derivatives at that sample
 *       of the polynomial through the five nearest samples of its run (a quartic), or, where a
 *       measured value exists, the measured velocity (or {@code q (0, w) / 2} for measured rates)
 *       as first derivative and the derivative of the quartic through the five nearest measured
 *       values as second derivative.</li>
 *   <li>Between two samples each component is the quintic Hermite polynomial matching value, first
 *       and second derivative at both ends. Value, first and second derivative are therefore
 *       continuous across samples (C2), and the scheme is local: a sample influences only the
 *       segments within three samples of it.</li>
 *   <li>Position, velocity and acceleration are the quintic and its derivatives. The attitude is
 *       the quintic {@code p(t)} through the sign-aligned quaternion components, normalised:
 *       {@code q = p / |p|}; then {@code w = 2 vec(p* p') / |p|^2} and
 *       {@code al = 2 vec(p* p'') / |p|^2 - 2 (p . p') w / |p|^2}, the exact derivatives of
 *       that normalised curve.</li>
 * </ul>
 * On uniform samples of a smooth motion the errors shrink like {@code h^5} for position and
 * attitude, {@code h^4} for velocity and angular velocity and {@code h^3} for acceleration and
 * angular acceleration ({@code h} the sample interval); the accuracy report of the documentation
 * lists measured figures. Runs of fewer than five samples use all their samples (lower degree).
 *
 * <h2>Refusals</h2>
 * Construction refuses, naming the sample: fewer than two samples, times that are not finite or
 * do not increase strictly, non-finite values, quaternions whose norm differs from 1 by more than
 * {@link Orientations#QUATERNION_TOLERANCE} (those within are normalised), and attitudes that
 * turn by more than {@link #MAX_TURN_BETWEEN_SAMPLES} radians between consecutive samples (such a
 * record is under-sampled: the sense of the turn is ambiguous). Queries before the first or after
 * the last sample, or strictly inside a gap longer than {@link #maxGap()}, are refused: nothing is
 * extrapolated. Samples separated by such a gap belong to different runs, which are interpolated
 * independently.
 *
 * <h2>Storage</h2>
 * Samples live in primitive arrays of doubles, never one object per sample: 64 bytes per sample
 * for time, position and attitude, plus 24 bytes per sample for each measured kind (velocities,
 * angular rates), so 64, 88 or 112 bytes per sample. Nothing is held in reduced precision: the
 * accelerations of a record with measured rates come from differentiating those rates, so any
 * rounding of them would be amplified by the inverse sample interval.
 *
 * <p>Immutable, thread-safe and serializable. A query costs a binary search and a few hundred
 * floating-point operations and allocates only its {@link Placement}.
 */
public final class SampledMotion implements Motion, Serializable {

    /** Largest turn of the attitude between consecutive samples, in radians (90 degrees). */
    public static final double MAX_TURN_BETWEEN_SAMPLES = 0.5 * Math.PI;

    private static final long serialVersionUID = 1L;

    /** Smallest dot product of consecutive aligned quaternions: cos(MAX_TURN / 2). */
    private static final double MIN_ALIGNED_DOT = Math.cos(0.5 * MAX_TURN_BETWEEN_SAMPLES);

    private final double[] times;
    /** x, y, z per sample, B axes. */
    private final double[] positions;
    /** q0..q3 per sample, unit, each with non-negative dot product with its predecessor. */
    private final double[] attitudes;
    /** measured origin velocity per sample in B axes, or null. */
    private final double[] velocities;
    /** measured angular velocity per sample in F axes, or null. */
    private final double[] rates;
    private final double maxGap;

    private SampledMotion(double[] times, double[] positions, double[] attitudes, double[] velocities,
                          double[] rates, double maxGap) {
        this.times = times;
        this.positions = positions;
        this.attitudes = attitudes;
        this.velocities = velocities;
        this.rates = rates;
        this.maxGap = maxGap;
    }

    // ------------------------------------------------------------------ factories

    /**
     * A sampled motion from primitive arrays with attitudes as quaternions. The arrays are copied.
     *
     * @param times sample times (s from the user's epoch), finite, strictly increasing, at least two
     * @param positions origin of F in B axes, packed {@code x0, y0, z0, x1, ...} (m), length
     *        {@code 3 * times.length}
     * @param quaternions orientation of F in B, packed {@code q0, q1, q2, q3} per sample, scalar
     *        first, library convention (maps B components to F components), each unit within
     *        {@link Orientations#QUATERNION_TOLERANCE}; length {@code 4 * times.length}
     * @return the motion, without gap limit
     * @throws NullPointerException if an array is null
     * @throws IllegalArgumentException if a length is wrong or a sample is refused (the message names
     *         the sample index), see the class comment
     */
    public static SampledMotion fromArrays(double[] times, double[] positions, double[] quaternions) {
        Arguments.nonNull("times", times);
        Arguments.nonNull("positions", positions);
        Arguments.nonNull("quaternions", quaternions);
        checkLength("positions", positions.length, 3, times.length);
        checkLength("quaternions", quaternions.length, 4, times.length);
        return build(times.clone(), positions.clone(), quaternions.clone(), null, null,
                Double.POSITIVE_INFINITY, SampledMotion::sampleLabel);
    }

    /**
     * A sampled motion from primitive arrays with attitudes as yaw, pitch and roll (aerospace z-y-x
     * sequence of {@link Orientations#fromYawPitchRoll(double, double, double)}).
     *
     * @param times sample times (s), finite, strictly increasing, at least two
     * @param positions origin of F in B axes, packed {@code x, y, z} per sample (m)
     * @param yawPitchRoll packed {@code yaw, pitch, roll} per sample (rad)
     * @return the motion, without gap limit
     * @throws NullPointerException if an array is null
     * @throws IllegalArgumentException if a length is wrong or a sample is refused (the message names
     *         the sample index)
     */
    public static SampledMotion fromArraysYawPitchRoll(double[] times, double[] positions,
                                                       double[] yawPitchRoll) {
        Arguments.nonNull("times", times);
        Arguments.nonNull("positions", positions);
        Arguments.nonNull("yawPitchRoll", yawPitchRoll);
        checkLength("positions", positions.length, 3, times.length);
        checkLength("yawPitchRoll", yawPitchRoll.length, 3, times.length);
        double[] q = new double[4 * times.length];
        for (int i = 0; i < times.length; i++) {
            for (int k = 0; k < 3; k++) {
                double angle = yawPitchRoll[3 * i + k];
                if (!Double.isFinite(angle)) {
                    throw new IllegalArgumentException(sampleLabel(i) + ": yawPitchRoll[" + (3 * i + k) + "] ("
                            + ANGLE_NAMES[k] + ") must be finite, got " + angle);
                }
            }
            Rotation r = Orientations.fromYawPitchRoll(yawPitchRoll[3 * i], yawPitchRoll[3 * i + 1],
                    yawPitchRoll[3 * i + 2]);
            q[4 * i] = r.getQ0();
            q[4 * i + 1] = r.getQ1();
            q[4 * i + 2] = r.getQ2();
            q[4 * i + 3] = r.getQ3();
        }
        return build(times.clone(), positions.clone(), q, null, null, Double.POSITIVE_INFINITY,
                SampledMotion::sampleLabel);
    }

    /**
     * Reads a motion log file in the format described on the documentation page "Sampled motion":
     * comment lines starting with {@code #}, one header row naming columns with units in brackets
     * (for example {@code t[s], x[m], y[m], z[m], yaw[deg], pitch[deg], roll[deg]}), then one
     * comma-separated row per sample.
     *
     * @param file the file, UTF-8
     * @return the motion, without gap limit
     * @throws IOException if the file cannot be read
     * @throws IllegalArgumentException if the header or a row is refused; the message names the file
     *         and the line number
     */
    public static SampledMotion readCsv(Path file) throws IOException {
        Arguments.nonNull("file", file);
        return MotionLogFile.read(file).toMotion();
    }

    /**
     * Reads a motion log in the same format from a reader (for example a class-path resource).
     *
     * @param source the text; read to its end but not closed
     * @param sourceName name used in error messages, for example the resource name
     * @return the motion, without gap limit
     * @throws IOException if reading fails
     * @throws IllegalArgumentException if the header or a row is refused; the message names
     *         {@code sourceName} and the line number
     */
    public static SampledMotion readCsv(Reader source, String sourceName) throws IOException {
        Arguments.nonNull("source", source);
        Arguments.nonNull("sourceName", sourceName);
        return MotionLogFile.read(source, sourceName).toMotion();
    }

    /** Used by the file reader: arrays are taken over, labels name file lines. */
    static SampledMotion fromParsed(double[] times, double[] positions, double[] quaternions,
                                    double[] velocities, double[] rates, IntFunction<String> label) {
        return build(times, positions, quaternions, velocities, rates, Double.POSITIVE_INFINITY, label);
    }

    // ------------------------------------------------------------------ copies

    /**
     * A copy that uses measured origin velocities as first derivatives of the position (see the
     * class comment).
     *
     * @param originVelocities velocity of F's origin seen from B, in B axes, packed {@code vx, vy, vz}
     *        per sample (m/s), length {@code 3 * sampleCount()}, finite
     * @return the copy
     * @throws NullPointerException if the array is null
     * @throws IllegalArgumentException if the length is wrong or a value is not finite (naming the
     *         sample index)
     */
    public SampledMotion withVelocities(double[] originVelocities) {
        Arguments.nonNull("originVelocities", originVelocities);
        checkLength("originVelocities", originVelocities.length, 3, times.length);
        double[] v = finiteCopy("originVelocities", originVelocities);
        return new SampledMotion(times, positions, attitudes, v, rates, maxGap);
    }

    /**
     * A copy that uses measured angular rates as first derivatives of the attitude (see the class
     * comment).
     *
     * @param angularVelocities angular velocity of F relative to B resolved in F axes, packed
     *        {@code wx, wy, wz} per sample (rad/s), length {@code 3 * sampleCount()}, finite
     * @return the copy
     * @throws NullPointerException if the array is null
     * @throws IllegalArgumentException if the length is wrong or a value is not finite (naming the
     *         sample index)
     */
    public SampledMotion withAngularRates(double[] angularVelocities) {
        Arguments.nonNull("angularVelocities", angularVelocities);
        checkLength("angularVelocities", angularVelocities.length, 3, times.length);
        double[] w = finiteCopy("angularVelocities", angularVelocities);
        return new SampledMotion(times, positions, attitudes, velocities, w, maxGap);
    }

    /**
     * A copy that refuses queries strictly inside any interval between consecutive samples longer
     * than {@code seconds}, and interpolates the runs of samples on either side of such a gap
     * independently.
     *
     * @param seconds longest interval between samples still interpolated (s), positive; use
     *        {@code Double.POSITIVE_INFINITY} for no limit
     * @return the copy
     * @throws IllegalArgumentException if {@code seconds} is not positive or is NaN
     */
    public SampledMotion withMaxGap(double seconds) {
        if (!(seconds > 0.0)) {
            throw new IllegalArgumentException("seconds (max gap) must be positive, got " + seconds);
        }
        return new SampledMotion(times, positions, attitudes, velocities, rates, seconds);
    }

    // ------------------------------------------------------------------ accessors

    /** @return number of samples */
    public int sampleCount() {
        return times.length;
    }

    /** @return time of the first sample (s) */
    public double start() {
        return times[0];
    }

    /** @return time of the last sample (s) */
    public double end() {
        return times[times.length - 1];
    }

    /**
     * Time of one sample.
     *
     * @param index sample index in [0, sampleCount() - 1]
     * @return its time (s)
     * @throws IndexOutOfBoundsException if {@code index} is outside the range
     */
    public double sampleTime(int index) {
        if (index < 0 || index >= times.length) {
            throw new IndexOutOfBoundsException("index must be in [0, " + (times.length - 1) + "], got " + index);
        }
        return times[index];
    }

    /** @return longest interval between samples that is still interpolated (s), infinite if no limit */
    public double maxGap() {
        return maxGap;
    }

    /** @return whether measured origin velocities are used */
    public boolean hasMeasuredVelocities() {
        return velocities != null;
    }

    /** @return whether measured angular rates are used */
    public boolean hasMeasuredAngularRates() {
        return rates != null;
    }

    /**
     * Whether {@link #at(double)} answers at {@code t}: inside the recorded span and not strictly
     * inside a gap longer than {@link #maxGap()}, nor at a sample isolated between such gaps.
     *
     * @param t time (s)
     * @return true if a query at {@code t} succeeds
     */
    public boolean covers(double t) {
        if (!(t >= times[0] && t <= times[times.length - 1])) {
            return false;
        }
        return usableSegment(t, segment(t)) >= 0;
    }

    /** @return bytes held by the sample arrays (array headers included, 16 bytes each) */
    long heldBytes() {
        long bytes = 16L * 3 + 8L * (times.length + positions.length + attitudes.length);
        if (velocities != null) {
            bytes += 16 + 8L * velocities.length;
        }
        if (rates != null) {
            bytes += 16 + 8L * rates.length;
        }
        return bytes;
    }

    // ------------------------------------------------------------------ queries

    /**
     * Placement of F in B at time {@code t}, interpolated as described in the class comment.
     *
     * @param t time (s), within [start(), end()] and not strictly inside a gap longer than
     *        {@link #maxGap()}
     * @return the placement with position, velocity and acceleration of the origin (B axes),
     *         orientation (maps B components to F components), angular velocity and angular
     *         acceleration (F axes)
     * @throws IllegalArgumentException if {@code t} is not finite, outside the recorded span, or in a
     *         gap longer than the max gap
     */
    @Override
    public Placement at(double t) {
        int n = times.length;
        if (!(t >= times[0] && t <= times[n - 1])) {
            throw new IllegalArgumentException("t must be within the recorded span [" + times[0] + ", "
                    + times[n - 1] + "] s (no extrapolation), got " + t);
        }
        int i = usableSegment(t, segment(t));
        if (i < 0) {
            throw gapRefusal(t, -i - 1);
        }
        return evaluate(i, t);
    }

    /** Index i with times[i] &lt;= t &lt;= times[i + 1], i in [0, n - 2]; t within the span. */
    private int segment(double t) {
        int k = Arrays.binarySearch(times, t);
        int i = k >= 0 ? k : -k - 2;
        return Math.min(Math.max(i, 0), times.length - 2);
    }

    /** The segment to evaluate t on, or -(i + 1) if t is in the gap segment i. */
    private int usableSegment(double t, int i) {
        if (times[i + 1] - times[i] <= maxGap) {
            return i;
        }
        // at a sample bordering a gap, the segment on the other side still answers
        if (t == times[i] && i > 0 && times[i] - times[i - 1] <= maxGap) {
            return i - 1;
        }
        if (t == times[i + 1] && i + 2 < times.length && times[i + 2] - times[i + 1] <= maxGap) {
            return i + 1;
        }
        return -i - 1;
    }

    private IllegalArgumentException gapRefusal(double t, int i) {
        String where = t == times[i] || t == times[i + 1]
                ? "t = " + t + " s is at a sample isolated between gaps longer than the max gap "
                        + maxGap + " s"
                : "t = " + t + " s falls in a gap of " + (times[i + 1] - times[i]) + " s between sample " + i
                        + " (t = " + times[i] + " s) and sample " + (i + 1) + " (t = " + times[i + 1]
                        + " s), longer than the max gap " + maxGap + " s";
        return new IllegalArgumentException(where + "; no interpolation across gaps");
    }

    // ------------------------------------------------------------------ interpolation

    @SuppressWarnings("checkstyle:MethodLength")
    private Placement evaluate(int i, double t) {
        int j = i + 1;
        double h = times[j] - times[i];
        double s = (t - times[i]) / h;

        // stencils: nodes lo .. lo + m - 1 of each knot's run
        int loI = stencilStart(i);
        int mI = stencilSize(i, loI);
        int loJ = stencilStart(j);
        int mJ = stencilSize(j, loJ);

        // derivative weights at knot i: d1 = sum a_k y_k, d2 = sum b_k y_k over the stencil
        double tI = times[i];
        double a0 = 0;
        double a1 = 0;
        double a2 = 0;
        double a3 = 0;
        double a4 = 0;
        double b0 = 0;
        double b1 = 0;
        double b2 = 0;
        double b3 = 0;
        double b4 = 0;
        {
            int kk = i - loI;
            double x0 = mI > 0 ? times[loI] - tI : 0;
            double x1 = mI > 1 ? times[loI + 1] - tI : 0;
            double x2 = mI > 2 ? times[loI + 2] - tI : 0;
            double x3 = mI > 3 ? times[loI + 3] - tI : 0;
            double x4 = mI > 4 ? times[loI + 4] - tI : 0;
            double sum = 0;
            double sq = 0;
            for (int k = 0; k < mI; k++) {
                if (k != kk) {
                    double inv = 1.0 / pick(k, x0, x1, x2, x3, x4);
                    sum += inv;
                    sq += inv * inv;
                }
            }
            for (int k = 0; k < mI; k++) {
                double ak;
                double bk;
                if (k == kk) {
                    ak = -sum;
                    bk = sum * sum - sq;
                } else {
                    double xk = pick(k, x0, x1, x2, x3, x4);
                    double g = 1.0 / xk;
                    for (int l = 0; l < mI; l++) {
                        if (l != k && l != kk) {
                            double xl = pick(l, x0, x1, x2, x3, x4);
                            g *= xl / (xl - xk);
                        }
                    }
                    ak = g;
                    bk = -2.0 * g * (sum - 1.0 / xk);
                }
                switch (k) {
                    case 0: a0 = ak; b0 = bk; break;
                    case 1: a1 = ak; b1 = bk; break;
                    case 2: a2 = ak; b2 = bk; break;
                    case 3: a3 = ak; b3 = bk; break;
                    default: a4 = ak; b4 = bk; break;
                }
            }
        }
        // the same at knot j
        double tJ = times[j];
        double c0 = 0;
        double c1 = 0;
        double c2 = 0;
        double c3 = 0;
        double c4 = 0;
        double e0 = 0;
        double e1 = 0;
        double e2 = 0;
        double e3 = 0;
        double e4 = 0;
        {
            int kk = j - loJ;
            double x0 = mJ > 0 ? times[loJ] - tJ : 0;
            double x1 = mJ > 1 ? times[loJ + 1] - tJ : 0;
            double x2 = mJ > 2 ? times[loJ + 2] - tJ : 0;
            double x3 = mJ > 3 ? times[loJ + 3] - tJ : 0;
            double x4 = mJ > 4 ? times[loJ + 4] - tJ : 0;
            double sum = 0;
            double sq = 0;
            for (int k = 0; k < mJ; k++) {
                if (k != kk) {
                    double inv = 1.0 / pick(k, x0, x1, x2, x3, x4);
                    sum += inv;
                    sq += inv * inv;
                }
            }
            for (int k = 0; k < mJ; k++) {
                double ak;
                double bk;
                if (k == kk) {
                    ak = -sum;
                    bk = sum * sum - sq;
                } else {
                    double xk = pick(k, x0, x1, x2, x3, x4);
                    double g = 1.0 / xk;
                    for (int l = 0; l < mJ; l++) {
                        if (l != k && l != kk) {
                            double xl = pick(l, x0, x1, x2, x3, x4);
                            g *= xl / (xl - xk);
                        }
                    }
                    ak = g;
                    bk = -2.0 * g * (sum - 1.0 / xk);
                }
                switch (k) {
                    case 0: c0 = ak; e0 = bk; break;
                    case 1: c1 = ak; e1 = bk; break;
                    case 2: c2 = ak; e2 = bk; break;
                    case 3: c3 = ak; e3 = bk; break;
                    default: c4 = ak; e4 = bk; break;
                }
            }
        }

        // ---- position: quintic Hermite per axis
        double[] p = positions;
        double px;
        double py;
        double pz;
        double vx;
        double vy;
        double vz;
        double ax;
        double ay;
        double az;
        if (velocities == null) {
            px = quintic(0, s, h, p[3 * i], p[3 * j],
                    weigh(p, 3, 0, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 0, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 0, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 0, loJ, mJ, e0, e1, e2, e3, e4));
            vx = quintic(1, s, h, p[3 * i], p[3 * j],
                    weigh(p, 3, 0, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 0, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 0, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 0, loJ, mJ, e0, e1, e2, e3, e4));
            ax = quintic(2, s, h, p[3 * i], p[3 * j],
                    weigh(p, 3, 0, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 0, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 0, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 0, loJ, mJ, e0, e1, e2, e3, e4));
            py = quintic(0, s, h, p[3 * i + 1], p[3 * j + 1],
                    weigh(p, 3, 1, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 1, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 1, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 1, loJ, mJ, e0, e1, e2, e3, e4));
            vy = quintic(1, s, h, p[3 * i + 1], p[3 * j + 1],
                    weigh(p, 3, 1, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 1, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 1, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 1, loJ, mJ, e0, e1, e2, e3, e4));
            ay = quintic(2, s, h, p[3 * i + 1], p[3 * j + 1],
                    weigh(p, 3, 1, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 1, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 1, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 1, loJ, mJ, e0, e1, e2, e3, e4));
            pz = quintic(0, s, h, p[3 * i + 2], p[3 * j + 2],
                    weigh(p, 3, 2, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 2, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 2, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 2, loJ, mJ, e0, e1, e2, e3, e4));
            vz = quintic(1, s, h, p[3 * i + 2], p[3 * j + 2],
                    weigh(p, 3, 2, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 2, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 2, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 2, loJ, mJ, e0, e1, e2, e3, e4));
            az = quintic(2, s, h, p[3 * i + 2], p[3 * j + 2],
                    weigh(p, 3, 2, loI, mI, a0, a1, a2, a3, a4), weigh(p, 3, 2, loJ, mJ, c0, c1, c2, c3, c4),
                    weigh(p, 3, 2, loI, mI, b0, b1, b2, b3, b4), weigh(p, 3, 2, loJ, mJ, e0, e1, e2, e3, e4));
        } else {
            double[] v = velocities;
            px = quintic(0, s, h, p[3 * i], p[3 * j], v[3 * i], v[3 * j],
                    weigh(v, 3, 0, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 0, loJ, mJ, c0, c1, c2, c3, c4));
            vx = quintic(1, s, h, p[3 * i], p[3 * j], v[3 * i], v[3 * j],
                    weigh(v, 3, 0, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 0, loJ, mJ, c0, c1, c2, c3, c4));
            ax = quintic(2, s, h, p[3 * i], p[3 * j], v[3 * i], v[3 * j],
                    weigh(v, 3, 0, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 0, loJ, mJ, c0, c1, c2, c3, c4));
            py = quintic(0, s, h, p[3 * i + 1], p[3 * j + 1], v[3 * i + 1], v[3 * j + 1],
                    weigh(v, 3, 1, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 1, loJ, mJ, c0, c1, c2, c3, c4));
            vy = quintic(1, s, h, p[3 * i + 1], p[3 * j + 1], v[3 * i + 1], v[3 * j + 1],
                    weigh(v, 3, 1, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 1, loJ, mJ, c0, c1, c2, c3, c4));
            ay = quintic(2, s, h, p[3 * i + 1], p[3 * j + 1], v[3 * i + 1], v[3 * j + 1],
                    weigh(v, 3, 1, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 1, loJ, mJ, c0, c1, c2, c3, c4));
            pz = quintic(0, s, h, p[3 * i + 2], p[3 * j + 2], v[3 * i + 2], v[3 * j + 2],
                    weigh(v, 3, 2, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 2, loJ, mJ, c0, c1, c2, c3, c4));
            vz = quintic(1, s, h, p[3 * i + 2], p[3 * j + 2], v[3 * i + 2], v[3 * j + 2],
                    weigh(v, 3, 2, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 2, loJ, mJ, c0, c1, c2, c3, c4));
            az = quintic(2, s, h, p[3 * i + 2], p[3 * j + 2], v[3 * i + 2], v[3 * j + 2],
                    weigh(v, 3, 2, loI, mI, a0, a1, a2, a3, a4), weigh(v, 3, 2, loJ, mJ, c0, c1, c2, c3, c4));
        }

        // ---- attitude: quintic Hermite per quaternion component, p(t), p'(t), p''(t)
        double r0;
        double r1;
        double r2;
        double r3;
        double d0;
        double dd1;
        double dd2;
        double dd3;
        double s0;
        double s1;
        double s2;
        double s3;
        if (rates == null) {
            r0 = quatQuintic(0, 0, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            d0 = quatQuintic(1, 0, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            s0 = quatQuintic(2, 0, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            r1 = quatQuintic(0, 1, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            dd1 = quatQuintic(1, 1, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            s1 = quatQuintic(2, 1, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            r2 = quatQuintic(0, 2, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            dd2 = quatQuintic(1, 2, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            s2 = quatQuintic(2, 2, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            r3 = quatQuintic(0, 3, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            dd3 = quatQuintic(1, 3, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
            s3 = quatQuintic(2, 3, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, b0, b1, b2, b3, b4,
                    c0, c1, c2, c3, c4, e0, e1, e2, e3, e4);
        } else {
            r0 = rateQuintic(0, 0, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            d0 = rateQuintic(1, 0, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            s0 = rateQuintic(2, 0, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            r1 = rateQuintic(0, 1, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            dd1 = rateQuintic(1, 1, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            s1 = rateQuintic(2, 1, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            r2 = rateQuintic(0, 2, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            dd2 = rateQuintic(1, 2, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            s2 = rateQuintic(2, 2, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            r3 = rateQuintic(0, 3, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            dd3 = rateQuintic(1, 3, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
            s3 = rateQuintic(2, 3, s, h, i, j, loI, mI, loJ, mJ, a0, a1, a2, a3, a4, c0, c1, c2, c3, c4);
        }

        // q = p / |p|; w = 2 vec(p* p') / |p|^2; al = 2 vec(p* p'') / |p|^2 - 2 (p . p') w / |p|^2
        double n2 = r0 * r0 + r1 * r1 + r2 * r2 + r3 * r3;
        double inv2 = 1.0 / n2;
        double invN = Math.sqrt(inv2);
        double wx = 2 * inv2 * (r0 * dd1 - d0 * r1 - (r2 * dd3 - r3 * dd2));
        double wy = 2 * inv2 * (r0 * dd2 - d0 * r2 - (r3 * dd1 - r1 * dd3));
        double wz = 2 * inv2 * (r0 * dd3 - d0 * r3 - (r1 * dd2 - r2 * dd1));
        double dot = 2 * inv2 * (r0 * d0 + r1 * dd1 + r2 * dd2 + r3 * dd3);
        double alx = 2 * inv2 * (r0 * s1 - s0 * r1 - (r2 * s3 - r3 * s2)) - dot * wx;
        double aly = 2 * inv2 * (r0 * s2 - s0 * r2 - (r3 * s1 - r1 * s3)) - dot * wy;
        double alz = 2 * inv2 * (r0 * s3 - s0 * r3 - (r1 * s2 - r2 * s1)) - dot * wz;
        return Placement.ofQuaternion(px, py, pz, vx, vy, vz, ax, ay, az,
                r0 * invN, r1 * invN, r2 * invN, r3 * invN, wx, wy, wz, alx, aly, alz);
    }

    private static double pick(int k, double x0, double x1, double x2, double x3, double x4) {
        switch (k) {
            case 0: return x0;
            case 1: return x1;
            case 2: return x2;
            case 3: return x3;
            default: return x4;
        }
    }

    /** First index of the derivative stencil of knot k: up to five samples of k's run, centred. */
    private int stencilStart(int k) {
        int lo = k;
        while (lo > 0 && k - lo < 4 && times[lo] - times[lo - 1] <= maxGap) {
            lo--;
        }
        int hi = k;
        int last = times.length - 1;
        while (hi < last && hi - k < 4 && times[hi + 1] - times[hi] <= maxGap) {
            hi++;
        }
        if (hi - lo + 1 <= 5) {
            return lo;
        }
        return Math.min(Math.max(k - 2, lo), hi - 4);
    }

    /** Number of samples of the stencil starting at lo for knot k (2 to 5). */
    private int stencilSize(int k, int lo) {
        int hi = k;
        int last = times.length - 1;
        while (hi < last && hi - lo < 4 && times[hi + 1] - times[hi] <= maxGap) {
            hi++;
        }
        return hi - lo + 1;
    }

    private static double weigh(double[] data, int stride, int comp, int lo, int m,
                                double w0, double w1, double w2, double w3, double w4) {
        int base = stride * lo + comp;
        double sum = w0 * data[base] + w1 * data[base + stride];
        if (m > 2) {
            sum += w2 * data[base + 2 * stride];
        }
        if (m > 3) {
            sum += w3 * data[base + 3 * stride];
        }
        if (m > 4) {
            sum += w4 * data[base + 4 * stride];
        }
        return sum;
    }

    /**
     * Quintic Hermite on [0, 1] in s = (t - t_i) / h from values y0, y1, first derivatives f0, f1
     * and second derivatives g0, g1 in time; returns the value (order 0) or the first or second
     * time derivative.
     */
    private static double quintic(int order, double s, double h, double y0, double y1,
                                  double f0, double f1, double g0, double g1) {
        double a1 = h * f0;
        double a2 = 0.5 * h * h * g0;
        double dv = y1 - y0 - a1 - a2;
        double ds = h * f1 - a1 - 2 * a2;
        double dc = h * h * g1 - 2 * a2;
        double k3 = 10 * dv - 4 * ds + 0.5 * dc;
        double k4 = -15 * dv + 7 * ds - dc;
        double k5 = 6 * dv - 3 * ds + 0.5 * dc;
        if (order == 0) {
            return y0 + s * (a1 + s * (a2 + s * (k3 + s * (k4 + s * k5))));
        }
        if (order == 1) {
            return (a1 + s * (2 * a2 + s * (3 * k3 + s * (4 * k4 + s * 5 * k5)))) / h;
        }
        return (2 * a2 + s * (6 * k3 + s * (12 * k4 + s * 20 * k5))) / (h * h);
    }

    @SuppressWarnings("checkstyle:ParameterNumber")
    private double quatQuintic(int order, int comp, double s, double h, int i, int j,
                               int loI, int mI, int loJ, int mJ,
                               double a0, double a1, double a2, double a3, double a4,
                               double b0, double b1, double b2, double b3, double b4,
                               double c0, double c1, double c2, double c3, double c4,
                               double e0, double e1, double e2, double e3, double e4) {
        double[] q = attitudes;
        return quintic(order, s, h, q[4 * i + comp], q[4 * j + comp],
                weigh(q, 4, comp, loI, mI, a0, a1, a2, a3, a4), weigh(q, 4, comp, loJ, mJ, c0, c1, c2, c3, c4),
                weigh(q, 4, comp, loI, mI, b0, b1, b2, b3, b4), weigh(q, 4, comp, loJ, mJ, e0, e1, e2, e3, e4));
    }

    /** Component comp of q' = q (0, w) / 2 at sample k, from the held attitude and measured rate. */
    private double quaternionRate(int comp, int k) {
        double q0 = attitudes[4 * k];
        double q1 = attitudes[4 * k + 1];
        double q2 = attitudes[4 * k + 2];
        double q3 = attitudes[4 * k + 3];
        double wx = rates[3 * k];
        double wy = rates[3 * k + 1];
        double wz = rates[3 * k + 2];
        switch (comp) {
            case 0: return -0.5 * (q1 * wx + q2 * wy + q3 * wz);
            case 1: return 0.5 * (q0 * wx + q2 * wz - q3 * wy);
            case 2: return 0.5 * (q0 * wy + q3 * wx - q1 * wz);
            default: return 0.5 * (q0 * wz + q1 * wy - q2 * wx);
        }
    }

    private double weighRates(int comp, int lo, int m, double w0, double w1, double w2, double w3, double w4) {
        double sum = w0 * quaternionRate(comp, lo) + w1 * quaternionRate(comp, lo + 1);
        if (m > 2) {
            sum += w2 * quaternionRate(comp, lo + 2);
        }
        if (m > 3) {
            sum += w3 * quaternionRate(comp, lo + 3);
        }
        if (m > 4) {
            sum += w4 * quaternionRate(comp, lo + 4);
        }
        return sum;
    }

    @SuppressWarnings("checkstyle:ParameterNumber")
    private double rateQuintic(int order, int comp, double s, double h, int i, int j,
                               int loI, int mI, int loJ, int mJ,
                               double a0, double a1, double a2, double a3, double a4,
                               double c0, double c1, double c2, double c3, double c4) {
        double[] q = attitudes;
        return quintic(order, s, h, q[4 * i + comp], q[4 * j + comp],
                quaternionRate(comp, i), quaternionRate(comp, j),
                weighRates(comp, loI, mI, a0, a1, a2, a3, a4), weighRates(comp, loJ, mJ, c0, c1, c2, c3, c4));
    }

    // ------------------------------------------------------------------ validation

    private static final String[] ANGLE_NAMES = {"yaw", "pitch", "roll"};
    private static final String[] AXIS_NAMES = {"x", "y", "z"};

    private static String sampleLabel(int i) {
        return "sample " + i;
    }

    private static void checkLength(String name, int length, int perSample, int samples) {
        if (length != perSample * samples) {
            throw new IllegalArgumentException(name + " must hold " + perSample + " values per sample, "
                    + perSample * samples + " for " + samples + " samples, got length " + length);
        }
    }

    private static double[] finiteCopy(String name, double[] values) {
        double[] f = new double[values.length];
        for (int k = 0; k < values.length; k++) {
            if (!Double.isFinite(values[k])) {
                throw new IllegalArgumentException(sampleLabel(k / 3) + ": " + name + "[" + k + "] ("
                        + AXIS_NAMES[k % 3] + ") must be finite, got " + values[k]);
            }
            f[k] = values[k];
        }
        return f;
    }

    /**
     * Checks the samples, normalises and sign-aligns the quaternions in place, and builds the
     * motion; {@code label} names a sample in messages (index or file line).
     */
    private static SampledMotion build(double[] times, double[] positions, double[] quaternions,
                                       double[] velocities, double[] rates, double maxGap,
                                       IntFunction<String> label) {
        int n = times.length;
        if (n < 2) {
            throw new IllegalArgumentException("a sampled motion needs at least 2 samples, got " + n);
        }
        for (int i = 0; i < n; i++) {
            double t = times[i];
            if (!Double.isFinite(t)) {
                throw new IllegalArgumentException(label.apply(i) + ": time must be finite, got " + t);
            }
            if (i > 0 && !(t > times[i - 1])) {
                throw new IllegalArgumentException(label.apply(i) + ": time " + t + " s is not after the time "
                        + times[i - 1] + " s of " + label.apply(i - 1)
                        + " (times must increase strictly; duplicates are refused)");
            }
            for (int k = 0; k < 3; k++) {
                double x = positions[3 * i + k];
                if (!Double.isFinite(x)) {
                    throw new IllegalArgumentException(label.apply(i) + ": position " + AXIS_NAMES[k]
                            + " must be finite, got " + x);
                }
            }
            double q0 = quaternions[4 * i];
            double q1 = quaternions[4 * i + 1];
            double q2 = quaternions[4 * i + 2];
            double q3 = quaternions[4 * i + 3];
            double norm = Math.sqrt(q0 * q0 + q1 * q1 + q2 * q2 + q3 * q3);
            if (!(Math.abs(norm - 1.0) <= Orientations.QUATERNION_TOLERANCE)) {
                throw new IllegalArgumentException(label.apply(i) + ": quaternion (" + q0 + ", " + q1 + ", " + q2
                        + ", " + q3 + ") must be finite and unit (|norm - 1| <= "
                        + Orientations.QUATERNION_TOLERANCE + "), got norm " + norm);
            }
            double sign = 1.0 / norm;
            if (i > 0) {
                double dot = q0 * quaternions[4 * i - 4] + q1 * quaternions[4 * i - 3]
                        + q2 * quaternions[4 * i - 2] + q3 * quaternions[4 * i - 1];
                if (dot < 0) {
                    sign = -sign;
                }
                double cosHalf = Math.abs(dot) / norm;
                if (cosHalf < MIN_ALIGNED_DOT) {
                    double turn = 2 * Math.acos(Math.min(1.0, cosHalf));
                    throw new IllegalArgumentException(label.apply(i) + ": attitude turns by "
                            + Formats.number(Math.toDegrees(turn)) + " deg since " + label.apply(i - 1)
                            + ", more than " + Formats.number(Math.toDegrees(MAX_TURN_BETWEEN_SAMPLES))
                            + " deg between samples (under-sampled rotation)");
                }
            }
            quaternions[4 * i] = q0 * sign;
            quaternions[4 * i + 1] = q1 * sign;
            quaternions[4 * i + 2] = q2 * sign;
            quaternions[4 * i + 3] = q3 * sign;
        }
        checkMeasured("velocity", velocities, label);
        checkMeasured("angular rate", rates, label);
        return new SampledMotion(times, positions, quaternions, velocities, rates, maxGap);
    }

    private static void checkMeasured(String name, double[] values, IntFunction<String> label) {
        if (values == null) {
            return;
        }
        for (int k = 0; k < values.length; k++) {
            if (!Double.isFinite(values[k])) {
                throw new IllegalArgumentException(label.apply(k / 3) + ": " + name + " " + AXIS_NAMES[k % 3]
                        + " must be finite, got " + values[k]);
            }
        }
    }

    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        // a stream is untrusted input: check it like any other source of samples
        try {
            if (times == null || positions == null || attitudes == null) {
                throw new IllegalArgumentException("missing sample arrays");
            }
            checkLength("positions", positions.length, 3, times.length);
            checkLength("attitudes", attitudes.length, 4, times.length);
            if (velocities != null) {
                checkLength("velocities", velocities.length, 3, times.length);
            }
            if (rates != null) {
                checkLength("rates", rates.length, 3, times.length);
            }
            if (!(maxGap > 0)) {
                throw new IllegalArgumentException("max gap must be positive, got " + maxGap);
            }
            build(times.clone(), positions.clone(), attitudes.clone(), velocities, rates, maxGap,
                    SampledMotion::sampleLabel);
        } catch (IllegalArgumentException e) {
            InvalidObjectException failure = new InvalidObjectException("corrupt sampled motion: " + e.getMessage());
            failure.initCause(e);
            throw failure;
        }
    }

    // ------------------------------------------------------------------ values

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof SampledMotion)) {
            return false;
        }
        SampledMotion o = (SampledMotion) other;
        return Double.compare(maxGap, o.maxGap) == 0 && Arrays.equals(times, o.times)
                && Arrays.equals(positions, o.positions) && Arrays.equals(attitudes, o.attitudes)
                && Arrays.equals(velocities, o.velocities) && Arrays.equals(rates, o.rates);
    }

    @Override
    public int hashCode() {
        int h = Arrays.hashCode(times);
        h = 31 * h + Arrays.hashCode(positions);
        h = 31 * h + Arrays.hashCode(attitudes);
        h = 31 * h + Arrays.hashCode(velocities);
        h = 31 * h + Arrays.hashCode(rates);
        return 31 * h + Double.hashCode(maxGap);
    }

    @Override
    public String toString() {
        int n = times.length;
        return "sampled motion: " + n + " samples over [" + Formats.number(times[0]) + ", "
                + Formats.number(times[n - 1]) + "] s (" + Formats.number(times[n - 1] - times[0]) + " s), max gap "
                + (maxGap == Double.POSITIVE_INFINITY ? "none" : Formats.number(maxGap) + " s")
                + ", velocities " + (velocities == null ? "from positions" : "measured")
                + ", angular rates " + (rates == null ? "from attitudes" : "measured");
    }
}
