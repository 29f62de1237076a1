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

    @Override
    public String toString() {
        return outer + " then " + inner;
    }
}
