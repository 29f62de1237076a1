package dev.noninertial.frames.sensing;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * What an integrating inertial sensor outputs over one interval {@code [start, end]}: the
 * delta-velocity {@code integral of f dt} (m/s) and the delta-angle {@code integral of w dt} (rad),
 * each the time integral of the S-axes components of the ideal reading ({@link InertialReading}).
 * They are the raw integrals of the body-axes outputs, as real sensors deliver them: no coning or
 * sculling compensation is applied, and the delta-angle is not a rotation vector when the
 * rotation axis moves.
 *
 * <p>Immutable and thread-safe.
 *
 * @param start start of the interval (s)
 * @param end end of the interval (s), after {@code start}
 * @param deltaVelocity integral of the specific force over the interval, S axes (m/s)
 * @param deltaAngle integral of the angular rate over the interval, S axes (rad)
 */
public record SensorIncrements(double start, double end, Vector3D deltaVelocity, Vector3D deltaAngle)
        implements Serializable {

    /**
     * Number of doubles one increment occupies in the primitive layout of the bulk forms of
     * {@link IdealSensor}: delta-velocity x, y, z (m/s), then delta-angle x, y, z (rad).
     */
    public static final int COMPONENTS = 6;

    /**
     * Validates the increments.
     *
     * @param start start (s), finite
     * @param end end (s), finite and greater than {@code start}
     * @param deltaVelocity delta-velocity, S axes (m/s), finite
     * @param deltaAngle delta-angle, S axes (rad), finite
     * @throws IllegalArgumentException if a value is not finite or {@code end <= start}
     * @throws NullPointerException if a vector is null
     */
    public SensorIncrements {
        Arguments.finite("start", start);
        Arguments.finite("end", end);
        if (!(end > start)) {
            throw new IllegalArgumentException("end must be greater than start (" + start + " s), got " + end);
        }
        Arguments.finite("deltaVelocity", deltaVelocity);
        Arguments.finite("deltaAngle", deltaAngle);
    }

    /**
     * Returns the interval length {@code end - start} (s).
     *
     * @return the interval length {@code end - start} (s)
     */
    public double duration() {
        return end - start;
    }

    @Override
    public String toString() {
        return "SensorIncrements{[" + Formats.number(start) + ", " + Formats.number(end) + "] s, deltaVelocity="
                + Formats.vector(deltaVelocity, "m/s") + ", deltaAngle=" + Formats.vector(deltaAngle, "rad") + "}";
    }
}
