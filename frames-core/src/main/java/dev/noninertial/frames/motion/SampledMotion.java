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
 * do not increase strictly or are closer than {@link #MIN_SAMPLE_INTERVAL}, non-finite values, quaternions whose norm differs from 1 by more than
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
 * record would have (then galloping and bisection, O(log n) at worst) and costs a few hundred
 * floating-point operations: one Hermite routine runs over the seven channels (three position
 * axes, four quaternion components) with the stencil weights computed once per query.
 * {@link #at(double)} allocates its {@link Placement} and one scratch array of 21 doubles;
 * {@link #at(double, double[], int)} allocates nothing, so the bulk conversions of
 * {@link Motion} allocate nothing per state.
 */
public final class SampledMotion implements Motion, Serializable {

    /** Doubles of the scratch of one query: 19 of the quaternion layout and 2 more while evaluating. */
    private static final int SCRATCH = 21;

    /** Largest turn of the attitude between consecutive samples, in radians (90 degrees). */
    public static final double MAX_TURN_BETWEEN_SAMPLES = 0.5 * Math.PI;

    /**
     * Smallest interval between consecutive sample times, in seconds: the interpolation divides by
     * the cube of the interval, which must stay a normal number (1e-300).
     */
    public static final double MIN_SAMPLE_INTERVAL = 1e-100;

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
        checkSampleCount(times);
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
        checkSampleCount(times);
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

    /**
     * Returns number of samples.
     *
     * @return number of samples
     */
    public int sampleCount() {
        return times.length;
    }

    /**
     * Returns time of the first sample (s).
     *
     * @return time of the first sample (s)
     */
    public double startTime() {
        return times[0];
    }

    /**
     * Returns time of the last sample (s).
     *
     * @return time of the last sample (s)
     */
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

    /**
     * Returns longest interval between samples that is still interpolated (s), infinite if no limit.
     *
     * @return longest interval between samples that is still interpolated (s), infinite if no limit
     */
    public double maxGap() {
        return maxGap;
    }

    /**
     * Returns whether measured origin velocities are used.
     *
     * @return whether measured origin velocities are used
     */
    public boolean hasMeasuredVelocities() {
        return velocities != null;
    }

    /**
     * Returns whether measured angular rates are used.
     *
     * @return whether measured angular rates are used
     */
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

    /**
     * Returns bytes held by the sample arrays (array headers included, 16 bytes each).
     *
     * @return bytes held by the sample arrays (array headers included, 16 bytes each)
     */
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
        double[] q = new double[SCRATCH];
        evaluate(segmentAt(t), t, q, 0);
        return Placement.fromQuaternionArray(q, 0);
    }

    /**
     * The placement at {@code t} in the matrix layout of {@link Placement#toArray(double[], int)},
     * the same bits as {@link #at(double)}, allocating nothing.
     *
     * @param t time (s), as for {@link #at(double)}
     * @param target destination array
     * @param offset index where o's x component is written
     * @throws NullPointerException if {@code target} is null
     * @throws IllegalArgumentException if {@code t} is refused as by {@link #at(double)}, or the
     *         range does not fit the array
     */
    @Override
    public void at(double t, double[] target, int offset) {
        Arguments.fromIndexSize("target", target, "offset", offset, Placement.COMPONENTS);
        evaluate(segmentAt(t), t, target, offset);
        double[] c = target;
        int o = offset;
        // the quaternion layout written by evaluate becomes the matrix layout, in place
        Placement.ofQuaternion(c[o], c[o + 1], c[o + 2], c[o + 3], c[o + 4], c[o + 5], c[o + 6], c[o + 7], c[o + 8],
                c[o + 9], c[o + 10], c[o + 11], c[o + 12], c[o + 13], c[o + 14], c[o + 15], c[o + 16], c[o + 17],
                c[o + 18], target, offset);
    }

    /** The segment to evaluate t on, or the refusal of t. */
    private int segmentAt(double t) {
        int n = times.length;
        if (!(t >= times[0] && t <= times[n - 1])) {
            throw new IllegalArgumentException("t must be within the recorded span [" + times[0] + ", "
                    + times[n - 1] + "] s (no extrapolation), got " + t);
        }
        int i = usableSegment(t, segment(t));
        if (i < 0) {
            throw gapRefusal(t, -i - 1);
        }
        return i;
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

    /**
     * Returns the interval index the search finds for t (tests compare it with the JDK's search).
     *
     * @return the interval index the search finds for t (tests compare it with the JDK's search)
     */
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

    private void evaluate(int i, double t, double[] out, int o) {
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

        // ---- one quintic Hermite per channel on s in [0, 1], matching value, first and second
        // derivative at both ends: y0 + a1 s + a2 s^2 + k3 s^3 + k4 s^4 + k5 s^5. Channels 0 to 2
        // are the position axes (value, rate and acceleration go to out[o + c], [o + 3 + c],
        // [o + 6 + c]); channels 3 to 6 the quaternion components p, p', p'' (to out[o + 9 + k],
        // [o + 13 + k], [o + 17 + k]). The stencil weights above serve every channel.
        for (int ch = 0; ch < 7; ch++) {
            boolean position = ch < 3;
            int comp = position ? ch : ch - 3;
            double[] y = position ? positions : attitudes;
            int stride = position ? 3 : 4;
            double f0;
            double f1;
            double g0;
            double g1;
            if (position ? velocities == null : rates == null) {
                f0 = weigh(y, stride, comp, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
                f1 = weigh(y, stride, comp, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
                g0 = weigh(y, stride, comp, iK, i1, i2, i3, i4, bK, b1, b2, b3, b4);
                g1 = weigh(y, stride, comp, jK, j1, j2, j3, j4, eK, e1, e2, e3, e4);
            } else if (position) {
                f0 = velocities[3 * i + comp];
                f1 = velocities[3 * j + comp];
                g0 = weigh(velocities, 3, comp, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
                g1 = weigh(velocities, 3, comp, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
            } else {
                f0 = quaternionRate(comp, i);
                f1 = quaternionRate(comp, j);
                g0 = weighRates(comp, iK, i1, i2, i3, i4, aK, a1, a2, a3, a4);
                g1 = weighRates(comp, jK, j1, j2, j3, j4, cK, c1, c2, c3, c4);
            }
            double y0 = y[stride * i + comp];
            double ha1 = h * f0;
            double ha2 = 0.5 * hh * g0;
            double dv = y[stride * j + comp] - y0 - ha1 - ha2;
            double ds = h * f1 - ha1 - 2 * ha2;
            double dc = hh * g1 - 2 * ha2;
            double k3 = 10 * dv - 4 * ds + 0.5 * dc;
            double k4 = -15 * dv + 7 * ds - dc;
            double k5 = 6 * dv - 3 * ds + 0.5 * dc;
            int at = position ? o + ch : o + 9 + comp;
            int step = position ? 3 : 4;
            out[at] = y0 + s * (ha1 + s * (ha2 + s * (k3 + s * (k4 + s * k5))));
            out[at + step] = (ha1 + s * (2 * ha2 + s * (3 * k3 + s * (4 * k4 + s * 5 * k5)))) * invH;
            out[at + 2 * step] = (2 * ha2 + s * (6 * k3 + s * (12 * k4 + s * 20 * k5))) * invHH;
        }

        // q = p / |p|; w = 2 vec(p* p') / |p|^2; al = 2 vec(p* p'') / |p|^2 - 2 (p . p') w / |p|^2,
        // with vec(a* b) = a0 b_v - b0 a_v - a_v x b_v
        double r0 = out[o + 9];
        double r1 = out[o + 10];
        double r2 = out[o + 11];
        double r3 = out[o + 12];
        double d0 = out[o + 13];
        double d1 = out[o + 14];
        double d2 = out[o + 15];
        double d3 = out[o + 16];
        double dd0 = out[o + 17];
        double dd1 = out[o + 18];
        double dd2 = out[o + 19];
        double dd3 = out[o + 20];
        double n2 = r0 * r0 + r1 * r1 + r2 * r2 + r3 * r3;
        double inv2 = 2.0 / n2;
        double invN = 1.0 / Math.sqrt(n2);
        double wx = inv2 * (r0 * d1 - d0 * r1 - (r2 * d3 - r3 * d2));
        double wy = inv2 * (r0 * d2 - d0 * r2 - (r3 * d1 - r1 * d3));
        double wz = inv2 * (r0 * d3 - d0 * r3 - (r1 * d2 - r2 * d1));
        double dot = inv2 * (r0 * d0 + r1 * d1 + r2 * d2 + r3 * d3);
        out[o + 9] = r0 * invN;
        out[o + 10] = r1 * invN;
        out[o + 11] = r2 * invN;
        out[o + 12] = r3 * invN;
        out[o + 13] = wx;
        out[o + 14] = wy;
        out[o + 15] = wz;
        out[o + 16] = inv2 * (r0 * dd1 - dd0 * r1 - (r2 * dd3 - r3 * dd2)) - dot * wx;
        out[o + 17] = inv2 * (r0 * dd2 - dd0 * r2 - (r3 * dd1 - r1 * dd3)) - dot * wy;
        out[o + 18] = inv2 * (r0 * dd3 - dd0 * r3 - (r1 * dd2 - r2 * dd1)) - dot * wz;
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

    private static void checkSampleCount(double[] times) {
        if (times.length < 2) {
            throw new IllegalArgumentException("times must hold at least 2 samples, got " + times.length);
        }
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
            if (i > 0 && t > times[i - 1] && !(t - times[i - 1] >= MIN_SAMPLE_INTERVAL)) {
                throw new IllegalArgumentException(label.apply(i) + ": time " + t + " s is only " + (t - times[i - 1])
                        + " s after " + label.apply(i - 1) + "; consecutive sample times must be at least "
                        + MIN_SAMPLE_INTERVAL + " s apart (the interpolation divides by the cube of the interval)");
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
            // a quaternion unit to rounding (within 2 ulps of 1) is kept as it is, so normalising is
            // idempotent: a motion read back from a stream keeps the bits it was written with
            double sign = Math.abs(norm - 1.0) <= 2 * Math.ulp(1.0) ? 1.0 : 1.0 / norm;
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
     * Replaces this motion in a stream by its proxy.
     *
     * @return the proxy holding the sample arrays
     */
    private Object writeReplace() {
        return new Proxy(times, positions, attitudes, velocities, rates, maxGap);
    }

    /**
     * Refuses a stream that bypasses the proxy.
     *
     * @param in the stream
     * @throws InvalidObjectException always
     */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw new InvalidObjectException("a SampledMotion is read only through its serialization proxy");
    }

    /**
     * The serialized form of a sampled motion: its sample arrays and max gap. Reading rebuilds the
     * motion through the same checks as the factories, and the motion keeps the arrays those
     * checks normalised and sign-aligned (a stream is untrusted input like any other source of
     * samples).
     */
    private static final class Proxy implements Serializable {

        private static final long serialVersionUID = 1L;

        /** Sample times (s). */
        private final double[] times;
        /** Positions, x, y, z per sample (m). */
        private final double[] positions;
        /** Quaternions, q0..q3 per sample. */
        private final double[] attitudes;
        /** Measured origin velocities (m/s), or null. */
        private final double[] velocities;
        /** Measured angular rates (rad/s), or null. */
        private final double[] rates;
        /** Longest interpolated interval (s). */
        private final double maxGap;

        Proxy(double[] times, double[] positions, double[] attitudes, double[] velocities, double[] rates,
              double maxGap) {
            this.times = times;
            this.positions = positions;
            this.attitudes = attitudes;
            this.velocities = velocities;
            this.rates = rates;
            this.maxGap = maxGap;
        }

        /**
         * Rebuilds the motion with the checks of the factories.
         *
         * @return the motion, holding the arrays it validated
         * @throws InvalidObjectException if a check refuses the samples
         */
        private Object readResolve() throws InvalidObjectException {
            try {
                Arguments.nonNull("times", times);
                Arguments.nonNull("positions", positions);
                Arguments.nonNull("quaternions", attitudes);
                checkLength("positions", positions.length, 3, times.length);
                checkLength("quaternions", attitudes.length, 4, times.length);
                if (velocities != null) {
                    checkLength("originVelocities", velocities.length, 3, times.length);
                }
                if (rates != null) {
                    checkLength("angularVelocities", rates.length, 3, times.length);
                }
                if (!(maxGap > 0)) {
                    throw new IllegalArgumentException("seconds (max gap) must be positive, got " + maxGap);
                }
                // copies, since a crafted stream may share one array between fields or objects; build
                // checks, normalises and sign-aligns the copies and the motion keeps exactly those
                return build(times.clone(), positions.clone(), attitudes.clone(),
                        velocities == null ? null : velocities.clone(), rates == null ? null : rates.clone(),
                        maxGap, SampledMotion::sampleLabel);
            } catch (IllegalArgumentException | NullPointerException e) {
                throw Arguments.refusedStream(SampledMotion.class, e);
            }
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
