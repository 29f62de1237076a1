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
 *       segments within three samples of it (four near
 *       the ends of a run).</li>
 *   <li>Position, velocity and acceleration are the quintic and its derivatives. The attitude is
 *       the quintic {@code p(t)} through the sign-aligned quaternion components, normalised:
 *       {@code q = p / |p|}; then {@code w = 2 vec(p* p') / |p|^2} and
 *       {@code al = 2 vec(p* p'') / |p|^2 - 2 (p . p') w / |p|^2}, the exact derivatives of
 *       that normalised curve.</li>
 * </ul>
 * On uniform samples of a smooth motion the errors shrink like {@code h^5} for position and
 * attitude, {@code h^4} for velocity and angular velocity and {@code h^3} for acceleration and
 * angular acceleration ({@code h} the sample interval), one order faster with measured velocities
 * and rates; the accuracy report of the documentation lists measured figures. Runs of fewer than
 * five samples use all their samples (lower degree). The interpolant does not filter: noise in
 * the samples reaches velocities amplified by about {@code 1/h} and accelerations by {@code 1/h^2}.
 *
 * <h2>Refusals</h2>
 * Construction refuses, naming the sample: fewer than two samples, times that are not finite or
 * do not increase strictly, non-finite values, quaternions whose norm differs from 1 by more than
 * {@link Orientations#UNIT_QUATERNION_TOLERANCE} (those within are normalised), and attitudes that
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
 * <p>Immutable, thread-safe and serializable. A query finds its interval from the index a uniform
 * record would have (then galloping and bisection, O(log n) at worst), costs a few hundred
 * floating-point operations and allocates only its {@link Placement}.
 */
public final class SampledMotion implements Motion, Serializable {

    /** Largest turn of the attitude between consecutive samples, in radians (90 degrees). */
    public static final double MAX_TURN_BETWEEN_SAMPLES = 0.5 * Math.PI;

    private static final long serialVersionUID = 1L;

    /** Smallest dot product of consecutive aligned quaternions: cos(MAX_TURN / 2). */
    private static final double MIN_ALIGNED_DOT = Math.cos(0.5 * MAX_TURN_BETWEEN_SAMPLES);

    /** Sample times (s), strictly increasing. */
    private final double[] times;
    /** x, y, z per sample, B axes. */
    private final double[] positions;
    /** q0..q3 per sample, unit, each with non-negative dot product with its predecessor. */
    private final double[] attitudes;
    /** measured origin velocity per sample in B axes, or null. */
    private final double[] velocities;
    /** measured angular velocity per sample in F axes, or null. */
    private final double[] rates;
    /** Longest interval between samples that is interpolated (s); queries inside longer gaps are refused. */
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
     *        {@link Orientations#UNIT_QUATERNION_TOLERANCE}; length {@code 4 * times.length}
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
    public SampledMotion withAngularVelocities(double[] angularVelocities) {
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
    public double startTime() {
        return times[0];
    }

    /** @return time of the last sample (s) */
    public double endTime() {
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
    public boolean hasMeasuredAngularVelocities() {
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
     * @param t time (s), within [startTime(), endTime()] and not strictly inside a gap longer than
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

    /**
     * Index i with times[i] &lt;= t &lt;= times[i + 1], i in [0, n - 2]; t within the span. Starts
     * from the index a uniform record would have, then gallops and bisects: two or three reads for
     * evenly sampled logs, O(log n) at worst, no state shared between threads.
     */
    private int segment(double t) {
        double[] ts = times;
        int last = ts.length - 2;
        double t0 = ts[0];
        int g = (int) ((t - t0) / (ts[last + 1] - t0) * (last + 1));
        g = Math.min(Math.max(g, 0), last);
        int lo;
        int hi;
        if (ts[g] <= t) {
            if (t <= ts[g + 1]) {
                return g;
            }
            // gallop right from g + 1 (ts[g + 1] < t) until a time beyond t or the end
            lo = g + 1;
            int step = 1;
            hi = lo + step;
            while (hi <= last && ts[hi] <= t) {
                lo = hi;
                step <<= 1;
                hi = lo + step;
            }
            hi = Math.min(hi, last);
        } else {
            // gallop left from g (ts[g] > t) until a time not beyond t (ts[0] <= t always)
            hi = g;
            lo = g - 1;
            int step = 1;
            while (lo > 0 && ts[lo] > t) {
                hi = lo;
                step <<= 1;
                lo = Math.max(0, lo - step);
            }
            hi = hi - 1;
        }
        // bisect for the largest i in [lo, hi] with ts[i] <= t
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (ts[mid] <= t) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /** @return the interval index the search finds for t (tests compare it with the JDK's search) */
    int intervalIndex(double t) {
        return segment(t);
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
        double tI = times[i];
        double tJ = times[j];
        double h = tJ - tI;
        double hh = h * h;
        double invH = 1.0 / h;
        double invHH = invH * invH;
        double s = (t - tI) * invH;

        // Derivative stencils of both knots: the knot itself (index iK / jK) and up to four other
        // samples of its run; absent ones point at the knot with weight 0. The first derivative
        // at a knot is sum(a * y), the second sum(b * y) (c and e at knot j): the derivatives there
        // of the Lagrange polynomial through the stencil.
        int iK = i;
        int jK = j;
        int loI = stencilStart(i);
        int rI = stencilSize(i, loI) - 1;
        int kI = i - loI;
        int i1 = 0 < rI ? loI + 0 + (0 >= kI ? 1 : 0) : i;
        int i2 = 1 < rI ? loI + 1 + (1 >= kI ? 1 : 0) : i;
        int i3 = 2 < rI ? loI + 2 + (2 >= kI ? 1 : 0) : i;
        int i4 = 3 < rI ? loI + 3 + (3 >= kI ? 1 : 0) : i;
        double u1 = times[i1] - tI;
        double u2 = times[i2] - tI;
        double u3 = times[i3] - tI;
        double u4 = times[i4] - tI;
        double ui1 = 0 < rI ? 1.0 / u1 : 0.0;
        double ui2 = 1 < rI ? 1.0 / u2 : 0.0;
        double ui3 = 2 < rI ? 1.0 / u3 : 0.0;
        double ui4 = 3 < rI ? 1.0 / u4 : 0.0;
        double uS = ui1 + ui2 + ui3 + ui4;
        double uQ = ui1 * ui1 + ui2 * ui2 + ui3 * ui3 + ui4 * ui4;
        double aK = -uS;
        double bK = uS * uS - uQ;
        double a1 = basis(u1, u2, u3, u4, 1 < rI, 2 < rI, 3 < rI);
        double a2 = 1 < rI ? basis(u2, u1, u3, u4, true, 2 < rI, 3 < rI) : 0.0;
        double a3 = 2 < rI ? basis(u3, u1, u2, u4, true, true, 3 < rI) : 0.0;
        double a4 = 3 < rI ? basis(u4, u1, u2, u3, true, true, true) : 0.0;
        double b1 = -2.0 * a1 * (uS - ui1);
        double b2 = -2.0 * a2 * (uS - ui2);
        double b3 = -2.0 * a3 * (uS - ui3);
        double b4 = -2.0 * a4 * (uS - ui4);
        int loJ = stencilStart(j);
        int rJ = stencilSize(j, loJ) - 1;
        int kJ = j - loJ;
        int j1 = 0 < rJ ? loJ + 0 + (0 >= kJ ? 1 : 0) : j;
        int j2 = 1 < rJ ? loJ + 1 + (1 >= kJ ? 1 : 0) : j;
        int j3 = 2 < rJ ? loJ + 2 + (2 >= kJ ? 1 : 0) : j;
        int j4 = 3 < rJ ? loJ + 3 + (3 >= kJ ? 1 : 0) : j;
        double x1 = times[j1] - tJ;
        double x2 = times[j2] - tJ;
        double x3 = times[j3] - tJ;
        double x4 = times[j4] - tJ;
        double xi1 = 0 < rJ ? 1.0 / x1 : 0.0;
        double xi2 = 1 < rJ ? 1.0 / x2 : 0.0;
        double xi3 = 2 < rJ ? 1.0 / x3 : 0.0;
        double xi4 = 3 < rJ ? 1.0 / x4 : 0.0;
        double xS = xi1 + xi2 + xi3 + xi4;
        double xQ = xi1 * xi1 + xi2 * xi2 + xi3 * xi3 + xi4 * xi4;
        double cK = -xS;
        double eK = xS * xS - xQ;
        double c1 = basis(x1, x2, x3, x4, 1 < rJ, 2 < rJ, 3 < rJ);
        double c2 = 1 < rJ ? basis(x2, x1, x3, x4, true, 2 < rJ, 3 < rJ) : 0.0;
        double c3 = 2 < rJ ? basis(x3, x1, x2, x4, true, true, 3 < rJ) : 0.0;
        double c4 = 3 < rJ ? basis(x4, x1, x2, x3, true, true, true) : 0.0;
        double e1 = -2.0 * c1 * (xS - xi1);
        double e2 = -2.0 * c2 * (xS - xi2);
        double e3 = -2.0 * c3 * (xS - xi3);
        double e4 = -2.0 * c4 * (xS - xi4);

        // ---- position: per axis the quintic Hermite on s in [0, 1] matching value, first and
        // second derivative at both ends: y0 + a1 s + a2 s^2 + k3 s^3 + k4 s^4 + k5 s^5
        double[] p = positions;
        double[] v = velocities;
        double f0x = v == null ? weigh(p, 3, 0, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4) : v[3 * i + 0];
        double f1x = v == null ? weigh(p, 3, 0, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4) : v[3 * j + 0];
        double g0x = v == null ? weigh(p, 3, 0, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4) : weigh(v, 3, 0, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
        double g1x = v == null ? weigh(p, 3, 0, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4) : weigh(v, 3, 0, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
        double hxa1 = h * f0x;
        double hxa2 = 0.5 * hh * g0x;
        double hxdv = p[3 * j + 0] - p[3 * i + 0] - hxa1 - hxa2;
        double hxds = h * f1x - hxa1 - 2 * hxa2;
        double hxdc = hh * g1x - 2 * hxa2;
        double hxk3 = 10 * hxdv - 4 * hxds + 0.5 * hxdc;
        double hxk4 = -15 * hxdv + 7 * hxds - hxdc;
        double hxk5 = 6 * hxdv - 3 * hxds + 0.5 * hxdc;
        double px = p[3 * i + 0] + s * (hxa1 + s * (hxa2 + s * (hxk3 + s * (hxk4 + s * hxk5))));
        double vx = (hxa1 + s * (2 * hxa2 + s * (3 * hxk3 + s * (4 * hxk4 + s * 5 * hxk5)))) * invH;
        double ax = (2 * hxa2 + s * (6 * hxk3 + s * (12 * hxk4 + s * 20 * hxk5))) * invHH;
        double f0y = v == null ? weigh(p, 3, 1, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4) : v[3 * i + 1];
        double f1y = v == null ? weigh(p, 3, 1, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4) : v[3 * j + 1];
        double g0y = v == null ? weigh(p, 3, 1, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4) : weigh(v, 3, 1, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
        double g1y = v == null ? weigh(p, 3, 1, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4) : weigh(v, 3, 1, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
        double hya1 = h * f0y;
        double hya2 = 0.5 * hh * g0y;
        double hydv = p[3 * j + 1] - p[3 * i + 1] - hya1 - hya2;
        double hyds = h * f1y - hya1 - 2 * hya2;
        double hydc = hh * g1y - 2 * hya2;
        double hyk3 = 10 * hydv - 4 * hyds + 0.5 * hydc;
        double hyk4 = -15 * hydv + 7 * hyds - hydc;
        double hyk5 = 6 * hydv - 3 * hyds + 0.5 * hydc;
        double py = p[3 * i + 1] + s * (hya1 + s * (hya2 + s * (hyk3 + s * (hyk4 + s * hyk5))));
        double vy = (hya1 + s * (2 * hya2 + s * (3 * hyk3 + s * (4 * hyk4 + s * 5 * hyk5)))) * invH;
        double ay = (2 * hya2 + s * (6 * hyk3 + s * (12 * hyk4 + s * 20 * hyk5))) * invHH;
        double f0z = v == null ? weigh(p, 3, 2, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4) : v[3 * i + 2];
        double f1z = v == null ? weigh(p, 3, 2, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4) : v[3 * j + 2];
        double g0z = v == null ? weigh(p, 3, 2, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4) : weigh(v, 3, 2, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
        double g1z = v == null ? weigh(p, 3, 2, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4) : weigh(v, 3, 2, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
        double hza1 = h * f0z;
        double hza2 = 0.5 * hh * g0z;
        double hzdv = p[3 * j + 2] - p[3 * i + 2] - hza1 - hza2;
        double hzds = h * f1z - hza1 - 2 * hza2;
        double hzdc = hh * g1z - 2 * hza2;
        double hzk3 = 10 * hzdv - 4 * hzds + 0.5 * hzdc;
        double hzk4 = -15 * hzdv + 7 * hzds - hzdc;
        double hzk5 = 6 * hzdv - 3 * hzds + 0.5 * hzdc;
        double pz = p[3 * i + 2] + s * (hza1 + s * (hza2 + s * (hzk3 + s * (hzk4 + s * hzk5))));
        double vz = (hza1 + s * (2 * hza2 + s * (3 * hzk3 + s * (4 * hzk4 + s * 5 * hzk5)))) * invH;
        double az = (2 * hza2 + s * (6 * hzk3 + s * (12 * hzk4 + s * 20 * hzk5))) * invHH;

        // ---- attitude: quintic Hermite per quaternion component: p(t) as r, p' as d, p'' as dd
        double[] q = attitudes;
        boolean measured = rates != null;
        double qf00 = measured ? quaternionRate(0, i) : weigh(q, 4, 0, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
        double qf10 = measured ? quaternionRate(0, j) : weigh(q, 4, 0, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
        double qg00 = measured ? weighRates(0, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4) : weigh(q, 4, 0, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4);
        double qg10 = measured ? weighRates(0, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4) : weigh(q, 4, 0, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4);
        double q0a1 = h * qf00;
        double q0a2 = 0.5 * hh * qg00;
        double q0dv = q[4 * j + 0] - q[4 * i + 0] - q0a1 - q0a2;
        double q0ds = h * qf10 - q0a1 - 2 * q0a2;
        double q0dc = hh * qg10 - 2 * q0a2;
        double q0k3 = 10 * q0dv - 4 * q0ds + 0.5 * q0dc;
        double q0k4 = -15 * q0dv + 7 * q0ds - q0dc;
        double q0k5 = 6 * q0dv - 3 * q0ds + 0.5 * q0dc;
        double r0 = q[4 * i + 0] + s * (q0a1 + s * (q0a2 + s * (q0k3 + s * (q0k4 + s * q0k5))));
        double d0 = (q0a1 + s * (2 * q0a2 + s * (3 * q0k3 + s * (4 * q0k4 + s * 5 * q0k5)))) * invH;
        double dd0 = (2 * q0a2 + s * (6 * q0k3 + s * (12 * q0k4 + s * 20 * q0k5))) * invHH;
        double qf01 = measured ? quaternionRate(1, i) : weigh(q, 4, 1, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
        double qf11 = measured ? quaternionRate(1, j) : weigh(q, 4, 1, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
        double qg01 = measured ? weighRates(1, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4) : weigh(q, 4, 1, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4);
        double qg11 = measured ? weighRates(1, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4) : weigh(q, 4, 1, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4);
        double q1a1 = h * qf01;
        double q1a2 = 0.5 * hh * qg01;
        double q1dv = q[4 * j + 1] - q[4 * i + 1] - q1a1 - q1a2;
        double q1ds = h * qf11 - q1a1 - 2 * q1a2;
        double q1dc = hh * qg11 - 2 * q1a2;
        double q1k3 = 10 * q1dv - 4 * q1ds + 0.5 * q1dc;
        double q1k4 = -15 * q1dv + 7 * q1ds - q1dc;
        double q1k5 = 6 * q1dv - 3 * q1ds + 0.5 * q1dc;
        double r1 = q[4 * i + 1] + s * (q1a1 + s * (q1a2 + s * (q1k3 + s * (q1k4 + s * q1k5))));
        double d1 = (q1a1 + s * (2 * q1a2 + s * (3 * q1k3 + s * (4 * q1k4 + s * 5 * q1k5)))) * invH;
        double dd1 = (2 * q1a2 + s * (6 * q1k3 + s * (12 * q1k4 + s * 20 * q1k5))) * invHH;
        double qf02 = measured ? quaternionRate(2, i) : weigh(q, 4, 2, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
        double qf12 = measured ? quaternionRate(2, j) : weigh(q, 4, 2, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
        double qg02 = measured ? weighRates(2, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4) : weigh(q, 4, 2, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4);
        double qg12 = measured ? weighRates(2, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4) : weigh(q, 4, 2, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4);
        double q2a1 = h * qf02;
        double q2a2 = 0.5 * hh * qg02;
        double q2dv = q[4 * j + 2] - q[4 * i + 2] - q2a1 - q2a2;
        double q2ds = h * qf12 - q2a1 - 2 * q2a2;
        double q2dc = hh * qg12 - 2 * q2a2;
        double q2k3 = 10 * q2dv - 4 * q2ds + 0.5 * q2dc;
        double q2k4 = -15 * q2dv + 7 * q2ds - q2dc;
        double q2k5 = 6 * q2dv - 3 * q2ds + 0.5 * q2dc;
        double r2 = q[4 * i + 2] + s * (q2a1 + s * (q2a2 + s * (q2k3 + s * (q2k4 + s * q2k5))));
        double d2 = (q2a1 + s * (2 * q2a2 + s * (3 * q2k3 + s * (4 * q2k4 + s * 5 * q2k5)))) * invH;
        double dd2 = (2 * q2a2 + s * (6 * q2k3 + s * (12 * q2k4 + s * 20 * q2k5))) * invHH;
        double qf03 = measured ? quaternionRate(3, i) : weigh(q, 4, 3, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
        double qf13 = measured ? quaternionRate(3, j) : weigh(q, 4, 3, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
        double qg03 = measured ? weighRates(3, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4) : weigh(q, 4, 3, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4);
        double qg13 = measured ? weighRates(3, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4) : weigh(q, 4, 3, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4);
        double q3a1 = h * qf03;
        double q3a2 = 0.5 * hh * qg03;
        double q3dv = q[4 * j + 3] - q[4 * i + 3] - q3a1 - q3a2;
        double q3ds = h * qf13 - q3a1 - 2 * q3a2;
        double q3dc = hh * qg13 - 2 * q3a2;
        double q3k3 = 10 * q3dv - 4 * q3ds + 0.5 * q3dc;
        double q3k4 = -15 * q3dv + 7 * q3ds - q3dc;
        double q3k5 = 6 * q3dv - 3 * q3ds + 0.5 * q3dc;
        double r3 = q[4 * i + 3] + s * (q3a1 + s * (q3a2 + s * (q3k3 + s * (q3k4 + s * q3k5))));
        double d3 = (q3a1 + s * (2 * q3a2 + s * (3 * q3k3 + s * (4 * q3k4 + s * 5 * q3k5)))) * invH;
        double dd3 = (2 * q3a2 + s * (6 * q3k3 + s * (12 * q3k4 + s * 20 * q3k5))) * invHH;

        // q = p / |p|; w = 2 vec(p* p') / |p|^2; al = 2 vec(p* p'') / |p|^2 - 2 (p . p') w / |p|^2,
        // with vec(a* b) = a0 b_v - b0 a_v - a_v x b_v
        double n2 = r0 * r0 + r1 * r1 + r2 * r2 + r3 * r3;
        double inv2 = 2.0 / n2;
        double invN = 1.0 / Math.sqrt(n2);
        double wx = inv2 * (r0 * d1 - d0 * r1 - (r2 * d3 - r3 * d2));
        double wy = inv2 * (r0 * d2 - d0 * r2 - (r3 * d1 - r1 * d3));
        double wz = inv2 * (r0 * d3 - d0 * r3 - (r1 * d2 - r2 * d1));
        double dot = inv2 * (r0 * d0 + r1 * d1 + r2 * d2 + r3 * d3);
        double alx = inv2 * (r0 * dd1 - dd0 * r1 - (r2 * dd3 - r3 * dd2)) - dot * wx;
        double aly = inv2 * (r0 * dd2 - dd0 * r2 - (r3 * dd1 - r1 * dd3)) - dot * wy;
        double alz = inv2 * (r0 * dd3 - dd0 * r3 - (r1 * dd2 - r2 * dd1)) - dot * wz;
        return Placement.ofQuaternion(px, py, pz, vx, vy, vz, ax, ay, az,
                r0 * invN, r1 * invN, r2 * invN, r3 * invN, wx, wy, wz, alx, aly, alz);
    }

    /** Weight of the node at offset ua in the first derivative at offset 0 (Lagrange basis). */
    private static double basis(double ua, double ub, double uc, double ud, boolean pb, boolean pc, boolean pd) {
        double num = 1.0;
        double den = ua;
        if (pb) {
            num *= ub;
            den *= ub - ua;
        }
        if (pc) {
            num *= uc;
            den *= uc - ua;
        }
        if (pd) {
            num *= ud;
            den *= ud - ua;
        }
        return num / den;
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

    @SuppressWarnings("checkstyle:ParameterNumber")
    private static double weigh(double[] data, int stride, int comp, int k0, int k1, int k2, int k3, int k4,
                                double w0, double w1, double w2, double w3, double w4) {
        return w0 * data[stride * k0 + comp] + w1 * data[stride * k1 + comp] + w2 * data[stride * k2 + comp]
                + w3 * data[stride * k3 + comp] + w4 * data[stride * k4 + comp];
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

    @SuppressWarnings("checkstyle:ParameterNumber")
    private double weighRates(int comp, int k0, int k1, int k2, int k3, int k4,
                              double w0, double w1, double w2, double w3, double w4) {
        return w0 * quaternionRate(comp, k0) + w1 * quaternionRate(comp, k1) + w2 * quaternionRate(comp, k2)
                + w3 * quaternionRate(comp, k3) + w4 * quaternionRate(comp, k4);
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
            if (!(Math.abs(norm - 1.0) <= Orientations.UNIT_QUATERNION_TOLERANCE)) {
                throw new IllegalArgumentException(label.apply(i) + ": quaternion (" + q0 + ", " + q1 + ", " + q2
                        + ", " + q3 + ") must be finite and unit (|norm - 1| <= "
                        + Orientations.UNIT_QUATERNION_TOLERANCE + "), got norm " + norm);
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

    /**
     * Re-checks a deserialized motion like any other source of samples.
     *
     * @param in the stream
     * @throws IOException if the stream fails
     * @throws ClassNotFoundException if a class of the stream is missing
     */
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
