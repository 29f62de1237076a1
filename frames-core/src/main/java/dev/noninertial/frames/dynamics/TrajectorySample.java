package dev.noninertial.frames.dynamics;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.FramedState;

/**
 * The point at one time of a {@link Trajectory} with the breakdown of its acceleration: the real
 * specific force and the four fictitious terms of the integration frame, so that one sees which
 * term matters and by how much.
 *
 * <p><b>Conventions.</b> Every vector is resolved in the integration frame; the state is seen in
 * that frame, time in s from the user's epoch. {@code state().state().acceleration()} equals
 * {@code realForce() + fictitious().total()}.
 *
 * <p>Immutable and thread-safe.
 *
 * @param state the point at {@link #time()}, in the integration frame
 * @param realForce sum of the real specific forces (m/s^2)
 * @param fictitious frame acceleration, Euler, Coriolis and centrifugal terms (m/s^2)
 */
public record TrajectorySample(FramedState state, Vector3D realForce, FictitiousAccelerations fictitious)
        implements Serializable {

    /**
     * Validates the fields.
     *
     * @param state the point, not null
     * @param realForce real specific force, finite (m/s^2)
     * @param fictitious the four fictitious terms, not null
     */
    public TrajectorySample {
        Arguments.nonNull("state", state);
        Arguments.finite("realForce", realForce);
        Arguments.nonNull("fictitious", fictitious);
    }

    /**
     * Returns time of the sample (s from the user's epoch).
     *
     * @return time of the sample (s from the user's epoch)
     */
    public double time() {
        return state.time();
    }

    /**
     * Returns total acceleration seen in the integration frame: real force plus the four terms (m/s^2).
     *
     * @return total acceleration seen in the integration frame: real force plus the four terms (m/s^2)
     */
    public Vector3D acceleration() {
        return realForce.add(fictitious.total());
    }

    @Override
    public String toString() {
        return "TrajectorySample{t=" + Formats.number(time()) + " s, r="
                + Formats.vector(state.state().position(), "m") + ", v="
                + Formats.vector(state.state().velocity(), "m/s") + ", real="
                + Formats.vector(realForce, "m/s^2") + ", " + fictitious + "}";
    }
}
