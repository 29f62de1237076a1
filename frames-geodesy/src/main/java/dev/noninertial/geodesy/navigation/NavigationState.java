package dev.noninertial.geodesy.navigation;

import java.io.Serializable;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.Orientations;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * The state of a local-level navigator at one instant: time, geodetic position, velocity over
 * the Earth in local-level axes, attitude of the body relative to the level frame, and the memory
 * of the previous step's increments that the coning and sculling corrections use.
 *
 * <h2>Conventions</h2>
 * SI units. Time in seconds from the user's epoch. The velocity is the velocity relative to the
 * Earth-fixed frame, resolved in the level axes of {@link #axes()} (NED: north, east, down; ENU:
 * east, north, up), the level frame north-pointing with "up" along the ellipsoid normal. The
 * attitude is the orientation {@code R} of the body frame in the level frame:
 * {@code v_body = R v_level} ({@link Orientations}' convention); over NED, its yaw, pitch and
 * roll are heading, pitch and bank of a body with x forward, y right, z down.
 *
 * <p>A state made by {@link #of} has no increment history: the first step after it is taken
 * without the terms that need the previous increments. States returned by
 * {@link LevelNavigator#advance} carry it.
 *
 * <p>Immutable and thread-safe.
 */
public final class NavigationState implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Time (s). */
    private final double time;
    /** Position. */
    private final LatLonHeight position;
    /** Level axes of the velocity and the attitude. */
    private final LocalAxes axes;
    /** Velocity components (m/s) in {@link #axes}. */
    private final double v1;
    /** Second velocity component (m/s). */
    private final double v2;
    /** Third velocity component (m/s). */
    private final double v3;
    /** Attitude quaternion, scalar part (body in level). */
    private final double q0;
    /** Attitude quaternion, x. */
    private final double q1;
    /** Attitude quaternion, y. */
    private final double q2;
    /** Attitude quaternion, z. */
    private final double q3;
    /** Steps taken since the state made by {@link #of}. */
    private final long step;
    /** Memory of the previous step (increments, step length, midpoint gravity, rates and radii, end rate; layout of LevelKernel); null if none. */
    private final double[] history;

    NavigationState(double time, LatLonHeight position, LocalAxes axes, double v1, double v2, double v3,
                    double q0, double q1, double q2, double q3, long step, double[] history) {
        this.time = time;
        this.position = position;
        this.axes = axes;
        this.v1 = v1;
        this.v2 = v2;
        this.v3 = v3;
        this.q0 = q0;
        this.q1 = q1;
        this.q2 = q2;
        this.q3 = q3;
        this.step = step;
        this.history = history;
    }

    /**
     * A state without increment history.
     *
     * @param time time (s), finite
     * @param position geodetic position; latitude strictly inside (-90, 90) deg (a north-pointing
     *        level frame is undefined at a pole)
     * @param velocity velocity relative to the Earth (m/s), resolved in {@code axes}
     * @param axes level axes of the velocity and the attitude
     * @param attitude orientation of the body in the level frame ({@code v_body = R v_level})
     * @return the state
     * @throws IllegalArgumentException for a non-finite value or a position at a pole
     */
    public static NavigationState of(double time, LatLonHeight position, Vector3D velocity, LocalAxes axes,
                                     Rotation attitude) {
        Arguments.finite("time (s)", time);
        Arguments.nonNull("position", position);
        Arguments.finite("velocity (m/s)", velocity);
        Arguments.nonNull("axes", axes);
        Arguments.unitRotation("attitude", attitude);
        if (!(Math.abs(position.latitude()) < 0.5 * Math.PI)) {
            throw new IllegalArgumentException("position.latitude must be strictly inside (-90, 90) deg for a "
                    + "north-pointing level frame, got " + position.latitudeDegrees() + " deg");
        }
        double[] q = Orientations.toQuaternion(attitude);
        return new NavigationState(time, position, axes, velocity.getX(), velocity.getY(), velocity.getZ(),
                q[0], q[1], q[2], q[3], 0L, null);
    }

    /**
     * Returns time (s).
     *
     * @return time (s)
     */
    public double time() {
        return time;
    }

    /**
     * Returns geodetic position (rad, m).
     *
     * @return geodetic position (rad, m)
     */
    public LatLonHeight position() {
        return position;
    }

    /**
     * Returns the level axes of {@link #velocity()} and {@link #attitude()}.
     *
     * @return the level axes of {@link #velocity()} and {@link #attitude()}
     */
    public LocalAxes axes() {
        return axes;
    }

    /**
     * Returns velocity relative to the Earth-fixed frame (m/s), resolved in {@link #axes()}.
     *
     * @return velocity relative to the Earth-fixed frame (m/s), resolved in {@link #axes()}
     */
    public Vector3D velocity() {
        return new Vector3D(v1, v2, v3);
    }

    /**
     * Returns orientation of the body in the level frame, {@code v_body = R v_level}.
     *
     * @return orientation of the body in the level frame, {@code v_body = R v_level}
     */
    public Rotation attitude() {
        return Orientations.fromQuaternion(q0, q1, q2, q3);
    }

    /**
     * Returns number of steps taken since the state made by {@link #of}.
     *
     * @return number of steps taken since the state made by {@link #of}
     */
    public long step() {
        return step;
    }

    /**
     * Returns true if the state carries the previous step's increments (for coning and sculling).
     *
     * @return true if the state carries the previous step's increments (for coning and sculling)
     */
    public boolean hasHistory() {
        return history != null;
    }

    /**
     * Returns a copy without the increment history (the next step starts the corrections afresh).
     *
     * @return a copy without the increment history (the next step starts the corrections afresh)
     */
    public NavigationState withoutHistory() {
        return new NavigationState(time, position, axes, v1, v2, v3, q0, q1, q2, q3, step, null);
    }

    /**
     * A copy with another position (history kept).
     *
     * @param newPosition geodetic position, latitude strictly inside (-90, 90) deg
     * @return the copy
     */
    public NavigationState withPosition(LatLonHeight newPosition) {
        Arguments.nonNull("newPosition", newPosition);
        if (!(Math.abs(newPosition.latitude()) < 0.5 * Math.PI)) {
            throw new IllegalArgumentException("newPosition.latitude must be strictly inside (-90, 90) deg, got "
                    + newPosition.latitudeDegrees() + " deg");
        }
        return new NavigationState(time, newPosition, axes, v1, v2, v3, q0, q1, q2, q3, step, history);
    }

    /**
     * A copy with another velocity (history kept).
     *
     * @param newVelocity velocity relative to the Earth (m/s), in {@link #axes()}
     * @return the copy
     */
    public NavigationState withVelocity(Vector3D newVelocity) {
        Arguments.finite("newVelocity (m/s)", newVelocity);
        return new NavigationState(time, position, axes, newVelocity.getX(), newVelocity.getY(), newVelocity.getZ(),
                q0, q1, q2, q3, step, history);
    }

    /**
     * A copy with another attitude (history kept).
     *
     * @param newAttitude orientation of the body in the level frame, {@code v_body = R v_level}
     * @return the copy
     */
    public NavigationState withAttitude(Rotation newAttitude) {
        Arguments.unitRotation("newAttitude", newAttitude);
        double[] q = Orientations.toQuaternion(newAttitude);
        return new NavigationState(time, position, axes, v1, v2, v3, q[0], q[1], q[2], q[3], step, history);
    }

    // ------------------------------------------------------------------ primitive exchange (package)

    /** Writes the state into a work array in NED (see {@code LevelKernel}). */
    void toWork(double[] w) {
        w[LevelKernel.T] = time;
        w[LevelKernel.LAT] = position.latitude();
        w[LevelKernel.LON] = position.longitude();
        w[LevelKernel.H] = position.height();
        if (axes == LocalAxes.NED) {
            w[LevelKernel.VN] = v1;
            w[LevelKernel.VE] = v2;
            w[LevelKernel.VD] = v3;
            w[LevelKernel.Q0] = q0;
            w[LevelKernel.Q0 + 1] = q1;
            w[LevelKernel.Q0 + 2] = q2;
            w[LevelKernel.Q0 + 3] = q3;
        } else {
            w[LevelKernel.VN] = v2;
            w[LevelKernel.VE] = v1;
            w[LevelKernel.VD] = -v3;
            LevelKernel.enuToNed(q0, q1, q2, q3, w, LevelKernel.Q0);
        }
        w[LevelKernel.STEP] = step;
        if (history == null) {
            w[LevelKernel.HIST] = 0.0;
        } else {
            System.arraycopy(history, 0, w, LevelKernel.HIST, LevelKernel.HISTORY);
        }
    }

    /** Reads a state in the given axes from a work array. */
    static NavigationState fromWork(double[] w, LocalAxes axes) {
        LatLonHeight p = new LatLonHeight(w[LevelKernel.LAT], w[LevelKernel.LON], w[LevelKernel.H]);
        double[] history = null;
        if (w[LevelKernel.HIST] != 0.0) {
            history = new double[LevelKernel.HISTORY];
            System.arraycopy(w, LevelKernel.HIST, history, 0, LevelKernel.HISTORY);
        }
        long step = (long) w[LevelKernel.STEP];
        double a = w[LevelKernel.Q0];
        double b = w[LevelKernel.Q0 + 1];
        double c = w[LevelKernel.Q0 + 2];
        double d = w[LevelKernel.Q0 + 3];
        if (axes == LocalAxes.NED) {
            return new NavigationState(w[LevelKernel.T], p, axes, w[LevelKernel.VN], w[LevelKernel.VE],
                    w[LevelKernel.VD], a, b, c, d, step, history);
        }
        double[] q = new double[4];
        LevelKernel.nedToEnu(a, b, c, d, q, 0);
        return new NavigationState(w[LevelKernel.T], p, axes, w[LevelKernel.VE], w[LevelKernel.VN],
                -w[LevelKernel.VD], q[0], q[1], q[2], q[3], step, history);
    }

    @Override
    public String toString() {
        double[] ypr = Orientations.toYawPitchRoll(attitude());
        return String.format(Locale.ROOT, "NavigationState{t=%s s, step %d, %s, velocity %s %s, "
                        + "yaw/pitch/roll (%.6f, %.6f, %.6f) deg}", Formats.number(time), step, position,
                Formats.vector(v1, v2, v3, "m/s"), axes, Math.toDegrees(ypr[0]), Math.toDegrees(ypr[1]),
                Math.toDegrees(ypr[2]));
    }
}
