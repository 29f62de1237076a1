package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;

/**
 * Physical invariant (Newton's first law in the inertial root): a free particle moving uniformly
 * in the root, seen from a spinning, spin-accelerating, translating frame, has there exactly the
 * acceleration made of the fictitious terms. Checked two independent ways: against the converted
 * state's acceleration, and against the second finite difference of the particle's position
 * in the moving frame (which involves only positions and the orientation, no rates).
 */
class FreeParticleInvariantTest {

    @Test
    void freeParticleAccelerationInMovingFrameIsTheSumOfFictitiousTerms() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        Motion carrier = Motions.translation(new Vector3D(100, -20, 5), new Vector3D(12, 3, 0), new Vector3D(0.5, -0.2, 0.1))
                .then(Motions.spinUp(new Vector3D(0.2, -0.1, 1), 0.3, 0.4, 0.15))
                .then(Motions.oscillation(Vector3D.PLUS_I, 0.2, 1.1, 0.4));
        ReferenceFrame platform = lab.attach("platform", carrier);
        Vector3D r0 = new Vector3D(40, 70, -10);
        Vector3D v0 = new Vector3D(-8, 2.5, 1);
        Random rng = new Random(7L);
        double h = 1e-3;
        double worstConverted = 0;
        double worstDifference = 0;
        for (int i = 0; i < 200; i++) {
            double t = 30 * rng.nextDouble();
            PointState inLab = PointState.of(r0.add(t, v0), v0); // uniform motion, zero acceleration
            FramedState seen = lab.stateAt(t, inLab).in(platform);
            FictitiousAccelerations f = seen.fictitious();
            Vector3D total = f.total();
            // 1) the converted acceleration is the fictitious sum (a_B = 0)
            double scale = Math.max(1.0, total.getNorm());
            assertTrue(seen.state().acceleration().distance(total) <= 1e-12 * scale,
                    () -> "converted " + seen.state().acceleration() + " vs fictitious " + total);
            worstConverted = Math.max(worstConverted, seen.state().acceleration().distance(total) / scale);
            // 2) five-point second difference of the position in the platform frame
            Vector3D[] r = new Vector3D[5];
            for (int k = -2; k <= 2; k++) {
                double tk = t + k * h;
                r[k + 2] = platform.placementIn(lab, tk).positionFromBase(r0.add(tk, v0));
            }
            Vector3D fd = new Vector3D(-1, r[4].add(r[0]), 16, r[3].add(r[1]), -30, r[2])
                    .scalarMultiply(1 / (12 * h * h));
            // positions ~1e3 m: rounding eps*|r|/h^2 ~ 2e-7 m/s^2, truncation O(h^4) negligible
            worstDifference = Math.max(worstDifference, fd.distance(total) / scale);
            assertTrue(fd.distance(total) <= 1e-6 * scale + 1e-6,
                    () -> "finite difference " + fd + " vs fictitious " + total);
        }
        System.out.printf(java.util.Locale.ROOT, "MEASURED free particle, 200 instants: converted acceleration vs"
                + " fictitious sum %.2e relative; second difference vs fictitious sum %.2e relative%n",
                worstConverted, worstDifference);
    }
}
