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

    /**
     * Writes the placement at time {@code t} on primitives, in the layout of
     * {@link Placement#toArray(double[], int)} ({@link Placement#COMPONENTS} doubles: o, o', o''
     * in parent axes; R row by row with {@code v_F = R v_B}; w and al in the moving frame's axes).
     *
     * <p>This is what the bulk conversions {@link #toBase(double[], int, double[], int, double[], int, int)}
     * and {@link #fromBase(double[], int, double[], int, double[], int, int)} call once per state.
     * The default implementation calls {@link #at(double)} and copies the result, so it
     * <em>allocates one {@link Placement} per call</em> (the JIT's escape analysis may remove that
     * allocation once the code is hot, but nothing guarantees it). Every motion made by a factory of
     * {@code dev.noninertial.frames.motion.Motions}, {@code SampledMotion} and a stack made by
     * {@link #then(Motion)} override it and allocate nothing (tests and the CI gate enforce it; a
     * stack allocates nothing when its links do). A user motion on a hot path should override it
     * too, writing exactly the
     * values {@link #at(double)} would return, for example with
     * {@link Placement#ofQuaternion(double, double, double, double, double, double, double, double,
     * double, double, double, double, double, double, double, double, double, double, double,
     * double[], int) Placement.ofQuaternion(..., target, offset)}.
     *
     * @param t time (s from the user's epoch)
     * @param target destination array
     * @param offset index where o's x component is written
     * @throws IllegalArgumentException if {@code t} is outside the span where the motion is known,
     *         or the range does not fit the array
     * @throws IllegalStateException if {@link #at(double)} returns null
     */
    default void at(double t, double[] target, int offset) {
        Placement p = at(t);
        if (p == null) {
            throw new IllegalStateException("motion " + this + " returned a null placement at t = " + t);
        }
        p.toArray(target, offset);
    }

    /**
     * Bulk conversion of states seen in the moving frame F to its parent B, each state at its own
     * time: state {@code k} (9 doubles x, y, z, vx, vy, vz, ax, ay, az, see
     * {@link PointState#COMPONENTS}) is converted through the placement at
     * {@code times[timeOffset + k]}, with all terms of {@link Placement#toBase(PointState)}.
     *
     * <p>When to use it: for many states (a logged track, a particle cloud, a batch of sensor
     * samples) kept in primitive arrays, where one {@link Placement} and one {@link PointState} per
     * sample would dominate the cost. It allocates at most one scratch array of
     * {@link Placement#COMPONENTS} doubles per call and nothing per state, provided
     * {@link #at(double, double[], int)} allocates nothing (true for the motions of the factories
     * of {@code Motions}, for {@code SampledMotion} and for stacks of them made by
     * {@link #then(Motion)}; the default, used by a user lambda, allocates one placement per
     * state). For one state, or states already held as objects, use
     * {@link Placement#toBase(PointState)}; for many states at one time, use
     * {@link Placement#toBase(double[], int, double[], int, int)}.
     *
     * <p>Source and target may be the same array when the offsets are equal (in-place).
     *
     * @param times time of each state (s from the user's epoch)
     * @param timeOffset index of the first state's time in {@code times}
     * @param source states seen in F
     * @param sourceOffset index of the first state's x in {@code source}
     * @param target receives the states seen in B (caller-owned)
     * @param targetOffset index of the first state's x in {@code target}
     * @param count number of states
     * @throws IllegalArgumentException if a range does not fit its array, the state ranges overlap
     *         with different offsets, a time is not finite (refused before anything is written), a
     *         time is outside the span where the motion is known, or a source value or a result is
     *         not finite (a non-finite source value is named; the states before it are converted)
     */
    default void toBase(double[] times, int timeOffset, double[] source, int sourceOffset,
                        double[] target, int targetOffset, int count) {
        convertEach(true, times, timeOffset, source, sourceOffset, target, targetOffset, count);
    }

    /**
     * Bulk conversion of states seen in the parent B to the moving frame F, each state at its own
     * time; the inverse of {@link #toBase(double[], int, double[], int, double[], int, int)}, with
     * all terms of {@link Placement#fromBase(PointState)}, the same layout, the same allocation
     * behaviour (nothing per state when {@link #at(double, double[], int)} allocates nothing) and
     * the same advice on when to use it.
     *
     * @param times time of each state (s from the user's epoch)
     * @param timeOffset index of the first state's time in {@code times}
     * @param source states seen in B
     * @param sourceOffset index of the first state's x in {@code source}
     * @param target receives the states seen in F (caller-owned)
     * @param targetOffset index of the first state's x in {@code target}
     * @param count number of states
     * @throws IllegalArgumentException if a range does not fit its array, the state ranges overlap
     *         with different offsets, a time is not finite (refused before anything is written), a
     *         time is outside the span where the motion is known, or a source value or a result is
     *         not finite (a non-finite source value is named; the states before it are converted)
     */
    default void fromBase(double[] times, int timeOffset, double[] source, int sourceOffset,
                          double[] target, int targetOffset, int count) {
        convertEach(false, times, timeOffset, source, sourceOffset, target, targetOffset, count);
    }

    /**
     * The loop of both bulk conversions, each state through the placement at its own time: one
     * routine for both directions; the per-state branch picks the kernel's loop (which stay apart,
     * see {@link Kinematics#fromBase}).
     */
    private void convertEach(boolean toBase, double[] times, int timeOffset, double[] source, int sourceOffset,
                             double[] target, int targetOffset, int count) {
        Placement.checkBulk(source, sourceOffset, target, targetOffset, count);
        checkTimes(times, timeOffset, count);
        double[] p = new double[Placement.COMPONENTS];
        for (int k = 0; k < count; k++) {
            at(times[timeOffset + k], p, 0);
            int from = sourceOffset + k * PointState.COMPONENTS;
            int to = targetOffset + k * PointState.COMPONENTS;
            if (toBase) {
                Kinematics.toBase(p, 0, source, from, target, to, 1, sourceOffset);
            } else {
                Kinematics.fromBase(p, 0, source, from, target, to, 1, sourceOffset);
            }
        }
    }

    private static void checkTimes(double[] times, int timeOffset, int count) {
        Arguments.fromIndexSize("times", times, "timeOffset", timeOffset, "count", count, 1);
        for (int i = timeOffset; i < timeOffset + count; i++) {
            if (!Double.isFinite(times[i])) {
                throw new IllegalArgumentException("times[" + i + "] must be finite, got " + times[i]);
            }
        }
    }
}
