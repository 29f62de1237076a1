package dev.noninertial.frames.motion;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Formats;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;

/**
 * A turn about a fixed axis through the parent's origin whose angle follows a {@link SpinProfile};
 * rate and angular acceleration are the profile's, so they are the exact derivatives of the angle.
 *
 * @param axis the fixed turning axis, in parent axes
 * @param profile the angle, rate and angular acceleration against time
 */
record TurningMotion(Vector3D axis, SpinProfile profile) implements Motion, Serializable {

    /** Re-runs the factory's checks (records deserialize through their canonical constructor). */
    TurningMotion {
        dev.noninertial.frames.Arguments.nonNull("profile", profile);
        Vector3D unit = dev.noninertial.frames.Arguments.unitAxis("axis", axis);
        if (unit.distance(axis) > 1e-15) {
            throw new IllegalArgumentException("axis must be a unit vector, got " + axis);
        }
    }

    @Override
    public Placement at(double t) {
        if (!Double.isFinite(t)) {
            throw new IllegalArgumentException("t must be finite, got " + t);
        }
        double[] s = profile.stateAt(t);
        return Motions.turn(axis, s[0], s[1], s[2]);
    }

    @Override
    public String toString() {
        return "turning about " + Formats.vector(axis, "") + profile;
    }
}
