package dev.noninertial.frames.motion;

import java.io.Serializable;
import java.util.Arrays;
import java.util.Locale;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * The angle of a turntable, rate table or centrifuge arm about its axis as a function of time,
 * made of continuous pieces: ramps at a constant angular acceleration, holds at a constant rate,
 * step sequences of rate plateaus, and oscillations. The rate and the angular acceleration are
 * the exact derivatives of the angle by construction: a user gives accelerations and durations,
 * never independent rates. {@link Motions#turning(org.hipparchus.geometry.euclidean.threed.Vector3D, SpinProfile)}
 * turns a profile into a motion.
 *
 * <pre>{@code
 * SpinProfile run = SpinProfile.startingAt(0.0, 0.0, 0.0)   // time, angle, rate
 *         .ramp(20.0, 0.15)                                  // 20 s at 0.15 rad/s^2
 *         .hold(60.0)
 *         .ramp(20.0, -0.15);
 * }</pre>
 *
 * <p><b>Continuity.</b> Each piece starts from the angle and rate where the previous one ends, so
 * angle and rate are continuous (C1); the angular acceleration may jump between pieces. Joining
 * two separately built profiles with {@link #then(SpinProfile)} refuses a gap in time or a jump
 * in angle or rate, with a message that names the join and both values.
 *
 * <p><b>Span.</b> A profile is defined on {@code [start(), end()]}; times outside are refused,
 * nothing is extrapolated (end a run with {@link #hold(double)} to keep it defined).
 *
 * <p>Angles in radians (positive by the right-hand rule about the axis), rates in rad/s,
 * accelerations in rad/s^2, times in seconds. Immutable, thread-safe and serializable.
 */
public final class SpinProfile implements Serializable {

    /**
     * Joins of {@link #then(SpinProfile)} accept differences up to this fraction of the larger
     * magnitude (with a floor of 1 rad or 1 rad/s): rounding of the pieces' sums, not a jump.
     */
    public static final double JOIN_TOLERANCE = 1e-12;

    private static final long serialVersionUID = 1L;

    /** Piece kinds. */
    private static final int POLYNOMIAL = 0;
    private static final int COSINE = 1;

    /** Start time of each piece, then the end of the last: n + 1 entries. */
    private final double[] times;
    /** Per piece: kind. */
    private final int[] kinds;
    /**
     * Per piece, 4 doubles: angle and rate at the piece's start, then (polynomial) angular
     * acceleration and unused, or (cosine) amplitude and angular frequency.
     */
    private final double[] params;

    private SpinProfile(double[] times, int[] kinds, double[] params) {
        this.times = times;
        this.kinds = kinds;
        this.params = params;
    }

    /**
     * A stream is untrusted input: array shapes, finite values, increasing times, continuous joins.
     *
     * @param in the stream
     * @throws java.io.IOException if the stream cannot be read or holds invalid values
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            if (times == null || kinds == null || params == null || kinds.length < 1 || times.length != kinds.length + 1
                    || params.length != 4 * kinds.length) {
                throw new IllegalArgumentException("arrays of inconsistent lengths");
            }
            for (int i = 0; i < times.length; i++) {
                Arguments.finite("times[" + i + "]", times[i]);
                if (i > 0 && !(times[i] > times[i - 1]) && !(kinds.length == 1 && times[1] == times[0])) {
                    throw new IllegalArgumentException("times must increase strictly at index " + i);
                }
            }
            for (int i = 0; i < params.length; i++) {
                Arguments.finite("params[" + i + "]", params[i]);
            }
            for (int i = 0; i < kinds.length; i++) {
                if (kinds[i] != POLYNOMIAL && kinds[i] != COSINE) {
                    throw new IllegalArgumentException("unknown piece kind " + kinds[i]);
                }
                if (i > 0) {
                    double[] before = new double[3];
                    evaluatePiece(i - 1, times[i], before);
                    checkJoin("angle", "rad", times[i], before[0], params[4 * i]);
                    checkJoin("rate", "rad/s", times[i], before[1], params[4 * i + 1]);
                }
            }
        } catch (RuntimeException e) {
            throw Arguments.refusedStream(SpinProfile.class, e);
        }
    }

    /**
     * A profile that starts at a given state; add pieces with {@link #ramp(double, double)},
     * {@link #hold(double)}, {@link #rampTo(double, double)}, {@link #steps(double[], double, double)}
     * and {@link #oscillate(double, double, double)}. It has no duration yet: times other than
     * {@code time} are refused until a piece is added.
     *
     * @param time start time (s)
     * @param angle angle at the start (rad)
     * @param rate rate at the start (rad/s)
     * @return the profile
     * @throws IllegalArgumentException if a value is not finite
     */
    public static SpinProfile startingAt(double time, double angle, double rate) {
        Arguments.finite("time", time);
        Arguments.finite("angle", angle);
        Arguments.finite("rate", rate);
        return new SpinProfile(new double[] {time, time}, new int[] {POLYNOMIAL},
                new double[] {angle, rate, 0.0, 0.0});
    }

    /**
     * Returns start of the span (s).
     *
     * @return start of the span (s)
     */
    public double start() {
        return times[0];
    }

    /**
     * Returns end of the span (s).
     *
     * @return end of the span (s)
     */
    public double end() {
        return times[times.length - 1];
    }

    /**
     * Returns number of pieces.
     *
     * @return number of pieces
     */
    public int pieceCount() {
        return kinds.length;
    }

    /**
     * A copy with a piece at a constant angular acceleration added at the end.
     *
     * @param duration length of the piece (s), positive
     * @param angularAcceleration constant angular acceleration (rad/s^2), finite
     * @return the longer profile
     * @throws IllegalArgumentException if an argument is out of range
     */
    public SpinProfile ramp(double duration, double angularAcceleration) {
        Arguments.positive("duration", duration);
        Arguments.finite("angularAcceleration", angularAcceleration);
        return ramp("duration", duration, angularAcceleration);
    }

    private SpinProfile ramp(String source, double duration, double angularAcceleration) {
        double[] end = stateAt(end());
        return append(source, duration, POLYNOMIAL, end[0], end[1], angularAcceleration, 0.0);
    }

    /**
     * A copy with a hold at the current rate added at the end (constant rate, zero angular
     * acceleration).
     *
     * @param duration length of the hold (s), positive
     * @return the longer profile
     * @throws IllegalArgumentException if the duration is not positive and finite
     */
    public SpinProfile hold(double duration) {
        return ramp(duration, 0.0);
    }

    /**
     * A copy with a ramp to a target rate added at the end, at the given magnitude of angular
     * acceleration (the sign follows from the target); its duration is
     * {@code |rate - current| / angularAcceleration}. A target equal to the current rate adds
     * nothing.
     *
     * @param rate target rate (rad/s), finite
     * @param angularAcceleration magnitude of the angular acceleration (rad/s^2), positive
     * @return the longer profile
     * @throws IllegalArgumentException if an argument is out of range
     */
    public SpinProfile rampTo(double rate, double angularAcceleration) {
        Arguments.finite("rate", rate);
        Arguments.positive("angularAcceleration", angularAcceleration);
        double current = stateAt(end())[1];
        double change = rate - current;
        if (change == 0.0) {
            return this;
        }
        return ramp("|rate - current rate| / angularAcceleration", Math.abs(change) / angularAcceleration,
                Math.copySign(angularAcceleration, change));
    }

    /**
     * A copy with a step sequence added at the end: for each rate in turn, a ramp to it at the
     * given magnitude of angular acceleration, then a hold of {@code holdDuration}.
     *
     * @param rates the plateau rates (rad/s), at least one, finite
     * @param holdDuration hold at each plateau (s), positive
     * @param angularAcceleration magnitude of the angular acceleration of the ramps (rad/s^2), positive
     * @return the longer profile
     * @throws IllegalArgumentException if an argument is out of range (the message names the index)
     */
    public SpinProfile steps(double[] rates, double holdDuration, double angularAcceleration) {
        Arguments.nonNull("rates", rates);
        if (rates.length == 0) {
            throw new IllegalArgumentException("rates must hold at least one plateau rate, got none");
        }
        Arguments.positive("holdDuration", holdDuration);
        Arguments.positive("angularAcceleration", angularAcceleration);
        SpinProfile p = this;
        for (int i = 0; i < rates.length; i++) {
            double rate = Arguments.finite("rates[" + i + "]", rates[i]);
            double change = rate - p.stateAt(p.end())[1];
            if (change != 0.0) {
                // the end time this ramp must move was set by the earlier holds: name both
                p = p.ramp("ramp to rates[" + i + "] at angularAcceleration, after " + i + " holds of holdDuration",
                        Math.abs(change) / angularAcceleration, Math.copySign(angularAcceleration, change));
            }
            p = p.ramp("holdDuration", holdDuration, 0.0);
        }
        return p;
    }

    /**
     * A copy with an oscillation added at the end: over {@code cycles} periods of
     * {@code 2 pi / angularFrequency}, the angle is the current steady turn plus
     * {@code amplitude (1 - cos(angularFrequency tau))} ({@code tau} from the piece's start), so
     * the rate {@code current + amplitude angularFrequency sin(angularFrequency tau)} starts and,
     * after whole cycles, ends at the current rate: the join is continuous in angle and rate. The
     * swing is {@code 2 amplitude} peak to peak about the steady turn plus {@code amplitude}.
     *
     * @param amplitude half the peak-to-peak swing (rad), finite
     * @param angularFrequency 2 pi / period (rad/s), positive
     * @param cycles number of periods (may be fractional), positive
     * @return the longer profile
     * @throws IllegalArgumentException if an argument is out of range
     */
    public SpinProfile oscillate(double amplitude, double angularFrequency, double cycles) {
        Arguments.finite("amplitude", amplitude);
        Arguments.positive("angularFrequency", angularFrequency);
        Arguments.positive("cycles", cycles);
        double[] end = stateAt(end());
        return append("2 pi cycles / angularFrequency", 2.0 * Math.PI * cycles / angularFrequency, COSINE, end[0],
                end[1], amplitude, angularFrequency);
    }

    /**
     * This profile followed by another one. The other must start when this one ends, at the same
     * angle and rate (within {@link #JOIN_TOLERANCE}); the angular acceleration may jump.
     *
     * @param next the profile to run after this one
     * @return the joined profile
     * @throws IllegalArgumentException if the join is discontinuous in time, angle or rate; the
     *         message names the join time and both values
     */
    public SpinProfile then(SpinProfile next) {
        Arguments.nonNull("next", next);
        double t = end();
        if (next.start() != t) {
            throw new IllegalArgumentException("next must start when this profile ends (" + t + " s), got "
                    + next.start() + " s");
        }
        double[] a = stateAt(t);
        double[] b = next.stateAt(t);
        checkJoin("angle", "rad", t, a[0], b[0]);
        checkJoin("rate", "rad/s", t, a[1], b[1]);
        SpinProfile first = hasDuration() ? this : null;
        SpinProfile second = next.hasDuration() ? next : null;
        if (first == null) {
            return second == null ? this : next;
        }
        if (second == null) {
            return this;
        }
        int n = kinds.length;
        int m = second.kinds.length;
        double[] nt = Arrays.copyOf(times, n + m + 1);
        System.arraycopy(second.times, 1, nt, n + 1, m);
        int[] nk = Arrays.copyOf(kinds, n + m);
        System.arraycopy(second.kinds, 0, nk, n, m);
        double[] np = Arrays.copyOf(params, 4 * (n + m));
        System.arraycopy(second.params, 0, np, 4 * n, 4 * m);
        return new SpinProfile(nt, nk, np);
    }

    private static void checkJoin(String what, String unit, double t, double left, double right) {
        double scale = Math.max(1.0, Math.max(Math.abs(left), Math.abs(right)));
        if (!(Math.abs(left - right) <= JOIN_TOLERANCE * scale)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "profiles joined at t = %s s must be continuous in %s: %s %s before the join, %s %s after "
                    + "(difference %.3g %s, allowed %.3g)", Formats.number(t), what, left, unit, right, unit,
                    right - left, unit, JOIN_TOLERANCE * scale));
        }
    }

    /**
     * Angle at time {@code t}.
     *
     * @param t time (s), in [start(), end()]
     * @return angle (rad)
     * @throws IllegalArgumentException if {@code t} is outside the span
     */
    public double angle(double t) {
        return stateAt(t)[0];
    }

    /**
     * Rate (the derivative of the angle) at time {@code t}.
     *
     * @param t time (s), in [start(), end()]
     * @return rate (rad/s)
     * @throws IllegalArgumentException if {@code t} is outside the span
     */
    public double rate(double t) {
        return stateAt(t)[1];
    }

    /**
     * Angular acceleration (the second derivative of the angle) at time {@code t}; at a join,
     * the value of the later piece.
     *
     * @param t time (s), in [start(), end()]
     * @return angular acceleration (rad/s^2)
     * @throws IllegalArgumentException if {@code t} is outside the span
     */
    public double angularAcceleration(double t) {
        return stateAt(t)[2];
    }

    /** {angle, rate, acceleration} at t. */
    double[] stateAt(double t) {
        double[] out = new double[3];
        evaluate(t, out);
        return out;
    }

    /** Writes {angle, rate, acceleration} at t into out[0..3). */
    void evaluate(double t, double[] out) {
        if (!(t >= times[0] && t <= times[times.length - 1])) {
            throw new IllegalArgumentException("t must be in [" + times[0] + ", " + times[times.length - 1]
                    + "] s (the span of the spin profile), got " + t);
        }
        int i = Arrays.binarySearch(times, 0, kinds.length, t);
        if (i < 0) {
            i = -i - 2;
        }
        i = Math.min(Math.max(i, 0), kinds.length - 1);
        evaluatePiece(i, t, out);
    }

    /** Writes {angle, rate, acceleration} of piece i at t (no span check). */
    private void evaluatePiece(int i, double t, double[] out) {
        double tau = t - times[i];
        double a0 = params[4 * i];
        double r0 = params[4 * i + 1];
        if (kinds[i] == POLYNOMIAL) {
            double al = params[4 * i + 2];
            out[0] = a0 + tau * (r0 + 0.5 * al * tau);
            out[1] = r0 + al * tau;
            out[2] = al;
        } else {
            double amp = params[4 * i + 2];
            double w = params[4 * i + 3];
            double s = Math.sin(w * tau);
            double c = Math.cos(w * tau);
            // 1 - cos written as 2 sin^2(x/2): no cancellation near the piece's start
            double h = Math.sin(0.5 * w * tau);
            out[0] = a0 + r0 * tau + amp * 2.0 * h * h;
            out[1] = r0 + amp * w * s;
            out[2] = amp * w * w * c;
        }
    }

    private boolean hasDuration() {
        return times[times.length - 1] > times[0];
    }

    /**
     * Appends a piece. {@code source} names the arguments the duration was computed from, for the
     * message when the piece cannot move the end time to a later finite time.
     */
    private SpinProfile append(String source, double duration, int kind, double a0, double r0, double p2,
                               double p3) {
        double t0 = end();
        double t1 = t0 + duration;
        if (!(t1 > t0) || !Double.isFinite(t1)) {
            throw new IllegalArgumentException("the piece's duration (" + source + ") " + duration
                    + " s must move the end time " + t0 + " s to a later finite time (too short or too long)");
        }
        if (!hasDuration()) {
            return new SpinProfile(new double[] {t0, t1}, new int[] {kind}, new double[] {a0, r0, p2, p3});
        }
        int n = kinds.length;
        double[] nt = Arrays.copyOf(times, n + 2);
        nt[n + 1] = t1;
        int[] nk = Arrays.copyOf(kinds, n + 1);
        nk[n] = kind;
        double[] np = Arrays.copyOf(params, 4 * (n + 1));
        np[4 * n] = a0;
        np[4 * n + 1] = r0;
        np[4 * n + 2] = p2;
        np[4 * n + 3] = p3;
        return new SpinProfile(nt, nk, np);
    }


    @Override
    public boolean equals(Object other) {
        return other instanceof SpinProfile && Arrays.equals(times, ((SpinProfile) other).times)
                && Arrays.equals(kinds, ((SpinProfile) other).kinds) && Arrays.equals(params, ((SpinProfile) other).params);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(times) + Arrays.hashCode(params);
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("SpinProfile{");
        for (int i = 0; i < kinds.length; i++) {
            b.append(i == 0 ? "" : ", ").append('[').append(Formats.number(times[i])).append(", ")
                    .append(Formats.number(times[i + 1])).append("] s ");
            if (kinds[i] == POLYNOMIAL) {
                b.append(params[4 * i + 2] == 0.0 ? "hold at " + Formats.number(params[4 * i + 1]) + " rad/s"
                        : "ramp at " + Formats.number(params[4 * i + 2]) + " rad/s^2");
            } else {
                b.append("oscillation ").append(Formats.number(params[4 * i + 2])).append(" rad at ")
                        .append(Formats.number(params[4 * i + 3])).append(" rad/s");
            }
        }
        return b.append('}').toString();
    }
}
