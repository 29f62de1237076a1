package dev.noninertial.frames;

import java.io.Serializable;

/**
 * Two motions stacked: {@code outer} places an unnamed intermediate frame M in the parent,
 * {@code inner} places the moving frame in M. Made by {@link Motion#then(Motion)}; a record
 * rather than a lambda so that it stays serializable and prints readably.
 *
 * @param outer motion of M in the parent
 * @param inner motion of the moving frame in M
 */
record StackedMotion(Motion outer, Motion inner) implements Motion, Serializable {

    private static final long serialVersionUID = 1L;

    /**
     * Refuses a missing motion (also when read from a stream: records deserialize through this
     * constructor).
     *
     * @param outer motion of M in the parent
     * @param inner motion of the moving frame in M
     */
    StackedMotion {
        Arguments.nonNull("outer", outer);
        Arguments.nonNull("inner", inner);
    }

    @Override
    public Placement at(double t) {
        return outer.at(t).then(inner.at(t));
    }

    /**
     * Writes exactly the values of {@link #at(double)}, allocating nothing: the outer placement
     * is written into the range, read back, overwritten by the inner one and composed with it in
     * place, through the same kernel as {@link Placement#then(Placement)}.
     */
    @Override
    public void at(double t, double[] target, int offset) {
        Arguments.fromIndexSize("target", target, "offset", offset, Placement.COMPONENTS);
        outer.at(t, target, offset);
        Kinematics.stack(target, offset, inner, t);
        Kinematics.checkFinite(target, offset, Placement.COMPONENTS);
    }

    @Override
    public String toString() {
        return outer + " then " + inner;
    }
}
