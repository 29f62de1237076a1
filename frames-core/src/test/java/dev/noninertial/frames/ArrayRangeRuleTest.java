package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import dev.noninertial.frames.motion.Motions;

/**
 * Issue 15, class 7: one checked helper for offset, size and length, as
 * {@link java.util.Objects#checkFromIndexSize(int, int, int)} does (its contract is the
 * reference: a range fits when {@code 0 <= offset <= length - size}, computed without overflow),
 * used by every array API. Before, {@code PointState.toArray} did not check at all (an
 * {@code ArrayIndexOutOfBoundsException} from the JVM), {@code PointState.fromArray} overflowed in
 * {@code offset + 9}, and the bulk checks blamed the offset when the count was wrong.
 */
class ArrayRangeRuleTest {

    private static String refusal(Executable call) {
        return assertThrows(IllegalArgumentException.class, call).getMessage();
    }

    @Test
    void everyArrayApiNamesTheArgumentAtFault() {
        PointState s = PointState.stationary(Vector3D.PLUS_I);
        // an array shorter than the range is the array's fault: no offset could fit
        String m = refusal(() -> s.toArray(new double[5], 0));
        assertTrue(m.startsWith("target must have length at least 9 for 9 values (from offset 0), got length 5"), m);
        // offset + 9 overflows int: Integer.MAX_VALUE - 3 + 9 < 0
        m = refusal(() -> PointState.fromArray(new double[9], Integer.MAX_VALUE - 3));
        assertTrue(m.startsWith("offset must be in"), m);
        m = refusal(() -> s.toArray(new double[9], -1));
        assertTrue(m.startsWith("offset must be in"), m);
        m = refusal(() -> Placement.identity().toArray(new double[30], 7));
        assertTrue(m.startsWith("offset must be in [0, 6]"), m);
        m = refusal(() -> Placement.fromArray(new double[24], 1));
        assertTrue(m.startsWith("offset must be in [0, 0]"), m);

        // bulk: a count no offset could hold is the count's fault, even when count * 9 overflows
        double[] nine = new double[9];
        m = refusal(() -> Placement.identity().toBase(nine, 0, nine, 0, Integer.MAX_VALUE / 4));
        assertTrue(m.startsWith("count must be in [0, 1]"), m);
        m = refusal(() -> Placement.identity().fromBase(nine, 0, nine, 0, -1));
        assertTrue(m.startsWith("count must be in"), m);
        // a count that fits, from an offset that does not
        double[] eighteen = new double[18];
        m = refusal(() -> Placement.identity().toBase(eighteen, 10, eighteen, 10, 1));
        assertTrue(m.startsWith("sourceOffset must be in [0, 9]"), m);
        m = refusal(() -> Placement.identity().toBase(eighteen, 0, new double[12], 4, 1));
        assertTrue(m.startsWith("targetOffset must be in [0, 3]"), m);
        Motion spin = Motions.spin(Vector3D.PLUS_K, 0.0, 1.0);
        m = refusal(() -> spin.toBase(new double[3], 2, eighteen, 0, eighteen, 0, 2));
        assertTrue(m.startsWith("timeOffset must be in [0, 1]"), m);
        m = refusal(() -> spin.at(0.0, new double[23], 0));
        assertTrue(m.startsWith("target must have length at least 24"), m);
        m = refusal(() -> spin.at(0.0, new double[30], 7));
        assertTrue(m.startsWith("offset must be in [0, 6]"), m);
    }

    @Test
    void theSizeIsCheckedBeforeTheOffset() {
        // before, a negative or too large size was blamed on the offset with a negative bound
        // ("offset must be in [0, -2147483644]")
        double[] three = new double[3];
        String m = refusal(() -> Arguments.fromIndexSize("out", three, "offset", 0, -1));
        assertTrue(m.startsWith("size must be at least 0"), m);
        m = refusal(() -> Arguments.fromIndexSize("out", three, "offset", 1, Integer.MAX_VALUE));
        assertTrue(m.startsWith("out must have length at least 2147483647"), m);
        m = refusal(() -> Arguments.fromIndexSize("out", three, "offset", 1, 3));
        assertTrue(m.startsWith("offset must be in [0, 0] for 3 values in out of length 3, got 1"), m);
        Arguments.fromIndexSize("out", three, "offset", 0, 3);
        Arguments.fromIndexSize("out", three, "offset", 3, 0);
    }
}
