package dev.noninertial.frames;

import java.io.IOException;
import java.io.ObjectInputStream;
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

    private static final long serialVersionUID = 2L;

    /** Layout of one state in the bulk arrays: x, y, z, vx, vy, vz, ax, ay, az. */
    public static final int COMPONENTS = 9;

    /**
     * x, y, z (m), vx, vy, vz (m/s), ax, ay, az (m/s^2): the bulk layout. Never shared, never
     * modified.
     *
     * @serial 9 finite doubles (checked on reading)
     */
    private final double[] c;

    /** Takes ownership of an array of 9 finite values. */
    private PointState(double[] c) {
        this.c = c;
    }

    /** A state taking over an array the kernel has filled and checked. */
    static PointState wrap(double[] components) {
        return new PointState(components);
    }

    /**
     * The components in the bulk layout, for the kernel callers of this package: returns the
     * internal array itself, not a copy, so a caller must never modify it (package-private, so
     * unreachable from outside the package; public accessors copy).
     */
    double[] components() {
        return c;
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
        return new PointState(new double[] {position.getX(), position.getY(), position.getZ(),
            velocity.getX(), velocity.getY(), velocity.getZ(),
            acceleration.getX(), acceleration.getY(), acceleration.getZ()});
    }

    /**
     * A state from its nine components in the bulk layout order.
     *
     * @param components x, y, z (m), vx, vy, vz (m/s), ax, ay, az (m/s^2)
     * @param offset index of x in {@code components}
     * @return the state
     * @throws NullPointerException if {@code components} is null
     * @throws IllegalArgumentException if the range does not fit the array or a component is NaN or
     *         infinite
     */
    public static PointState fromArray(double[] components, int offset) {
        Arguments.fromIndexSize("components", components, "offset", offset, COMPONENTS);
        for (int i = 0; i < COMPONENTS; i++) {
            Arguments.finite("components[" + (offset + i) + "]", components[offset + i]);
        }
        return new PointState(java.util.Arrays.copyOfRange(components, offset, offset + COMPONENTS));
    }

    /**
     * Writes the nine components in the bulk layout order.
     *
     * @param target destination array
     * @param offset index where x is written
     * @throws NullPointerException if {@code target} is null
     * @throws IllegalArgumentException if the range does not fit the array
     */
    public void toArray(double[] target, int offset) {
        Arguments.fromIndexSize("target", target, "offset", offset, COMPONENTS);
        System.arraycopy(c, 0, target, offset, COMPONENTS);
    }

    /**
     * Returns position (m).
     *
     * @return position (m)
     */
    public Vector3D position() {
        return new Vector3D(c[0], c[1], c[2]);
    }

    /**
     * Returns velocity (m/s).
     *
     * @return velocity (m/s)
     */
    public Vector3D velocity() {
        return new Vector3D(c[3], c[4], c[5]);
    }

    /**
     * Returns acceleration (m/s^2).
     *
     * @return acceleration (m/s^2)
     */
    public Vector3D acceleration() {
        return new Vector3D(c[6], c[7], c[8]);
    }

    /**
     * A copy with another acceleration.
     *
     * @param acceleration new acceleration (m/s^2)
     * @return the copy
     */
    public PointState withAcceleration(Vector3D acceleration) {
        Arguments.finite("acceleration", acceleration);
        return with(6, acceleration);
    }

    /**
     * A copy with another velocity.
     *
     * @param velocity new velocity (m/s)
     * @return the copy
     */
    public PointState withVelocity(Vector3D velocity) {
        Arguments.finite("velocity", velocity);
        return with(3, velocity);
    }

    /**
     * A copy with another position.
     *
     * @param position new position (m)
     * @return the copy
     */
    public PointState withPosition(Vector3D position) {
        Arguments.finite("position", position);
        return with(0, position);
    }

    private PointState with(int at, Vector3D v) {
        double[] n = c.clone();
        n[at] = v.getX();
        n[at + 1] = v.getY();
        n[at + 2] = v.getZ();
        return new PointState(n);
    }

    /**
     * Re-checks a deserialized state: a stream is untrusted.
     *
     * @param in the stream
     * @throws IOException if the stream fails
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Kinematics.checkLength(c, COMPONENTS);
            for (int k = 0; k < COMPONENTS; k++) {
                Arguments.finite("component " + k, c[k]);
            }
        } catch (IllegalArgumentException e) {
            throw Arguments.refusedStream(PointState.class, e);
        }
    }

    @Override
    public boolean equals(Object other) {
        return this == other || other instanceof PointState o && java.util.Arrays.equals(c, o.c);
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(c);
    }

    @Override
    public String toString() {
        return "PointState{r=" + Formats.vector(c[0], c[1], c[2], "m")
                + ", v=" + Formats.vector(c[3], c[4], c[5], "m/s")
                + ", a=" + Formats.vector(c[6], c[7], c[8], "m/s^2") + "}";
    }
}
