package dev.noninertial.frames.dynamics;

/**
 * The four inertial ("fictitious") terms that the {@link TrajectorySolver} adds for an
 * integration frame F placed in its tree's inertial root (R, o'', w, al as in
 * {@link dev.noninertial.frames.Placement}; r, v seen in F):
 * <pre>
 *   FRAME_ACCELERATION  -R o''
 *   EULER               -al x r
 *   CORIOLIS            -2 w x v
 *   CENTRIFUGAL         -w x (w x r)
 * </pre>
 * Leaving one out ({@link TrajectorySolver#withoutTerm(InertialTerm)}) gives a non-physical run
 * whose only use is a budget: how far each term moves the result ({@link TermBudget}).
 */
public enum InertialTerm {
    /** Minus the inertial acceleration of the frame's origin, {@code -R o''}. */
    FRAME_ACCELERATION,
    /** Euler term {@code -al x r}. */
    EULER,
    /** Coriolis term {@code -2 w x v}. */
    CORIOLIS,
    /** Centrifugal term {@code -w x (w x r)}. */
    CENTRIFUGAL
}
