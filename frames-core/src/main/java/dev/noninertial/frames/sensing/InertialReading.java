package dev.noninertial.frames.sensing;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * What an accelerometer triad and a gyro triad fixed in a sensor frame S read at one instant.
 *
 * <p><b>Conventions.</b> {@code specificForce} is {@code f = a_inertial - gravitation} of S's
 * origin (m/s^2), where {@code a_inertial} is the acceleration of the origin relative to the tree's
 * inertial root; at rest on the Earth it points up, about 9.8 m/s^2. {@code angularRate} is the
 * angular velocity of S relative to the inertial root (rad/s), never relative to the Earth. Both
 * are resolved in S axes.
 *
 * <p>Immutable and thread-safe.
 *
 * @param time time (s from the user's epoch)
 * @param specificForce specific force, S axes (m/s^2)
 * @param angularRate angular velocity of S relative to the inertial root, S axes (rad/s)
 */
public record InertialReading(double time, Vector3D specificForce, Vector3D angularRate) implements Serializable {

    /**
     * Number of doubles one reading occupies in the primitive layout of the bulk forms of
     * {@link IdealSensor}: specific force x, y, z (m/s^2), then angular rate x, y, z (rad/s).
     */
    public static final int COMPONENTS = 6;

    /**
     * Validates the reading.
     *
     * @param time time (s), finite
     * @param specificForce specific force, S axes (m/s^2), finite
     * @param angularRate angular rate, S axes (rad/s), finite
     * @throws IllegalArgumentException if a value is not finite
     * @throws NullPointerException if a vector is null
     */
    public InertialReading {
        Arguments.finite("time", time);
        Arguments.finite("specificForce", specificForce);
        Arguments.finite("angularRate", angularRate);
    }

    @Override
    public String toString() {
        return "InertialReading{t=" + Formats.number(time) + " s, specificForce="
                + Formats.vector(specificForce, "m/s^2") + ", angularRate=" + Formats.vector(angularRate, "rad/s")
                + "}";
    }
}
