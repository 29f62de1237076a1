package dev.noninertial.frames.dynamics;

import java.io.Serializable;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.FramedState;

/**
 * One located occurrence of a {@link TrajectoryEvent} in a {@link Trajectory}.
 *
 * <p><b>Conventions.</b> The state is seen in and resolved in the trajectory's integration frame,
 * at the event time (s from the user's epoch); its acceleration is computed from the equations of
 * motion at that instant. Convert it with {@code state().in(otherFrame)}.
 *
 * <p>Immutable and thread-safe.
 *
 * @param eventName name of the event that fired
 * @param state the point at the event time, in the integration frame
 * @param rising true if the event's crossing function went from negative to positive
 * @param stoppedRun true if this occurrence ended the integration
 */
public record EventMark(String eventName, FramedState state, boolean rising, boolean stoppedRun)
        implements Serializable {

    /**
     * Validates the fields.
     *
     * @param eventName name of the event, not null
     * @param state the point at the event time, not null
     * @param rising direction of the crossing
     * @param stoppedRun whether the run stopped here
     */
    public EventMark {
        Arguments.nonNull("eventName", eventName);
        Arguments.nonNull("state", state);
    }

    /**
     * Returns the event time (s from the user's epoch).
     *
     * @return the event time (s from the user's epoch)
     */
    public double time() {
        return state.time();
    }

    @Override
    public String toString() {
        return "EventMark{" + eventName + (rising ? ", rising" : ", falling")
                + (stoppedRun ? ", stopped the run" : "") + ", " + state + "}";
    }
}
