package dev.noninertial.frames.sensing;

import java.io.Serializable;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;

/**
 * A perfect accelerometer triad and gyro triad fixed in a sensor frame S: what they read at any
 * time, and their exact increments over intervals.
 *
 * <pre>{@code
 * IdealSensor imu = IdealSensor.of(sensorFrame, earth.gravitationIn(sensorFrame));
 * InertialReading r = imu.readingAt(12.0);              // f and w in S axes
 * SensorIncrements d = imu.incrementsOver(12.0, 12.01); // integrals of f and w over the interval
 * }</pre>
 *
 * <h2>What is read (conventions)</h2>
 * S is any frame of a tree (usually a child of a body frame, fixed by a lever arm and a mounting
 * orientation); the tree's root is inertial by declaration. At time {@code t}:
 * <ul>
 *   <li>specific force {@code f = a - g}, resolved in S axes (m/s^2): {@code a} is the
 *       acceleration of S's origin relative to the root, {@code g} the gravitation at S's origin
 *       as given by the field passed to {@link #of(ReferenceFrame, SpecificForce)}. At rest on the
 *       Earth the accelerometer reads minus normal gravity: upward, about 9.8 m/s^2;</li>
 *   <li>angular rate: the angular velocity of S relative to the root, resolved in S axes
 *       (rad/s); on the Earth it contains the Earth's rotation (a gyro never measures rates
 *       relative to the Earth).</li>
 * </ul>
 *
 * <h2>Gravitation, never gravity</h2>
 * The field must be <em>gravitation</em> (the attraction of the masses alone), resolved in S axes,
 * such as {@code earth.gravitationIn(S)} of the geodesy module's {@code EarthFrames}. Normal
 * gravity (what a plumb line shows) already contains the centrifugal acceleration of the Earth's
 * rotation, and the inertial acceleration {@code a} measured against the root contains that
 * rotation too; passing gravity would count the centrifugal term twice and shift the reading by up
 * to 0.034 m/s^2 (at the equator). In a tree whose root is a laboratory declared inertial (the
 * Earth's rotation neglected), the uniform laboratory field {@code SpecificForce.uniform(g)} plays
 * the role of gravitation.
 *
 * <h2>Increments</h2>
 * {@link #incrementsOver(double, double)} integrates the readings by adaptive quadrature: on each
 * piece the 5-point Gauss-Lobatto rule (exact for polynomials of degree 7) is compared with the
 * embedded 3-point rule (Simpson), and a piece is halved until the difference is at most
 * {@link #tolerance()} times {@code integral (|a| + |g|) dt} for the delta-velocity and times
 * {@code integral |w| dt} for the delta-angle (both over the whole increment, plus absolute floors
 * of 1e-15 m/s^2 and 1e-18 rad/s times its duration, below the rounding of the readings). The
 * difference estimates the error of the lower rule, so the returned 5-point values are usually far
 * more accurate than the tolerance. Inside an increment, readings must be continuous for the
 * quadrature to converge quickly (a jump in angular acceleration at a lever arm makes the specific
 * force jump: the pieces around it are halved up to {@value #MAX_DEPTH} times, and an increment
 * that still does not meet the tolerance is refused); align increment boundaries with such jumps.
 *
 * <h2>Bulk forms</h2>
 * {@link #readingsAt(double[], int, double[], int, int)} and
 * {@link #incrementsOver(double, double, int, double[], int)} work on primitive arrays and
 * allocate a scratch array per call and nothing per sample, provided the motions of S's chain
 * override {@link dev.noninertial.frames.Motion#at(double, double[], int)} and the field
 * overrides {@link SpecificForce#at(double, double[], int, double[], int)} (true for the motions of
 * {@code Motions} except {@code compose}, {@link SpecificForce#uniform(Vector3D)} and the Earth's
 * gravitation).
 *
 * <p>Immutable and thread-safe when the frame's motions and the field are. Results are for
 * simulation and analysis; they are not for primary navigation, lifting or human-centrifuge
 * decisions, which are governed by local codes, standards and licensed practice.
 */
public final class IdealSensor implements Serializable {

    /** Default quadrature tolerance of the increments (relative, see the class comment). */
    public static final double DEFAULT_TOLERANCE = 1e-12;
    /** Most halvings of an increment's pieces before it is refused. */
    public static final int MAX_DEPTH = 60;
    /** Most intervals of one {@link #incrementsOver(double, double, int)} log (6 doubles each in one array). */
    public static final int MAX_LOG_INTERVALS = Integer.MAX_VALUE / 8;

    private static final long serialVersionUID = 1L;

    /** Absolute floor of the delta-velocity tolerance, per second of increment (m/s^2). */
    private static final double FORCE_FLOOR = 1e-15;
    /** Absolute floor of the delta-angle tolerance, per second of increment (rad/s). */
    private static final double RATE_FLOOR = 1e-18;

    /** Gauss-Lobatto 5-point nodes on [-1, 1]: 0, +-sqrt(3/7), +-1. */
    private static final double NODE = Math.sqrt(3.0 / 7.0);
    /** Gauss-Lobatto 5-point weights (ends, inner, middle) on [-1, 1]. */
    private static final double[] LOBATTO = {1.0 / 10.0, 49.0 / 90.0, 32.0 / 45.0, 49.0 / 90.0, 1.0 / 10.0};
    /** Simpson weights on the same nodes (inner nodes unused). */
    private static final double[] SIMPSON = {1.0 / 3.0, 0.0, 4.0 / 3.0, 0.0, 1.0 / 3.0};

    /** Layout of the scratch array: placement work, gravitation state and result, node readings. */
    private static final int STATE = 2 * Placement.COMPONENTS;
    private static final int GRAVITY = STATE + 9;
    private static final int ACC = GRAVITY + 3;
    private static final int PIECE = ACC + 6;
    private static final int LEVELS = PIECE + 2 * 5;
    private static final int PER_LEVEL = 5 * 7;
    private static final int SCRATCH = LEVELS + (MAX_DEPTH + 1) * PER_LEVEL;

    /** The sensor frame S. */
    private final ReferenceFrame frame;
    /** Gravitation at S's origin, resolved in S axes. */
    @SuppressWarnings("serial") // written with the sensor: the library's gravitation functions are serializable, a user's must be too
    private final SpecificForce gravitation;
    /** Relative quadrature tolerance of the increments. */
    private final double tolerance;
    /** The inertial root of S's tree. */
    private final ReferenceFrame root;

    private IdealSensor(ReferenceFrame frame, SpecificForce gravitation, double tolerance) {
        this.frame = frame;
        this.gravitation = gravitation;
        this.tolerance = tolerance;
        this.root = frame.root();
    }

    /**
     * A stream is untrusted input: the checks of the factory and of {@link #withTolerance(double)}.
     *
     * @param in the stream
     * @throws java.io.IOException if the stream cannot be read or holds invalid values
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.nonNull("frame", frame);
            Arguments.nonNull("gravitation", gravitation);
            Arguments.inRange("tolerance", tolerance, 1e-15, 1e-3);
            if (root != frame.root()) {
                throw new IllegalArgumentException("root must be the root of the sensor frame's tree");
            }
        } catch (RuntimeException e) {
            throw Arguments.refusedStream(IdealSensor.class, e);
        }
    }

    /**
     * An ideal sensor fixed in a frame.
     *
     * @param sensorFrame the sensor frame S (its origin is the measuring point, its axes the
     *        sensing axes)
     * @param gravitation gravitation (not gravity, see the class comment) at a point of S,
     *        resolved in S axes, for example {@code earth.gravitationIn(sensorFrame)}
     * @return the sensor, with the default increment tolerance {@value #DEFAULT_TOLERANCE}
     * @throws NullPointerException if an argument is null
     */
    public static IdealSensor of(ReferenceFrame sensorFrame, SpecificForce gravitation) {
        Arguments.nonNull("sensorFrame", sensorFrame);
        Arguments.nonNull("gravitation", gravitation);
        return new IdealSensor(sensorFrame, gravitation, DEFAULT_TOLERANCE);
    }

    /**
     * A copy with another quadrature tolerance for the increments.
     *
     * @param relativeTolerance relative tolerance (see the class comment), in [1e-15, 1e-3]
     * @return the copy
     * @throws IllegalArgumentException if the tolerance is outside the range
     */
    public IdealSensor withTolerance(double relativeTolerance) {
        return new IdealSensor(frame, gravitation, Arguments.inRange("relativeTolerance", relativeTolerance,
                1e-15, 1e-3));
    }

    /**
     * Returns the sensor frame S.
     *
     * @return the sensor frame S
     */
    public ReferenceFrame frame() {
        return frame;
    }

    /**
     * Returns the gravitation field, resolved in S axes.
     *
     * @return the gravitation field, resolved in S axes
     */
    public SpecificForce gravitation() {
        return gravitation;
    }

    /**
     * Returns the relative quadrature tolerance of the increments.
     *
     * @return the relative quadrature tolerance of the increments
     */
    public double tolerance() {
        return tolerance;
    }

    /**
     * What the sensor reads at one time.
     *
     * @param t time (s from the user's epoch)
     * @return specific force and angular rate, S axes
     * @throws IllegalArgumentException if {@code t} is not finite or outside the span of a motion
     */
    public InertialReading readingAt(double t) {
        Arguments.finite("t", t);
        double[] s = new double[GRAVITY + 3 + 6];
        read(t, s, s, GRAVITY + 3);
        int o = GRAVITY + 3;
        return new InertialReading(t, new Vector3D(s[o], s[o + 1], s[o + 2]),
                new Vector3D(s[o + 3], s[o + 4], s[o + 5]));
    }

    /**
     * What the sensor reads at many times, on primitives: reading {@code k} (layout of
     * {@link InertialReading#COMPONENTS}: f x, y, z in m/s^2, then w x, y, z in rad/s, S axes) at
     * {@code times[timeOffset + k]} goes to {@code target[targetOffset + 6 k ...]}. Allocates one
     * scratch array per call and nothing per reading (see the class comment).
     *
     * @param times times (s)
     * @param timeOffset index of the first time
     * @param target receives the readings (caller-owned)
     * @param targetOffset index of the first reading's f x
     * @param count number of readings
     * @throws IllegalArgumentException if a range does not fit its array, or a time is not finite or
     *         outside the span of a motion
     */
    public void readingsAt(double[] times, int timeOffset, double[] target, int targetOffset, int count) {
        Arguments.nonNull("times", times);
        Arguments.nonNull("target", target);
        Arguments.fromIndexSize("times", times, "timeOffset", timeOffset, "count", count, 1);
        Arguments.fromIndexSize("target", target, "targetOffset", targetOffset, "count", count,
                InertialReading.COMPONENTS);
        double[] s = new double[GRAVITY + 3];
        for (int k = 0; k < count; k++) {
            double t = times[timeOffset + k];
            if (!Double.isFinite(t)) {
                throw new IllegalArgumentException("times[" + (timeOffset + k) + "] must be finite, got " + t);
            }
            read(t, s, target, targetOffset + InertialReading.COMPONENTS * k);
        }
    }

    /**
     * The exact increments over one interval, by adaptive quadrature of the readings (see the
     * class comment).
     *
     * @param start start of the interval (s)
     * @param end end of the interval (s), greater than {@code start}
     * @return delta-velocity and delta-angle, S axes
     * @throws IllegalArgumentException if the times are not finite, {@code end <= start}, a time is
     *         outside the span of a motion, or the quadrature does not meet the tolerance
     */
    public SensorIncrements incrementsOver(double start, double end) {
        Arguments.finite("start", start);
        Arguments.finite("end", end);
        if (!(end > start)) {
            throw new IllegalArgumentException("end must be greater than start (" + start + " s), got " + end);
        }
        double[] s = new double[SCRATCH + 6];
        read(start, s, s, LEVELS);
        read(end, s, s, LEVELS + 4 * 7);
        increment(start, end, s, s, SCRATCH);
        int o = SCRATCH;
        return new SensorIncrements(start, end, new Vector3D(s[o], s[o + 1], s[o + 2]),
                new Vector3D(s[o + 3], s[o + 4], s[o + 5]));
    }

    /**
     * The exact increments over consecutive intervals of a regular grid, as a log (to write to a
     * file, to corrupt with {@link SensorImperfections#applyTo(IncrementLog)}, to navigate):
     * the values of {@link #incrementsOver(double, double, int, double[], int)}.
     *
     * @param start start of the first interval (s)
     * @param interval length of each interval (s), positive
     * @param count number of increments, in [1, {@link #MAX_LOG_INTERVALS}]
     * @return the log; interval {@code k} is {@code [start + k interval, start + (k + 1) interval]}
     * @throws IllegalArgumentException if {@code count} is out of range, or as
     *         {@link #incrementsOver(double, double, int, double[], int)}
     */
    public IncrementLog incrementsOver(double start, double interval, int count) {
        if (count < 1 || count > MAX_LOG_INTERVALS) {
            throw new IllegalArgumentException("count must be in [1, " + MAX_LOG_INTERVALS + "], got " + count);
        }
        double[] packed = new double[SensorIncrements.COMPONENTS * count];
        incrementsOver(start, interval, count, packed, 0);
        return IncrementLog.ofUniform(start, interval, packed);
    }

    /**
     * The exact increments over consecutive intervals of a regular grid, on primitives: increment
     * {@code k} covers {@code [start + k interval, start + (k + 1) interval]} and goes to
     * {@code target[targetOffset + 6 k ...]} (layout of {@link SensorIncrements#COMPONENTS}:
     * delta-velocity x, y, z in m/s, then delta-angle x, y, z in rad, S axes). Readings at shared
     * grid times are computed once. Allocates one scratch array per call and nothing per increment
     * (see the class comment).
     *
     * @param start start of the first interval (s)
     * @param interval length of each interval (s), positive
     * @param count number of increments
     * @param target receives the increments (caller-owned)
     * @param targetOffset index of the first increment's delta-velocity x
     * @throws IllegalArgumentException if a range does not fit the array, a time is not finite or
     *         outside the span of a motion, or the quadrature does not meet the tolerance
     */
    public void incrementsOver(double start, double interval, int count, double[] target, int targetOffset) {
        Arguments.finite("start", start);
        Arguments.positive("interval", interval);
        Arguments.nonNull("target", target);
        Arguments.fromIndexSize("target", target, "targetOffset", targetOffset, "count", count,
                SensorIncrements.COMPONENTS);
        if (count == 0) {
            return;
        }
        double[] s = new double[SCRATCH];
        read(start, s, s, LEVELS + 4 * 7);
        for (int k = 0; k < count; k++) {
            double a = start + k * interval;
            double b = start + (k + 1) * interval;
            if (!Double.isFinite(b)) {
                throw new IllegalArgumentException("end of increment " + k + " must be finite, got " + b);
            }
            System.arraycopy(s, LEVELS + 4 * 7, s, LEVELS, 6);
            read(b, s, s, LEVELS + 4 * 7);
            increment(a, b, s, target, targetOffset + SensorIncrements.COMPONENTS * k);
        }
    }

    /**
     * Reading at t on primitives: f (3) then w (3) into out[o, o + 6), and |a| + |g| into out[o + 6]
     * when the caller reserved it (levels of the quadrature). s: scratch of at least GRAVITY + 3.
     */
    private void read(double t, double[] s, double[] out, int o) {
        frame.placementIn(root, t, s, 0);
        // inertial acceleration of S's origin, root axes -> S axes with v_S = R v_root
        double ax = s[6];
        double ay = s[7];
        double az = s[8];
        double fx = s[9] * ax + s[10] * ay + s[11] * az;
        double fy = s[12] * ax + s[13] * ay + s[14] * az;
        double fz = s[15] * ax + s[16] * ay + s[17] * az;
        double wx = s[18];
        double wy = s[19];
        double wz = s[20];
        for (int k = STATE; k < STATE + 9; k++) {
            s[k] = 0.0;   // S's origin, at rest in S
        }
        gravitation.at(t, s, STATE, s, GRAVITY);
        double gx = s[GRAVITY];
        double gy = s[GRAVITY + 1];
        double gz = s[GRAVITY + 2];
        if (!Double.isFinite(gx) || !Double.isFinite(gy) || !Double.isFinite(gz)) {
            throw new IllegalStateException("gravitation " + gravitation + " is not finite at t = " + t
                    + " in frame '" + frame.path() + "'");
        }
        out[o] = fx - gx;
        out[o + 1] = fy - gy;
        out[o + 2] = fz - gz;
        out[o + 3] = wx;
        out[o + 4] = wy;
        out[o + 5] = wz;
        if (out == s && o >= LEVELS) {
            out[o + 6] = Math.sqrt(fx * fx + fy * fy + fz * fz) + Math.sqrt(gx * gx + gy * gy + gz * gz);
        }
    }

    /**
     * Integrates [a, b] whose end readings are at level 0 (nodes 0 and 4 of s[LEVELS...]); the six
     * integrals go to out[o, o + 6).
     */
    private void increment(double a, double b, double[] s, double[] out, int o) {
        fillInner(a, b, s, 0);
        // scales of the tolerances: integral of |a| + |g| and of |w| by the 5-point rule
        double half = 0.5 * (b - a);
        double scaleF = 0.0;
        double scaleW = 0.0;
        for (int i = 0; i < 5; i++) {
            int n = LEVELS + 7 * i;
            scaleF += LOBATTO[i] * s[n + 6];
            scaleW += LOBATTO[i] * Math.sqrt(s[n + 3] * s[n + 3] + s[n + 4] * s[n + 4] + s[n + 5] * s[n + 5]);
        }
        double tolF = tolerance * half * scaleF + FORCE_FLOOR * (b - a);
        double tolW = tolerance * half * scaleW + RATE_FLOOR * (b - a);
        for (int c = 0; c < 6; c++) {
            s[ACC + c] = 0.0;
        }
        piece(a, b, 0, tolF, tolW, s);
        for (int c = 0; c < 6; c++) {
            out[o + c] = s[ACC + c];
        }
    }

    /** Readings at the three inner Lobatto nodes of [a, b] into level d. */
    private void fillInner(double a, double b, double[] s, int d) {
        double mid = 0.5 * (a + b);
        double half = 0.5 * (b - a);
        int base = LEVELS + d * PER_LEVEL;
        read(mid - NODE * half, s, s, base + 7);
        read(mid, s, s, base + 2 * 7);
        read(mid + NODE * half, s, s, base + 3 * 7);
    }

    /** Adds the integral over [a, b] (readings of level d filled) to s[ACC...], halving as needed. */
    private void piece(double a, double b, int d, double tolF, double tolW, double[] s) {
        int base = LEVELS + d * PER_LEVEL;
        double half = 0.5 * (b - a);
        double errF = 0.0;
        double errW = 0.0;
        for (int c = 0; c < 6; c++) {
            double high = 0.0;
            double low = 0.0;
            for (int i = 0; i < 5; i++) {
                double v = s[base + 7 * i + c];
                high += LOBATTO[i] * v;
                low += SIMPSON[i] * v;
            }
            double err = Math.abs(half * (high - low));
            s[PIECE + c] = half * high;
            if (c < 3) {
                errF = Math.max(errF, err);
            } else {
                errW = Math.max(errW, err);
            }
        }
        if (errF <= tolF && errW <= tolW) {
            for (int c = 0; c < 6; c++) {
                s[ACC + c] += s[PIECE + c];
            }
            return;
        }
        double mid = 0.5 * (a + b);
        if (d + 1 > MAX_DEPTH || !(mid > a && mid < b)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "increments of frame '%s' do not meet the tolerance %.3g near t = %.17g s after %d halvings "
                    + "(estimated error %.3g m/s, %.3g rad): the readings are not smooth there (a jump in "
                    + "angular acceleration at a lever arm, for example); put an increment boundary at the "
                    + "jump or loosen the tolerance", frame.path(), tolerance, mid, d, errF, errW));
        }
        int next = base + PER_LEVEL;
        // left half: ends are this level's nodes 0 and 2
        System.arraycopy(s, base, s, next, 7);
        System.arraycopy(s, base + 2 * 7, s, next + 4 * 7, 7);
        fillInner(a, mid, s, d + 1);
        piece(a, mid, d + 1, tolF, tolW, s);
        // right half: ends are this level's nodes 2 and 4
        System.arraycopy(s, base + 2 * 7, s, next, 7);
        System.arraycopy(s, base + 4 * 7, s, next + 4 * 7, 7);
        fillInner(mid, b, s, d + 1);
        piece(mid, b, d + 1, tolF, tolW, s);
    }

    @Override
    public String toString() {
        return "IdealSensor{frame " + frame.path() + ", gravitation " + gravitation + ", tolerance "
                + tolerance + "}";
    }
}
