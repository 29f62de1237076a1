package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/**
 * Group properties of placements (composition associative, inverse, round trips) and agreement of
 * orientation composition with Hipparchus {@link Rotation} composition, an independent
 * implementation. Tolerance 1e-12 relative to the magnitudes involved: a composition is a few
 * dozen floating-point operations on values of order 1..100, so errors of ~1e-14 are expected.
 */
class PlacementAlgebraTest {

    private static final double RELATIVE = 1e-12;

    private static double worstState;
    private static double worstPlacement;

    @org.junit.jupiter.api.AfterAll
    static void report() {
        System.out.printf(java.util.Locale.ROOT, "MEASURED placement algebra: worst relative error %.2e (placements),"
                + " %.2e (state round trips)%n", worstPlacement, worstState);
    }

    private static Placement randomPlacement(Random rng) {
        return Placement.of(RandomFrames.vector(rng, 50), RandomFrames.vector(rng, 10), RandomFrames.vector(rng, 3),
                RandomFrames.orientation(rng), RandomFrames.vector(rng, 2), RandomFrames.vector(rng, 1));
    }

    @Test
    void compositionIsAssociative() {
        Random rng = new Random(11L);
        for (int i = 0; i < 500; i++) {
            Placement p = randomPlacement(rng);
            Placement q = randomPlacement(rng);
            Placement r = randomPlacement(rng);
            assertSame(p.then(q).then(r), p.then(q.then(r)));
        }
    }

    @Test
    void placementThenItsInverseIsIdentity() {
        Random rng = new Random(12L);
        for (int i = 0; i < 500; i++) {
            Placement p = randomPlacement(rng);
            assertSame(Placement.identity(), p.then(p.inverse()));
            assertSame(Placement.identity(), p.inverse().then(p));
            assertSame(p, p.inverse().inverse());
        }
    }

    @Test
    void conversionThereAndBackReturnsTheInput() {
        Random rng = new Random(13L);
        for (int i = 0; i < 500; i++) {
            Placement p = randomPlacement(rng);
            PointState s = RandomFrames.state(rng);
            assertSame(s, p.fromBase(p.toBase(s)));
            assertSame(s, p.toBase(p.fromBase(s)));
            // the inverse placement converts the other way
            assertSame(p.toBase(s), p.inverse().fromBase(s));
        }
    }

    @Test
    void bulkConversionEqualsObjectConversion() {
        Random rng = new Random(14L);
        Placement p = randomPlacement(rng);
        int n = 50;
        double[] in = new double[n * PointState.COMPONENTS];
        PointState[] states = new PointState[n];
        for (int k = 0; k < n; k++) {
            states[k] = RandomFrames.state(rng);
            states[k].toArray(in, k * PointState.COMPONENTS);
        }
        double[] toBase = new double[in.length];
        double[] fromBase = new double[in.length];
        p.toBase(in, 0, toBase, 0, n);
        p.fromBase(in, 0, fromBase, 0, n);
        for (int k = 0; k < n; k++) {
            // same formulas on the same doubles: identical to the last bit
            assertTrue(p.toBase(states[k]).equals(PointState.fromArray(toBase, k * PointState.COMPONENTS)));
            assertTrue(p.fromBase(states[k]).equals(PointState.fromArray(fromBase, k * PointState.COMPONENTS)));
        }
    }

    @Test
    void orientationCompositionAgreesWithHipparchus() {
        Random rng = new Random(15L);
        for (int i = 0; i < 500; i++) {
            Rotation rFB = RandomFrames.orientation(rng); // F in B
            Rotation rGF = RandomFrames.orientation(rng); // G in F
            Placement p = Placement.stationary(Vector3D.ZERO, rFB);
            Placement q = Placement.stationary(Vector3D.ZERO, rGF);
            // v_G = R_GF (R_FB v_B): Hipparchus applies r2 first in compose(r2, VECTOR_OPERATOR)
            Rotation expected = rGF.compose(rFB, RotationConvention.VECTOR_OPERATOR);
            Rotation actual = p.then(q).orientation();
            assertTrue(Rotation.distance(expected, actual) < 1e-14 * 100,
                    () -> "distance " + Rotation.distance(expected, actual));
            Vector3D v = RandomFrames.vector(rng, 1);
            Vector3D viaHipparchus = rGF.applyTo(rFB.applyTo(v));
            assertTrue(viaHipparchus.distance(p.then(q).vectorFromBase(v)) < RELATIVE);
        }
    }

    private static void assertSame(PointState expected, PointState actual) {
        double scale = 1 + expected.position().getNorm() + expected.velocity().getNorm()
                + expected.acceleration().getNorm();
        double error = expected.position().distance(actual.position())
                + expected.velocity().distance(actual.velocity())
                + expected.acceleration().distance(actual.acceleration());
        worstState = Math.max(worstState, error / scale);
        assertTrue(error <= RELATIVE * scale, () -> "expected " + expected + " got " + actual + " error " + error);
    }

    private static void assertSame(Placement expected, Placement actual) {
        double scale = 1 + expected.origin().getNorm() + expected.originVelocity().getNorm()
                + expected.originAcceleration().getNorm() + expected.angularVelocity().getNorm()
                + expected.angularAcceleration().getNorm();
        double error = expected.origin().distance(actual.origin())
                + expected.originVelocity().distance(actual.originVelocity())
                + expected.originAcceleration().distance(actual.originAcceleration())
                + expected.angularVelocity().distance(actual.angularVelocity())
                + expected.angularAcceleration().distance(actual.angularAcceleration());
        double angle = Rotation.distance(expected.orientation(), actual.orientation());
        worstPlacement = Math.max(worstPlacement, Math.max(error / scale, angle));
        assertTrue(error <= RELATIVE * scale && angle <= RELATIVE,
                () -> "expected " + expected + "\n got " + actual + "\n error " + error + ", angle " + angle);
    }
}
