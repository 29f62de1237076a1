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
     * The same force on primitives: the state is read from {@code state[stateOffset, stateOffset + 6)}
     * (position x, y, z in m, velocity in m/s, seen in and resolved in the integration frame, the
     * first six doubles of the {@link PointState#COMPONENTS} layout) and the force (m/s^2, in the
     * integration frame's axes) is written to {@code target[targetOffset, targetOffset + 3)}.
     *
     * <p>When to use it: hot paths on primitive arrays (bulk sensor readings, for example). The
     * default implementation builds a {@link PointState} and calls {@link #at(double, PointState)},
     * so it <em>allocates</em> per call; {@link #uniform(Vector3D)} and the Earth's gravitation of
     * the geodesy module override it and allocate nothing. A user force on a hot path should
     * override it too, writing exactly the values {@link #at(double, PointState)} would return.
     *
     * @param time time (s from the user's epoch)
     * @param state position and velocity in the integration frame (at least 6 doubles from {@code stateOffset})
     * @param stateOffset index of the position's x component
     * @param target receives the force (3 doubles from {@code targetOffset})
     * @param targetOffset index where the x component is written
     * @throws IllegalArgumentException if a range does not fit its array
     * @throws IllegalStateException if the force returns null
     */
    default void at(double time, double[] state, int stateOffset, double[] target, int targetOffset) {
        checkPrimitive(state, stateOffset, target, targetOffset);
        PointState s = PointState.of(new Vector3D(state[stateOffset], state[stateOffset + 1], state[stateOffset + 2]),
                new Vector3D(state[stateOffset + 3], state[stateOffset + 4], state[stateOffset + 5]));
        Vector3D f = at(time, s);
        if (f == null) {
            throw new IllegalStateException("force " + this + " returned null at t = " + time);
        }
        target[targetOffset] = f.getX();
        target[targetOffset + 1] = f.getY();
        target[targetOffset + 2] = f.getZ();
    }

    /**
     * Range checks of {@link #at(double, double[], int, double[], int)}, for implementations.
     *
     * @param state state array (6 doubles used)
     * @param stateOffset index of the position's x component
     * @param target result array (3 doubles written)
     * @param targetOffset index where the x component is written
     * @throws IllegalArgumentException if a range does not fit its array
     */
    static void checkPrimitive(double[] state, int stateOffset, double[] target, int targetOffset) {
        Arguments.nonNull("state", state);
        Arguments.nonNull("target", target);
        if (stateOffset < 0 || stateOffset > state.length - 6) {
            throw new IllegalArgumentException("stateOffset must be in [0, " + (state.length - 6)
                    + "] for a state array of length " + state.length + ", got " + stateOffset);
        }
        if (targetOffset < 0 || targetOffset > target.length - 3) {
            throw new IllegalArgumentException("targetOffset must be in [0, " + (target.length - 3)
                    + "] for a target array of length " + target.length + ", got " + targetOffset);
        }
    }

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
        return new UniformForce(Arguments.finite("vector", vector));
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
