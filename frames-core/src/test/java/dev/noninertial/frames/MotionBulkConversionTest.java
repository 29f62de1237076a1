package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;

/** The primitive placement of motions and the bulk conversion through a motion at many times. */
class MotionBulkConversionTest {

    private static final int N = 200;

    private static List<Motion> motions() {
        return List.of(
                Motions.stationary(new Vector3D(1.0, -2.0, 0.5), new Rotation(new Vector3D(1, 2, 3), 0.4,
                        RotationConvention.FRAME_TRANSFORM)),
                Motions.spinUp(new Vector3D(0.2, -0.3, 1.0), 0.3, 1.2, 0.05),
                Motions.oscillation(new Vector3D(1, 0, 0.1), 0.2, 0.9, 0.4),
                Motions.heave(new Vector3D(0, 0.2, 1), 1.5, 0.7, 0.1),
                Motions.translation(new Vector3D(1, 2, 3), new Vector3D(0.1, -0.2, 0.3), new Vector3D(0.01, 0.02, -0.03)),
                Motions.spin(Vector3D.PLUS_K, 0.0, 0.5).then(Motions.heave(Vector3D.PLUS_I, 2.0, 1.1, 0.0)),
                t -> Motions.spin(Vector3D.PLUS_J, 0.1, 0.8).at(t)); // a user lambda: default path
    }

    private static double[] randomStates(Random random) {
        double[] s = new double[N * PointState.COMPONENTS];
        for (int i = 0; i < s.length; i++) {
            s[i] = 20 * random.nextDouble() - 10;
        }
        return s;
    }

    private static double[] times(Random random) {
        double[] t = new double[N];
        for (int i = 0; i < N; i++) {
            t[i] = 100 * random.nextDouble();
        }
        return t;
    }

    @Test
    void primitivePlacementHasTheSameBitsAsTheObjectPlacement() {
        // The primitive path must reproduce at(t) exactly: same formulas, same order of operations.
        double[] direct = new double[Placement.COMPONENTS + 3];
        double[] copied = new double[Placement.COMPONENTS + 3];
        for (Motion m : motions()) {
            for (double t : new double[] {0.0, 0.37, 12.5, -3.0}) {
                m.at(t, direct, 3);
                m.at(t).toArray(copied, 3);
                assertArrayEquals(copied, direct, 0.0, m + " at t = " + t);
            }
        }
    }

    @Test
    void bulkThroughMotionMatchesIndependentHipparchusComputation() {
        // Independent check: the transport formulas of Taylor, Classical Mechanics, ch. 9
        // (r_B = o + R^T r, v_B = o' + R^T (v + w x r), a_B = o'' + R^T (a + al x r + 2 w x v + w x (w x r)))
        // evaluated with Hipparchus Rotation and Vector3D from the placement's public accessors.
        // sources: REFERENCES.md, Analytic results of mechanics
        Random random = new Random(20261202L);
        double[] times = times(random);
        double[] source = randomStates(random);
        double[] target = new double[source.length];
        for (Motion m : motions()) {
            m.toBase(times, 0, source, 0, target, 0, N);
            for (int k = 0; k < N; k++) {
                Placement p = m.at(times[k]);
                Rotation rot = p.orientation();
                Vector3D w = p.angularVelocity();
                Vector3D al = p.angularAcceleration();
                int i = k * PointState.COMPONENTS;
                Vector3D r = new Vector3D(source[i], source[i + 1], source[i + 2]);
                Vector3D v = new Vector3D(source[i + 3], source[i + 4], source[i + 5]);
                Vector3D a = new Vector3D(source[i + 6], source[i + 7], source[i + 8]);
                Vector3D wr = Vector3D.crossProduct(w, r);
                Vector3D rb = p.origin().add(rot.applyInverseTo(r));
                Vector3D vb = p.originVelocity().add(rot.applyInverseTo(v.add(wr)));
                Vector3D ab = p.originAcceleration().add(rot.applyInverseTo(a.add(Vector3D.crossProduct(al, r))
                        .add(2, Vector3D.crossProduct(w, v)).add(Vector3D.crossProduct(w, wr))));
                // tolerance: values are O(10..1e3); 1e-11 absolute is ~100 ulps of the largest terms
                // (quaternion vs matrix rotation round differently)
                double[] expected = {rb.getX(), rb.getY(), rb.getZ(), vb.getX(), vb.getY(), vb.getZ(),
                    ab.getX(), ab.getY(), ab.getZ()};
                for (int c = 0; c < 9; c++) {
                    assertEquals(expected[c], target[i + c], 1e-11 * (1 + Math.abs(expected[c])), m + " state " + k);
                }
            }
        }
    }

    @Test
    void bulkThroughMotionAgreesWithObjectPathAndRoundTrips() {
        Random random = new Random(7L);
        double[] times = times(random);
        double[] source = randomStates(random);
        double[] there = new double[source.length];
        double[] back = new double[source.length];
        for (Motion m : motions()) {
            m.toBase(times, 0, source, 0, there, 0, N);
            m.fromBase(times, 0, there, 0, back, 0, N);
            for (int k = 0; k < N; k++) {
                int i = k * PointState.COMPONENTS;
                double[] viaObjects = new double[9];
                m.at(times[k]).fromBase(PointState.fromArray(there, i)).toArray(viaObjects, 0);
                for (int c = 0; c < 9; c++) {
                    // same arithmetic as the object path: identical bits
                    assertEquals(viaObjects[c], back[i + c], 0.0, m + " state " + k);
                    // invariant: F -> B -> F is the identity up to rounding (values O(1e3) at most)
                    assertEquals(source[i + c], back[i + c], 1e-9 * (1 + Math.abs(source[i + c])));
                }
            }
        }
    }

    @Test
    void bulkToBaseHasTheValuesOfTheObjectPath() {
        // motions may specialise the bulk path (spins do); it must give the object path's values
        Random random = new Random(5L);
        double[] times = times(random);
        double[] source = randomStates(random);
        double[] bulk = new double[source.length];
        double[] one = new double[9];
        for (Motion m : motions()) {
            m.toBase(times, 0, source, 0, bulk, 0, N);
            for (int k = 0; k < N; k++) {
                int i = k * PointState.COMPONENTS;
                m.at(times[k]).toBase(PointState.fromArray(source, i)).toArray(one, 0);
                for (int c = 0; c < 9; c++) {
                    // delta 0: equal values (a zero may differ only in sign)
                    assertEquals(one[c], bulk[i + c], 0.0, m + " state " + k);
                }
            }
        }
    }

    @Test
    void inPlaceAndOffsetsWork() {
        Motion m = Motions.spin(Vector3D.PLUS_K, 0.0, 2.0);
        Random random = new Random(11L);
        double[] times = times(random);
        double[] states = randomStates(random);
        double[] expected = new double[states.length];
        m.toBase(times, 1, states, 9, expected, 9, N - 1);
        m.toBase(times, 1, states, 9, states, 9, N - 1);
        for (int i = 9; i < states.length; i++) {
            assertEquals(expected[i], states[i], 0.0);
        }
    }

    @Test
    void badRangesAndTimesAreRefusedWithTheirNames() {
        Motion m = Motions.spin(Vector3D.PLUS_K, 0.0, 2.0);
        double[] states = new double[18];
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> m.toBase(new double[1], 0, states, 0, new double[18], 0, 2));
        assertTrue(e.getMessage().contains("timeOffset"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> m.fromBase(new double[2], 0, states, 0, new double[17], 0, 2));
        assertTrue(e.getMessage().contains("targetOffset"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> m.toBase(new double[] {0.0, Double.NaN}, 0, states, 0, new double[18], 0, 2));
        assertTrue(e.getMessage().contains("times[1] must be finite"), e.getMessage());
        // a non-finite source value is refused by name; the states before it are converted, the
        // refused state is not written (a sentinel shows any write)
        double[] nanState = new double[18];
        nanState[12] = Double.NaN;
        double[] untouched = new double[18];
        java.util.Arrays.fill(untouched, 7.0);
        e = assertThrows(IllegalArgumentException.class,
                () -> m.fromBase(new double[] {0.0, 1.0}, 0, nanState, 0, untouched, 0, 2));
        assertTrue(e.getMessage().contains("source[12] (state 1, component 3)"), e.getMessage());
        double[] sentinel = new double[9];
        java.util.Arrays.fill(sentinel, 7.0);
        assertTrue(java.util.Arrays.equals(sentinel, java.util.Arrays.copyOfRange(untouched, 9, 18)),
                "refused state not written");
        assertTrue(untouched[0] != 7.0 || untouched[1] != 7.0 || untouched[2] != 7.0, "state 0 converted");
        e = assertThrows(IllegalArgumentException.class, () -> m.at(0.0, new double[23], 0));
        assertTrue(e.getMessage().contains("offset"), e.getMessage());
        assertThrows(NullPointerException.class, () -> m.toBase(null, 0, states, 0, states, 0, 2));
    }
}
