package dev.noninertial.frames;

/**
 * How a frame moves in its parent: the {@link Placement} of the frame in its parent at any time.
 *
 * <p>Time {@code t} is in seconds from the user's epoch. An implementation must return exact,
 * mutually consistent rates: the origin velocity and acceleration must be the time derivatives of
 * the origin position, and the angular velocity and acceleration must be those of the
 * orientation (see {@link Placement} for the conventions). Ready-made motions are in
 * {@code dev.noninertial.frames.motion.Motions}.
 *
 * <p>Implementations should be immutable and thread-safe; every motion of this library is.
 * Frames travel through Java serialization (for example to the executors of a distributed Monte
 * Carlo job) only when their motions are serializable: every motion of this library is; a user
 * lambda must be declared so, as in {@code (Motion & Serializable) t -> ...}.
 */
@FunctionalInterface
public interface Motion {

    /**
     * Placement of the moving frame in its parent at time {@code t}.
     *
     * @param t time (s from the user's epoch)
     * @return the placement, with all rates
     * @throws IllegalArgumentException if {@code t} is outside the span where the motion is known
     */
    Placement at(double t);

    /**
     * Stacks a motion on top of this one: this places an intermediate frame M in the parent,
     * {@code inner} places the moving frame in M.
     *
     * @param inner motion of the moving frame relative to M
     * @return the motion of the moving frame relative to the parent
     */
    default Motion then(Motion inner) {
        return new StackedMotion(this, Arguments.nonNull("inner", inner));
    }
}
