package dev.noninertial.frames.dynamics;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Formats;
import dev.noninertial.frames.PointState;

/**
 * The same vector at every time and place; the primitive form allocates nothing.
 *
 * @param vector the specific force, resolved in the integration frame (m/s^2)
 */
record UniformForce(Vector3D vector) implements SpecificForce, Serializable {

    @Override
    public Vector3D at(double time, PointState state) {
        return vector;
    }

    @Override
    public void at(double time, double[] state, int stateOffset, double[] target, int targetOffset) {
        SpecificForce.checkPrimitive(state, stateOffset, target, targetOffset);
        target[targetOffset] = vector.getX();
        target[targetOffset + 1] = vector.getY();
        target[targetOffset + 2] = vector.getZ();
    }

    @Override
    public String toString() {
        return "uniform " + Formats.vector(vector, "m/s^2");
    }
}
