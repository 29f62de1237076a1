package dev.noninertial.frames;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * The four inertial ("fictitious") accelerations that appear for a point described in a
 * non-inertial frame F, resolved in F's axes, in m/s^2.
 *
 * <p>For a point with position {@code r} and velocity {@code v} seen in F, with F placed in its
 * base B by origin acceleration {@code o''} (in B axes), orientation {@code R} (B components to F
 * components), angular velocity {@code w} and angular acceleration {@code al} of F relative to B
 * (both in F axes):
 * <pre>
 *   frameAcceleration = -R o''
 *   euler             = -al x r
 *   coriolis          = -2 w x v
 *   centrifugal       = -w x (w x r)
 * </pre>
 * so that the acceleration seen in F is {@code a_F = R a_B + total()}.
 *
 * <p>Immutable and thread-safe.
 *
 * @param frameAcceleration minus the acceleration of F's origin, resolved in F (m/s^2)
 * @param euler Euler term {@code -al x r} (m/s^2)
 * @param coriolis Coriolis term {@code -2 w x v} (m/s^2)
 * @param centrifugal centrifugal term {@code -w x (w x r)} (m/s^2)
 */
public record FictitiousAccelerations(Vector3D frameAcceleration, Vector3D euler, Vector3D coriolis,
                                      Vector3D centrifugal) implements Serializable {

    /**
     * Validates the four terms.
     *
     * @param frameAcceleration minus the acceleration of F's origin, in F (m/s^2)
     * @param euler Euler term (m/s^2)
     * @param coriolis Coriolis term (m/s^2)
     * @param centrifugal centrifugal term (m/s^2)
     */
    public FictitiousAccelerations {
        Arguments.finite("frameAcceleration", frameAcceleration);
        Arguments.finite("euler", euler);
        Arguments.finite("coriolis", coriolis);
        Arguments.finite("centrifugal", centrifugal);
    }

    /**
     * The sum of the four terms: what must be added to the (rotated) inertial acceleration to get
     * the acceleration seen in the non-inertial frame.
     *
     * @return frameAcceleration + euler + coriolis + centrifugal (m/s^2)
     */
    public Vector3D total() {
        return new Vector3D(
                frameAcceleration.getX() + euler.getX() + coriolis.getX() + centrifugal.getX(),
                frameAcceleration.getY() + euler.getY() + coriolis.getY() + centrifugal.getY(),
                frameAcceleration.getZ() + euler.getZ() + coriolis.getZ() + centrifugal.getZ());
    }

    @Override
    public String toString() {
        return "FictitiousAccelerations{frame=" + Formats.vector(frameAcceleration, "m/s^2")
                + ", euler=" + Formats.vector(euler, "m/s^2")
                + ", coriolis=" + Formats.vector(coriolis, "m/s^2")
                + ", centrifugal=" + Formats.vector(centrifugal, "m/s^2")
                + ", total=" + Formats.vector(total(), "m/s^2") + "}";
    }
}
