package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.motion.SpinProfile;

/**
 * The rates the engine reports must be the time derivatives of what it reports for position and
 * orientation. Check source: the definition of the derivative, evaluated by five-point central
 * differences of positions and orientations sampled from the code under test at t +- h, t +- 2h.
 */
class FiniteDifferenceTest {

    /**
     * Step: truncation error of the five-point rules is O(h^4 f^(5)) ~ 1e-12 for the rates used
     * here (frequencies below ~5 rad/s); rounding error is ~ eps |f| / h^2 ~ 1e-9 relative for the
     * second derivative. Both are far below the 1e-6 relative tolerance the engine must meet.
     */
    private static final double H = 1e-3;

    /** Tolerance asked for by the kinematics requirements: 1e-6 relative. */
    private static final double RELATIVE = 1e-6;

    /** Worst error relative to the tolerance scale, per quantity, for the accuracy report. */
    private static final java.util.Map<String, Double> WORST = new java.util.TreeMap<>();

    @Test
    void chainsOfOneToSixLinksReportConsistentRates() {
        Random rng = new Random(20261202L); // fixed seed
        for (int trial = 0; trial < 120; trial++) {
            ReferenceFrame root = ReferenceFrame.inertialRoot("root" + trial);
            int depth = 1 + trial % 6;
            ReferenceFrame leaf = RandomFrames.chain(rng, root, depth);
            // base: the root, or a frame on another branch (placement through the common ancestor)
            ReferenceFrame base = trial % 3 == 0 ? root : RandomFrames.chain(rng, root, 1 + rng.nextInt(3));
            double t = 4 * rng.nextDouble() - 2;
            checkOrigin(leaf, base, t);
            checkRotation(leaf, base, t);
            checkPointState(leaf, base, t, RandomFrames.state(rng));
        }
        WORST.forEach((what, worst) -> System.out.printf(java.util.Locale.ROOT,
                "MEASURED finite differences, 120 chains of 1-6 links: %s worst relative error %.2e%n", what, worst));
    }

    @Test
    void sensorTestMotionsReportConsistentRates() {
        // rate-table and centrifuge profiles (Motions.turning) and motions run one after another
        // (Motions.sequence), sampled away from their joins (where the angular acceleration may jump)
        SpinProfile profile = SpinProfile.startingAt(0.0, 0.3, 0.0).ramp(2.0, 0.8).hold(1.0)
                .oscillate(0.2, 3.0, 1.5).steps(new double[] {-0.5, 0.7}, 1.0, 1.2);
        ReferenceFrame root = ReferenceFrame.inertialRoot("table room");
        ReferenceFrame arm = root.attach("arm", Motions.turning(new Vector3D(0.2, -0.1, 1), profile));
        // a gondola swinging on the arm, mounted with a lever arm: turning links at depth 2 and 3
        ReferenceFrame gondola = arm.attach("gondola", Motions.stationary(new Vector3D(4, 0, 0))
                .then(Motions.turning(Vector3D.PLUS_J, SpinProfile.startingAt(0.0, 0.0, 0.0).ramp(1.0, 0.3)
                        .hold(profile.end()))));
        // spin-up at 0.5 rad/s^2 to 1 rad/s at t = 2 s (angle 1 rad), then on at 0.1 rad/s^2:
        // angle -0.8 + 0.8 t + 0.05 t^2 matches angle and rate at the join
        Motion seq = Motions.sequence(new double[] {2.0}, Motions.spinUp(Vector3D.PLUS_K, 0.0, 0.0, 0.5),
                Motions.spinUp(Vector3D.PLUS_K, -0.8, 0.8, 0.1));
        ReferenceFrame switched = root.attach("switched", seq).attach("lever", Motions.stationary(new Vector3D(1, 2, 0)));
        PointState s = PointState.of(new Vector3D(0.5, -0.2, 0.1), new Vector3D(0.1, 0.3, -0.2),
                new Vector3D(0.05, 0, 0.02));
        // times inside ramps and oscillations: in a hold the angular acceleration is exactly zero and
        // the rounding of the second differences (~1e-9 rad/s^2) would meet the 1e-3 floor's tolerance
        for (double t : new double[] {0.7, 3.4, 4.2, 5.1, 6.6, 7.5, 9.3}) {
            for (ReferenceFrame leaf : new ReferenceFrame[] {arm, gondola, switched}) {
                checkOrigin(leaf, root, t);
                checkRotation(leaf, root, t);
                checkPointState(leaf, root, t, s);
            }
        }
    }

    private static void checkOrigin(ReferenceFrame leaf, ReferenceFrame base, double t) {
        Placement p = leaf.placementIn(base, t);
        Vector3D[] o = new Vector3D[5];
        for (int k = -2; k <= 2; k++) {
            o[k + 2] = leaf.placementIn(base, t + k * H).origin();
        }
        assertClose("origin velocity", firstDerivative(o), p.originVelocity());
        assertClose("origin acceleration", secondDerivative(o), p.originAcceleration());
    }

    private static void checkRotation(ReferenceFrame leaf, ReferenceFrame base, double t) {
        Placement p = leaf.placementIn(base, t);
        double[][][] m = new double[5][][];
        for (int k = -2; k <= 2; k++) {
            m[k + 2] = leaf.placementIn(base, t + k * H).orientationMatrix();
        }
        double[][] r = m[2];
        double[][] d1 = new double[3][3];
        double[][] d2 = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                d1[i][j] = (-m[4][i][j] + 8 * m[3][i][j] - 8 * m[1][i][j] + m[0][i][j]) / (12 * H);
                d2[i][j] = (-m[4][i][j] + 16 * m[3][i][j] - 30 * m[2][i][j] + 16 * m[1][i][j] - m[0][i][j])
                        / (12 * H * H);
            }
        }
        // v_F = R v_B  =>  dR/dt = -[w x] R, so [w x] = -R' R^T
        // d2R/dt2 = -[al x] R + [w x]^2 R, and [w x]^2 is symmetric: [al x] = skew(-R'' R^T)
        assertClose("angular velocity", skewVector(product(d1, r), -1.0), p.angularVelocity());
        assertClose("angular acceleration", skewVector(product(d2, r), -1.0), p.angularAcceleration());
    }

    /** The converted point: its position's derivatives seen in the base are its velocity and acceleration. */
    private static void checkPointState(ReferenceFrame leaf, ReferenceFrame base, double t, PointState s) {
        // a point moving in the leaf along r(t) = r0 + v0 (t - t0) + a0 (t - t0)^2 / 2
        Vector3D[] r = new Vector3D[5];
        for (int k = -2; k <= 2; k++) {
            double dt = k * H;
            Vector3D local = s.position().add(dt, s.velocity()).add(0.5 * dt * dt, s.acceleration());
            r[k + 2] = leaf.placementIn(base, t + dt).positionToBase(local);
        }
        PointState converted = leaf.stateAt(t, s).in(base).state();
        assertClose("converted velocity", firstDerivative(r), converted.velocity());
        assertClose("converted acceleration", secondDerivative(r), converted.acceleration());
    }

    private static Vector3D firstDerivative(Vector3D[] f) {
        return new Vector3D(-1, f[4], 8, f[3], -8, f[1], 1, f[0]).scalarMultiply(1 / (12 * H));
    }

    private static Vector3D secondDerivative(Vector3D[] f) {
        Vector3D outer = f[4].add(f[0]);
        Vector3D inner = f[3].add(f[1]);
        return new Vector3D(-1, outer, 16, inner, -30, f[2]).scalarMultiply(1 / (12 * H * H));
    }

    /** a * b^T for 3x3 (b transposed). */
    private static double[][] product(double[][] a, double[][] b) {
        double[][] c = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                c[i][j] = a[i][0] * b[j][0] + a[i][1] * b[j][1] + a[i][2] * b[j][2];
            }
        }
        return c;
    }

    /** Vector of the skew part of scale * m: [[0,-z,y],[z,0,-x],[-y,x,0]]. */
    private static Vector3D skewVector(double[][] m, double scale) {
        return new Vector3D(0.5 * scale * (m[2][1] - m[1][2]), 0.5 * scale * (m[0][2] - m[2][0]),
                0.5 * scale * (m[1][0] - m[0][1]));
    }

    private static void assertClose(String what, Vector3D finiteDifference, Vector3D reported) {
        // relative to the reported magnitude, with a floor of 1e-3 units: below it the rounding
        // error of the differences (~1e-9 absolute for the magnitudes here) dominates
        double scale = Math.max(reported.getNorm(), 1e-3);
        double error = finiteDifference.subtract(reported).getNorm();
        WORST.merge(what, error / scale, Math::max);
        assertTrue(error <= RELATIVE * scale, () -> what + ": finite difference " + finiteDifference
                + " vs reported " + reported + ", error " + error + " > " + RELATIVE * scale);
    }
}
