package dev.noninertial.frames.dynamics;

import java.util.Locale;
import java.util.Optional;

import dev.noninertial.frames.Formats;

/**
 * Thrown when an integration cannot go on: a force or crossing function threw or returned a
 * non-finite value, the state became non-finite, the frame's motion refused a time, or the
 * integrator gave up (step size below its minimum, evaluation budget spent). The message and the
 * accessors say at which time and state it happened.
 *
 * <p><b>Conventions.</b> {@link #time()} in s from the user's epoch; {@link #components()} are
 * x, y, z (m) and vx, vy, vz (m/s), seen in and resolved in the integration frame.
 *
 * <p>A failure during {@link TrajectorySolver#solve} carries the part of the trajectory computed
 * before it ({@link #partial()}): every accepted step up to the last one before the failure,
 * with its dense output, events and breakdown, like any {@link Trajectory}.
 *
 * <p>Immutable once thrown and safe to pass between threads. The partial trajectory is not
 * serialized (it holds the integrator's dense output).
 */
public final class TrajectoryFailure extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** Time of the failure (s). */
    private final double time;
    /** x, y, z, vx, vy, vz at the failure, empty if unknown. */
    private final double[] components;
    /** The trajectory up to the last accepted step before the failure, null if none. */
    private final transient Trajectory partial;
    /** Whether a force refused its arguments (a region limit): a step limit may then help. */
    private final boolean forceRefusal;

    TrajectoryFailure(String what, double time, double[] y, Throwable cause) {
        this(what, time, y, cause, false);
    }

    TrajectoryFailure(String what, double time, double[] y, Throwable cause, boolean forceRefusal) {
        super(what + " at t = " + Formats.number(time) + " s, " + describe(y), cause);
        this.time = time;
        this.components = y == null ? new double[0] : y.clone();
        this.partial = null;
        this.forceRefusal = forceRefusal;
    }

    /** The same failure with a message, a time and the partial trajectory set by the solver. */
    private TrajectoryFailure(String message, double time, double[] components, Throwable cause,
                              Trajectory partial, boolean forceRefusal) {
        super(message, cause);
        this.time = time;
        this.components = components;
        this.partial = partial;
        this.forceRefusal = forceRefusal;
    }

    /**
     * The failure as the solver reports it: the partial trajectory attached, a time that is never
     * NaN (the last accepted time when the integrator failed at an unknown time), and the hint
     * about a step limit only where it can help.
     */
    TrajectoryFailure completed(Trajectory computed, double lastGoodTime, double startTime) {
        double t = Double.isFinite(time) ? time : lastGoodTime;
        String message = getMessage();
        if (!Double.isFinite(time)) {
            message = message + " (the integrator reported no valid time; last accepted time "
                    + Formats.number(lastGoodTime) + " s)";
        }
        if (forceRefusal && t != startTime) {
            // a trial step of an adaptive scheme may probe past the region where a force is
            // defined (underground, say): the usual cure is a step limit. Not at the start state,
            // where no step was taken and a step limit cannot help
            message = message + "; if the force is defined only in a region, limit the step with"
                    + " TrajectorySolver.withMaxStep";
        }
        TrajectoryFailure done = new TrajectoryFailure(message, t, components, getCause(), computed, forceRefusal);
        done.setStackTrace(getStackTrace());
        return done;
    }

    static String describe(double[] y) {
        if (y == null || y.length < 6) {
            return "state unknown";
        }
        return String.format(Locale.ROOT, "state r = (%s, %s, %s) m, v = (%s, %s, %s) m/s",
                y[0], y[1], y[2], y[3], y[4], y[5]);
    }

    /**
     * Returns time of the failure (s from the user's epoch).
     *
     * @return time of the failure (s from the user's epoch)
     */
    public double time() {
        return time;
    }

    /**
     * The state at the failure.
     *
     * @return a copy of x, y, z (m), vx, vy, vz (m/s) in the integration frame; empty if unknown
     */
    public double[] components() {
        return components.clone();
    }

    /**
     * The trajectory computed before the failure.
     *
     * @return the accepted steps from the start up to the last one before the failure, empty if
     *         the failure came before the first accepted step (or the failure was deserialized)
     */
    public Optional<Trajectory> partial() {
        return Optional.ofNullable(partial);
    }
}
