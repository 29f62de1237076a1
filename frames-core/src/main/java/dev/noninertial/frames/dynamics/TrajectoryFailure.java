package dev.noninertial.frames.dynamics;

import java.util.Locale;

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
 * <p>Immutable once thrown and safe to pass between threads.
 */
public final class TrajectoryFailure extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** Time of the failure (s). */
    private final double time;
    /** x, y, z, vx, vy, vz at the failure, empty if unknown. */
    private final double[] components;

    TrajectoryFailure(String what, double time, double[] y, Throwable cause) {
        super(what + " at t = " + Formats.number(time) + " s, " + describe(y), cause);
        this.time = time;
        this.components = y == null ? new double[0] : y.clone();
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
}
