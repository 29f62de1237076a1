package dev.noninertial.frames.dynamics;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * A real specific force (force per unit mass, m/s^2) acting on the integrated point: gravitation,
 * thrust, drag, a spring, a reaction. Never a fictitious term: the {@link TrajectorySolver} adds
 * the frame acceleration, Euler, Coriolis and centrifugal terms of the integration frame itself.
 *
 * <p><b>Conventions.</b> The result is resolved in the axes of the integration frame. {@code time}
 * is in seconds from the user's epoch; {@code state} is the point's position (m) and velocity
 * (m/s) seen in and resolved in the integration frame; its acceleration component is zero (the
 * acceleration is what is being computed and is not yet known).
 *
 * <p><b>Gravity versus gravitation.</b> In a frame fixed to the rotating Earth (Earth-fixed,
 * local-level at a site) pass <em>gravitation</em> (the pull of the masses alone), not
 * <em>gravity</em>. Normal gravity, what a plumb line and a gravimeter see, already contains the
 * centrifugal acceleration of the Earth's rotation, and the solver adds the centrifugal term
 * again; passing gravity counts it twice. The error is the centrifugal acceleration itself,
 * {@code w^2 d} with {@code d} the distance from the spin axis: at 49 degrees latitude its
 * horizontal part {@code w^2 a cos(lat) sin(lat)} is about 0.0168 m/s^2 toward the equator, a
 * tilt of the apparent vertical of about 1.7 mrad (17 mm at the end of a 10 m pendulum). In an
 * inertial frame gravity and gravitation coincide. The geodesy module's
 * {@code EarthModel.gravitation} gives the field to integrate near the Earth.
 *
 * <p>Implementations must be thread-safe if one solver is used from several threads, must return
 * finite components, and should be pure functions of their arguments: the solver calls them many
 * times per step, also while locating events and when a {@link Trajectory} is queried.
 */
@FunctionalInterface
public interface SpecificForce {

    /**
     * The real specific force at a time and state.
     *
     * @param time time (s from the user's epoch)
     * @param state position (m) and velocity (m/s) seen in and resolved in the integration
     *        frame; acceleration zero
     * @return specific force resolved in the integration frame (m/s^2), finite
     */
    Vector3D at(double time, PointState state);

    /**
     * The sum of this force and another one.
     *
     * @param other the force to add (same integration frame)
     * @return a force returning {@code this.at(t, s) + other.at(t, s)} (m/s^2)
     * @throws NullPointerException if {@code other} is null
     */
    default SpecificForce plus(SpecificForce other) {
        Arguments.nonNull("other", other);
        SpecificForce self = this;
        return (time, state) -> self.at(time, state).add(other.at(time, state));
    }

    /**
     * A force that is the same vector at every time and place, in the integration frame's axes
     * (for example gravitation near a site, given in the site's local-level axes).
     *
     * @param vector the force, resolved in the integration frame (m/s^2)
     * @return the force
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    static SpecificForce uniform(Vector3D vector) {
        Vector3D v = Arguments.finite("vector", vector);
        return (time, state) -> v;
    }

    /**
     * A force that is a fixed vector in the axes of another frame, re-resolved in the integration
     * frame at each time (for example gravitation fixed in an inertial root while integrating in
     * a spinning frame, or a wind fixed in Earth axes seen on a turning ship).
     *
     * @param axes frame whose axes hold {@code vector} fixed
     * @param vector the force, resolved in {@code axes} (m/s^2)
     * @param integrationFrame the frame the solver integrates in (same tree as {@code axes})
     * @return the force, resolved in {@code integrationFrame} at each call (m/s^2)
     * @throws IllegalArgumentException if a component is NaN or infinite
     * @throws NullPointerException if a frame is null
     */
    static SpecificForce fixedInAxesOf(ReferenceFrame axes, Vector3D vector, ReferenceFrame integrationFrame) {
        Arguments.nonNull("axes", axes);
        Arguments.nonNull("integrationFrame", integrationFrame);
        Vector3D v = Arguments.finite("vector", vector);
        return (time, state) -> integrationFrame.placementIn(axes, time).vectorFromBase(v);
    }
}
