package dev.noninertial.frames;

import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.Serializable;

/**
 * A {@link PointState} tagged with the frame it is seen in and the time it holds at. Converting
 * with {@link #in(ReferenceFrame)} goes through the frame tree, so states in different frames
 * cannot be mixed up.
 *
 * <p>Immutable and thread-safe.
 */
public final class FramedState implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Frame the state is seen in and resolved in. */
    private final ReferenceFrame frame;
    /** Time (s from the user's epoch). */
    private final double time;
    /** The state. */
    private final PointState state;

    FramedState(ReferenceFrame frame, double time, PointState state) {
        this.frame = Arguments.nonNull("frame", frame);
        this.time = Arguments.finite("time", time);
        this.state = Arguments.nonNull("state", state);
    }

    /**
     * A framed state.
     *
     * @param frame frame the state is seen in and resolved in
     * @param time time (s)
     * @param state the state
     * @return the framed state
     */
    public static FramedState of(ReferenceFrame frame, double time, PointState state) {
        return new FramedState(frame, time, state);
    }

    /**
     * Returns the frame the state is seen in and resolved in.
     *
     * @return the frame the state is seen in and resolved in
     */
    public ReferenceFrame frame() {
        return frame;
    }

    /**
     * Returns time (s).
     *
     * @return time (s)
     */
    public double time() {
        return time;
    }

    /**
     * Returns the state, seen in and resolved in {@link #frame()}.
     *
     * @return the state, seen in and resolved in {@link #frame()}
     */
    public PointState state() {
        return state;
    }

    /**
     * The same point, at the same time, seen in another frame of the same tree.
     *
     * @param target frame to convert to
     * @return the state seen in and resolved in {@code target}
     * @throws IllegalArgumentException if the frames share no root
     */
    public FramedState in(ReferenceFrame target) {
        Arguments.nonNull("target", target);
        if (target == frame) {
            return this;
        }
        return new FramedState(target, time, frame.placementIn(target, time).toBase(state));
    }

    /**
     * The fictitious accelerations this point feels in its frame, measured against the tree's
     * inertial root.
     *
     * @return the four terms, resolved in {@link #frame()} (m/s^2)
     */
    public FictitiousAccelerations fictitious() {
        return frame.placementIn(frame.root(), time).fictitious(state);
    }

    /**
     * A copy at the same frame and time with another state.
     *
     * @param newState the state
     * @return the copy
     */
    public FramedState withState(PointState newState) {
        Arguments.nonNull("newState", newState);
        return new FramedState(frame, time, newState);
    }

    /**
     * Reads the fields and re-checks them as {@link #of(ReferenceFrame, double, PointState)} does.
     *
     * @param in the stream
     * @throws IOException if the stream fails or holds a missing frame or state or a non-finite time
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.nonNull("frame", frame);
            Arguments.finite("time", time);
            Arguments.nonNull("state", state);
        } catch (IllegalArgumentException | NullPointerException e) {
            throw Arguments.refusedStream(FramedState.class, e);
        }
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof FramedState)) {
            return false;
        }
        FramedState s = (FramedState) other;
        return frame == s.frame && Double.compare(time, s.time) == 0 && state.equals(s.state);
    }

    @Override
    public int hashCode() {
        return (System.identityHashCode(frame) * 31 + Double.hashCode(time)) * 31 + state.hashCode();
    }

    @Override
    public String toString() {
        return "FramedState{frame=" + frame.path() + ", t=" + Formats.number(time) + " s, r="
                + Formats.vector(state.position(), "m") + ", v=" + Formats.vector(state.velocity(), "m/s")
                + ", a=" + Formats.vector(state.acceleration(), "m/s^2") + "}";
    }
}
