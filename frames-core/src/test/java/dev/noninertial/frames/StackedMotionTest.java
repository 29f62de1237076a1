package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;

/**
 * The primitive {@link Motion#at(double, double[], int)} of a stack made by
 * {@link Motion#then(Motion)}: it must write exactly the values of {@code at(t)}, which composes
 * the two placements as objects, and those values must agree with an independent Hipparchus
 * composition of the orientations and origins.
 */
class StackedMotionTest {

    private static final long SEED = 20261203L;

    /** A random stack: random outer and inner motions, each itself a stack of up to four links. */
    private static Motion stack(Random rng) {
        Motion outer = RandomFrames.motion(rng);
        Motion inner = RandomFrames.motion(rng);
        switch (rng.nextInt(3)) {
            case 0:
                return outer.then(inner);
            case 1:
                // an inner user lambda: its primitive path is the default of Motion
                return outer.then(t -> inner.at(t));
            default:
                return outer.then(inner).then(RandomFrames.motion(rng));
        }
    }

    @Test
    void primitivePathHasTheBitsOfTheComposedObjects() {
        // reference: outer.at(t).then(inner.at(t)), the object composition (the earlier path of
        // a stack); raw bits, so even the sign of a zero counts
        Random rng = new Random(SEED);
        int offset = 5;
        double[] viaArray = new double[Placement.COMPONENTS + 2 * offset];
        double[] viaObject = new double[Placement.COMPONENTS];
        for (int n = 0; n < 500; n++) {
            StackedMotion m = (StackedMotion) stack(rng);
            double t = 50 * rng.nextDouble() - 10;
            java.util.Arrays.fill(viaArray, -7.0);
            m.at(t, viaArray, offset);
            m.outer().at(t).then(m.inner().at(t)).toArray(viaObject, 0);
            for (int k = 0; k < Placement.COMPONENTS; k++) {
                assertEquals(Double.doubleToRawLongBits(viaObject[k]), Double.doubleToRawLongBits(viaArray[offset + k]),
                        m + " component " + k + " at t = " + t);
            }
            for (int k = 0; k < offset; k++) {
                assertEquals(-7.0, viaArray[k], 0.0, "slot before the range written");
                assertEquals(-7.0, viaArray[offset + Placement.COMPONENTS + k], 0.0, "slot after the range written");
            }
        }
    }

    @Test
    void primitivePathAgreesWithAHipparchusComposition() {
        // independent computation with Hipparchus Rotation: with v_F = R_FB v_B,
        // R_GB = R_GF R_FB (Rotation.applyTo(Rotation) applies its argument first),
        // o_G in B = o_F + R_FB^T o_G in F (applyInverseTo), w_GB = w_GF + R_GF w_FB.
        // Tolerance: a few ulps of the magnitudes involved (positions up to ~30 m, rates up to
        // ~20 rad/s from the random motions), the two computations rounding in different orders.
        Random rng = new Random(SEED + 1);
        double[] p = new double[Placement.COMPONENTS];
        double worst = 0;
        for (int n = 0; n < 300; n++) {
            Motion outer = RandomFrames.motion(rng);
            Motion inner = RandomFrames.motion(rng);
            double t = 20 * rng.nextDouble();
            outer.then(inner).at(t, p, 0);
            Placement stacked = Placement.fromArray(p, 0);
            Placement f = outer.at(t);
            Placement g = inner.at(t);
            Rotation expectedR = g.orientation().applyTo(f.orientation());
            Vector3D expectedO = f.origin().add(f.orientation().applyInverseTo(g.origin()));
            Vector3D expectedW = g.angularVelocity().add(g.orientation().applyTo(f.angularVelocity()));
            double e = Rotation.distance(expectedR, stacked.orientation());
            e = Math.max(e, stacked.origin().distance(expectedO) / Math.max(1, expectedO.getNorm()));
            e = Math.max(e, stacked.angularVelocity().distance(expectedW) / Math.max(1, expectedW.getNorm()));
            worst = Math.max(worst, e);
        }
        System.out.printf("MEASURED stacked motion vs Hipparchus composition: worst relative error %.2e%n", worst);
        assertTrue(worst < 1e-12, "worst relative error " + worst);
    }

    @Test
    void refusesARangeThatDoesNotFit() {
        Motion m = Motions.spin(Vector3D.PLUS_K, 0.0, 0.5).then(Motions.heave(Vector3D.PLUS_I, 2.0, 1.1, 0.0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> m.at(0.0, new double[Placement.COMPONENTS + 1], 2));
        assertTrue(e.getMessage().contains("offset"), e.getMessage());
    }
}
