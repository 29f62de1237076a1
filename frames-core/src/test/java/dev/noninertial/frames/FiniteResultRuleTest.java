package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import dev.noninertial.frames.motion.Motions;

/**
 * Issue 15, class 3: one rule for results. Every public kinematic result is finite or the call
 * throws, with the same message on every path. Before the kernel, the same overflow or NaN gave
 * a refusal on one path and a silent infinity or NaN on another (each case below returned a
 * non-finite value). The check values are IEEE 754 facts: 1e308 + 1e308 overflows to infinity
 * (the largest double is about 1.8e308), and NaN propagates through every arithmetic operation.
 */
class FiniteResultRuleTest {

    private static String refusal(Executable call) {
        return assertThrows(IllegalArgumentException.class, call).getMessage();
    }

    @Test
    void everyPathRefusesANonFiniteResultWithTheSameMessage() {
        // composition overflow: 1e308 + 1e308 is infinite, whether composed as objects or in a chain
        Motion far = Motions.translation(new Vector3D(1e308, 0, 0));
        Placement farAway = far.at(0.0);
        String then = refusal(() -> farAway.then(farAway));
        ReferenceFrame root = ReferenceFrame.inertialRoot("root");
        ReferenceFrame two = root.attach("a", far).attach("b", far);
        String chain = refusal(() -> two.placementIn(root, 0.0));
        String stacked = refusal(() -> far.then(far).at(0.0));

        // bulk paths: the second state at x = +-1e308 seen from 1e308 away overflows
        double[] plus = new double[2 * PointState.COMPONENTS];
        plus[PointState.COMPONENTS] = 1e308;
        double[] minus = new double[2 * PointState.COMPONENTS];
        minus[PointState.COMPONENTS] = -1e308;
        double[] target = new double[plus.length];
        String bulkTo = refusal(() -> farAway.toBase(plus, 0, target, 0, 2));
        String bulkFrom = refusal(() -> farAway.fromBase(minus, 0, target, 0, 2));
        String motionBulk = refusal(() -> far.toBase(new double[2], 0, plus, 0, target, 0, 2));

        // toBase and fictitious on the same state: w x (w x r) overflows (1e10^2 * 1e300)
        Placement fast = Motions.spin(Vector3D.PLUS_K, 0.0, 1e10).at(0.0);
        PointState huge = PointState.stationary(new Vector3D(1e300, 0, 0));
        String toBase = refusal(() -> fast.toBase(huge));
        String fictitious = refusal(() -> fast.fictitious(huge));

        for (String m : new String[] {then, chain, stacked, toBase, fictitious}) {
            assertEquals(Kinematics.NOT_FINITE, m);
        }
        // the bulk paths give the same message and name the state that overflowed (the second)
        for (String m : new String[] {bulkTo, bulkFrom, motionBulk}) {
            assertEquals(Kinematics.NOT_FINITE + " (state 1, source[9] to source[17])", m);
        }
    }

    @Test
    void bulkPathsRefuseANonFiniteInputByNameBeforeWriting() {
        // as the position helpers below: a NaN input is named, only an overflow gets the one message
        double[] source = new double[2 * PointState.COMPONENTS];
        source[PointState.COMPONENTS + 4] = Double.NaN;
        double[] target = new double[source.length];
        String expected = "source[13] (state 1, component 4) must be finite, got NaN";
        assertEquals(expected, refusal(() -> Placement.identity().toBase(source, 0, target, 0, 2)));
        assertEquals(expected, refusal(() -> Placement.identity().fromBase(source, 0, target, 0, 2)));
        Motion spin = Motions.spin(Vector3D.PLUS_K, 0.0, 2.0);
        assertEquals(expected, refusal(() -> spin.toBase(new double[2], 0, source, 0, target, 0, 2)));
        assertTrue(java.util.Arrays.equals(new double[source.length], target), "nothing written");
    }

    @Test
    void thePrimitiveAtRefusesWhatTheObjectAtRefuses() {
        // heave at phase 1 rad: velocity 1e300 * 1e5 * cos(1) = 5.4e304 is finite, acceleration
        // -(1e5)^2 * 1e300 * sin(1) = -8.4e309 overflows
        Motion wild = Motions.heave(Vector3D.PLUS_I, 1e300, 1e5, 1.0);
        String object = refusal(() -> wild.at(0.0));
        String primitive = refusal(() -> wild.at(0.0, new double[Placement.COMPONENTS], 0));
        assertEquals(object, primitive);
        assertTrue(object.contains("originAcceleration"), object);
    }

    @Test
    void positionAndVectorHelpersRefuseNaN() {
        Placement p = Placement.identity();
        Vector3D bad = new Vector3D(Double.NaN, 0, 0);
        assertTrue(refusal(() -> p.positionToBase(bad)).contains("positionInFrame"));
        assertTrue(refusal(() -> p.positionFromBase(bad)).contains("positionInBase"));
        assertTrue(refusal(() -> p.vectorToBase(bad)).contains("vectorInFrame"));
        assertTrue(refusal(() -> p.vectorFromBase(bad)).contains("vectorInBase"));
        // and an overflow of the result: 1e308 + 1e308
        Placement far = Motions.translation(new Vector3D(1e308, 0, 0)).at(0.0);
        assertEquals(Kinematics.NOT_FINITE, refusal(() -> far.positionToBase(new Vector3D(1e308, 0, 0))));
    }
}
