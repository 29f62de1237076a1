package dev.noninertial.frames.motion;

import java.io.Serializable;
import java.util.Arrays;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Formats;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;

/**
 * Motions one after another in time: motion i applies from joins[i - 1] (inclusive) to joins[i]
 * (exclusive), all evaluated at the same, global time. Continuity is checked at construction.
 */
final class MotionSequence implements Motion, Serializable {

    /** Relative tolerance of the continuity checks at the joins (floor: 1 m, 1 m/s, 1 rad/s). */
    static final double JOIN_TOLERANCE = 1e-9;

    private static final long serialVersionUID = 1L;

    private final double[] joins;
    @SuppressWarnings("serial") // the library's motions are serializable, a user's must be too
    private final Motion[] motions;

    MotionSequence(double[] joins, Motion[] motions) {
        this.joins = joins;
        this.motions = motions;
        validate();
    }

    private void validate() {
        if (joins == null || motions == null || motions.length != joins.length + 1) {
            throw new IllegalArgumentException("a sequence needs one more motion than join times");
        }
        for (int i = 0; i < motions.length; i++) {
            if (motions[i] == null) {
                throw new IllegalArgumentException("motions[" + i + "] must not be null");
            }
        }
        for (int i = 0; i < joins.length; i++) {
            if (!Double.isFinite(joins[i]) || (i > 0 && !(joins[i] > joins[i - 1]))) {
                throw new IllegalArgumentException("joinTimes must be finite and increase strictly, got joinTimes["
                        + i + "] = " + joins[i]);
            }
            check(i, motions[i].at(joins[i]), motions[i + 1].at(joins[i]));
        }
    }

    /** A stream is untrusted input: the same checks as the factory. */
    private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            validate();
        } catch (RuntimeException e) {
            throw dev.noninertial.frames.Arguments.refusedStream(MotionSequence.class, e);
        }
    }

    private void check(int i, Placement before, Placement after) {
        double t = joins[i];
        compare(i, t, "origin", "m", before.origin(), after.origin());
        compare(i, t, "origin velocity", "m/s", before.originVelocity(), after.originVelocity());
        compare(i, t, "angular velocity", "rad/s", before.angularVelocity(), after.angularVelocity());
        double turn = Rotation.distance(before.orientation(), after.orientation());
        if (!(turn <= JOIN_TOLERANCE)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "motions joined at joinTimes[%d] = %s s must be continuous in orientation: the orientations "
                    + "differ by %.3g rad (allowed %.3g)", i, Formats.number(t), turn, JOIN_TOLERANCE));
        }
    }

    private static void compare(int i, double t, String what, String unit, Vector3D before, Vector3D after) {
        double scale = Math.max(1.0, Math.max(before.getNorm(), after.getNorm()));
        double gap = before.distance(after);
        if (!(gap <= JOIN_TOLERANCE * scale)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "motions joined at joinTimes[%d] = %s s must be continuous in %s: %s before the join, %s after "
                    + "(difference %.3g %s, allowed %.3g)", i, Formats.number(t), what,
                    Formats.vector(before, unit), Formats.vector(after, unit), gap, unit, JOIN_TOLERANCE * scale));
        }
    }

    private Motion motionAt(double t) {
        if (!Double.isFinite(t)) {
            throw new IllegalArgumentException("t must be finite, got " + t);
        }
        int i = Arrays.binarySearch(joins, t);
        return motions[i >= 0 ? i + 1 : -i - 1];
    }

    @Override
    public Placement at(double t) {
        return motionAt(t).at(t);
    }

    @Override
    public void at(double t, double[] target, int offset) {
        motionAt(t).at(t, target, offset);
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("sequence{");
        for (int i = 0; i < motions.length; i++) {
            b.append(motions[i]);
            if (i < joins.length) {
                b.append(" until ").append(Formats.number(joins[i])).append(" s, then ");
            }
        }
        return b.append('}').toString();
    }
}
