package dev.noninertial.frames.dynamics;

import dev.noninertial.frames.PointState;

/**
 * A scalar function of time and state whose zero crossings mark an event of a
 * {@link TrajectoryEvent}: height above a plane minus a threshold, distance to a target minus a
 * radius, a velocity component.
 *
 * <p><b>Conventions.</b> {@code time} is in seconds from the user's epoch; {@code state} holds
 * position (m), velocity (m/s) and acceleration (m/s^2) seen in and resolved in the integration
 * frame. While an event is being located the state comes from the solver's dense output, so it is
 * as accurate as the integration tolerances allow.
 *
 * <p>The function must be continuous in time along the trajectory (a jump is taken for a
 * crossing), finite, thread-safe if the solver is shared between threads, and free of side effects.
 */
@FunctionalInterface
public interface CrossingFunction {

    /**
     * The function value; an event happens where it changes sign.
     *
     * @param time time (s from the user's epoch)
     * @param state the point, seen in and resolved in the integration frame
     * @return the value, finite (any unit)
     */
    double at(double time, PointState state);
}
