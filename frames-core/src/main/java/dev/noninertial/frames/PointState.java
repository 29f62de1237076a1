package dev.noninertial.frames;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Position, velocity and acceleration of a point, all three <em>seen in</em> one frame (time
 * derivatives taken by an observer fixed to that frame) and <em>resolved in</em> that frame's axes.
 * SI units: m, m/s, m/s^2.
 *
 * <p>A {@code PointState} does not know its frame; {@link FramedState} adds the frame and time and
 * makes mixing frames impossible. Components are kept as primitive doubles so that conversions
 * allocate only their result.
 *
 * <p>Immutable and thread-safe.
 */
public final class PointState implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Layout of one state in the bulk arrays: x, y, z, vx, vy, vz, ax, ay, az. */
    public static final int COMPONENTS = 9;

    /** Position x (m). */
    final double x;
    /** Position y (m). */
    final double y;
    /** Position z (m). */
    final double z;
    /** Velocity x (m/s). */
    final double vx;
    /** Velocity y (m/s). */
    final double vy;
    /** Velocity z (m/s). */
    final double vz;
    /** Acceleration x (m/s^2). */
    final double ax;
    /** Acceleration y (m/s^2). */
    final double ay;
    /** Acceleration z (m/s^2). */
    final double az;

    PointState(double x, double y, double z, double vx, double vy, double vz,
               double ax, double ay, double az) {
        this.x = x;
        this.y = y;
        this.z = z;
        this.vx = vx;
        this.vy = vy;
        this.vz = vz;
        this.ax = ax;
        this.ay = ay;
        this.az = az;
    }

    /**
     * A point at rest at a position (zero velocity and acceleration).
     *
     * @param position position (m)
     * @return the state
     */
    public static PointState stationary(Vector3D position) {
        return of(position, Vector3D.ZERO, Vector3D.ZERO);
    }

    /**
     * A point with position and velocity, zero acceleration.
     *
     * @param position position (m)
     * @param velocity velocity (m/s)
     * @return the state
     */
    public static PointState of(Vector3D position, Vector3D velocity) {
        return of(position, velocity, Vector3D.ZERO);
    }

    /**
     * A point with position, velocity and acceleration.
     *
     * @param position position (m)
     * @param velocity velocity (m/s)
     * @param acceleration acceleration (m/s^2)
     * @return the state
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public static PointState of(Vector3D position, Vector3D velocity, Vector3D acceleration) {
        Arguments.finite("position", position);
        Arguments.finite("velocity", velocity);
        Arguments.finite("acceleration", acceleration);
        return new PointState(position.getX(), position.getY(), position.getZ(),
                velocity.getX(), velocity.getY(), velocity.getZ(),
                acceleration.getX(), acceleration.getY(), acceleration.getZ());
    }

    /**
     * A state from its nine components in the bulk layout order.
     *
     * @param components x, y, z (m), vx, vy, vz (m/s), ax, ay, az (m/s^2)
     * @param offset index of x in {@code components}
     * @return the state
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public static PointState fromArray(double[] components, int offset) {
        Arguments.nonNull("components", components);
        if (offset < 0 || offset + COMPONENTS > components.length) {
            throw new IllegalArgumentException("offset must be in [0, " + (components.length - COMPONENTS)
                    + "], got " + offset);
        }
        for (int i = 0; i < COMPONENTS; i++) {
            Arguments.finite("components[" + (offset + i) + "]", components[offset + i]);
        }
        int o = offset;
        return new PointState(components[o], components[o + 1], components[o + 2],
                components[o + 3], components[o + 4], components[o + 5],
                components[o + 6], components[o + 7], components[o + 8]);
    }

    /**
     * Writes the nine components in the bulk layout order.
     *
     * @param target destination array
     * @param offset index where x is written
     */
    public void toArray(double[] target, int offset) {
        target[offset] = x;
        target[offset + 1] = y;
        target[offset + 2] = z;
        target[offset + 3] = vx;
        target[offset + 4] = vy;
        target[offset + 5] = vz;
        target[offset + 6] = ax;
        target[offset + 7] = ay;
        target[offset + 8] = az;
    }

    /** @return position (m) */
    public Vector3D position() {
        return new Vector3D(x, y, z);
    }

    /** @return velocity (m/s) */
    public Vector3D velocity() {
        return new Vector3D(vx, vy, vz);
    }

    /** @return acceleration (m/s^2) */
    public Vector3D acceleration() {
        return new Vector3D(ax, ay, az);
    }

    /**
     * A copy with another acceleration.
     *
     * @param acceleration new acceleration (m/s^2)
     * @return the copy
     */
    public PointState withAcceleration(Vector3D acceleration) {
        Arguments.finite("acceleration", acceleration);
        return new PointState(x, y, z, vx, vy, vz, acceleration.getX(), acceleration.getY(), acceleration.getZ());
    }

    /**
     * A copy with another velocity.
     *
     * @param velocity new velocity (m/s)
     * @return the copy
     */
    public PointState withVelocity(Vector3D velocity) {
        Arguments.finite("velocity", velocity);
        return new PointState(x, y, z, velocity.getX(), velocity.getY(), velocity.getZ(), ax, ay, az);
    }

    /**
     * A copy with another position.
     *
     * @param position new position (m)
     * @return the copy
     */
    public PointState withPosition(Vector3D position) {
        Arguments.finite("position", position);
        return new PointState(position.getX(), position.getY(), position.getZ(), vx, vy, vz, ax, ay, az);
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof PointState)) {
            return false;
        }
        PointState s = (PointState) other;
        return Double.compare(x, s.x) == 0 && Double.compare(y, s.y) == 0 && Double.compare(z, s.z) == 0
                && Double.compare(vx, s.vx) == 0 && Double.compare(vy, s.vy) == 0 && Double.compare(vz, s.vz) == 0
                && Double.compare(ax, s.ax) == 0 && Double.compare(ay, s.ay) == 0 && Double.compare(az, s.az) == 0;
    }

    @Override
    public int hashCode() {
        int h = 17;
        for (double d : new double[] {x, y, z, vx, vy, vz, ax, ay, az}) {
            h = 31 * h + Double.hashCode(d);
        }
        return h;
    }

    @Override
    public String toString() {
        return "PointState{r=" + Formats.vector(x, y, z, "m")
                + ", v=" + Formats.vector(vx, vy, vz, "m/s")
                + ", a=" + Formats.vector(ax, ay, az, "m/s^2") + "}";
    }
}
