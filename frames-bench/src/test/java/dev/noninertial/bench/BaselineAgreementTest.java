package dev.noninertial.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * The benchmarks compare like with like only if the library and both baselines compute the same
 * numbers. Baseline (a) is an independent computation with Hipparchus {@code Rotation} and
 * {@code Vector3D} of the transport formulas (Taylor, Classical Mechanics, ch. 9); baseline (b)
 * is independent hand code on primitives.
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class BaselineAgreementTest {

    // tolerance: quaternion (Hipparchus) and matrix (library) rotations round differently; values
    // here are at most O(1e3), so 1e-11 relative is a few hundred ulps and far below any real error
    private static final double TOL = 1e-11;

    private static void close(double expected, double actual, String what) {
        assertEquals(expected, actual, TOL * (1 + Math.abs(expected)), what);
    }

    private static void close(Vector3D expected, double[] actual, int offset, String what) {
        close(expected.getX(), actual[offset], what + ".x");
        close(expected.getY(), actual[offset + 1], what + ".y");
        close(expected.getZ(), actual[offset + 2], what + ".z");
    }

    private static double[] array(PointState s) {
        double[] a = new double[9];
        s.toArray(a, 0);
        return a;
    }

    @Test
    void singleStateConversionsAgree() {
        Placement placement = Scenario.placement();
        ObjectBaseline.Pose pose = ObjectBaseline.scenarioPose();
        double[] p = PrimitiveBaseline.scenarioPlacement();
        double[] s = PrimitiveBaseline.scenarioState();
        double[] out = new double[9];

        ObjectBaseline.Kinematics a = ObjectBaseline.toBase(pose, Scenario.POSITION, Scenario.VELOCITY,
                Scenario.ACCELERATION);
        double[] lib = array(placement.toBase(Scenario.state()));
        PrimitiveBaseline.toBase(p, s, 0, out, 0);
        for (double[] candidate : new double[][] {lib, out}) {
            close(a.position(), candidate, 0, "toBase r");
            close(a.velocity(), candidate, 3, "toBase v");
            close(a.acceleration(), candidate, 6, "toBase a");
        }

        a = ObjectBaseline.fromBase(pose, Scenario.POSITION, Scenario.VELOCITY, Scenario.ACCELERATION);
        lib = array(placement.fromBase(Scenario.state()));
        PrimitiveBaseline.fromBase(p, s, 0, out, 0);
        for (double[] candidate : new double[][] {lib, out}) {
            close(a.position(), candidate, 0, "fromBase r");
            close(a.velocity(), candidate, 3, "fromBase v");
            close(a.acceleration(), candidate, 6, "fromBase a");
        }
    }

    @Test
    void fictitiousTermsAgree() {
        ObjectBaseline.Inertial a = ObjectBaseline.fictitious(ObjectBaseline.scenarioPose(), Scenario.POSITION,
                Scenario.VELOCITY);
        FictitiousAccelerations f = Scenario.placement().fictitious(Scenario.state());
        double[] out = new double[12];
        PrimitiveBaseline.fictitious(PrimitiveBaseline.scenarioPlacement(), PrimitiveBaseline.scenarioState(), out);
        double[] lib = new double[12];
        Vector3D[] terms = {f.frameAcceleration(), f.euler(), f.coriolis(), f.centrifugal()};
        for (int k = 0; k < 4; k++) {
            lib[3 * k] = terms[k].getX();
            lib[3 * k + 1] = terms[k].getY();
            lib[3 * k + 2] = terms[k].getZ();
        }
        for (double[] candidate : new double[][] {lib, out}) {
            close(a.frame(), candidate, 0, "frame");
            close(a.euler(), candidate, 3, "euler");
            close(a.coriolis(), candidate, 6, "coriolis");
            close(a.centrifugal(), candidate, 9, "centrifugal");
        }
    }

    @Test
    void chainsAgreeAtEveryDepth() {
        double[] scratch = new double[PrimitiveBaseline.P];
        double[] out = new double[PrimitiveBaseline.P];
        double[] lib = new double[Placement.COMPONENTS];
        for (int depth = 1; depth <= Scenario.MAX_DEPTH; depth++) {
            ReferenceFrame[] frames = Scenario.chain(depth);
            for (double t : new double[] {0.0, 0.731, 17.3, 99.9}) {
                frames[depth].placementIn(frames[0], t).toArray(lib, 0);
                PrimitiveBaseline.chain(depth, t, scratch, out);
                ObjectBaseline.Pose a = ObjectBaseline.chain(depth, t);
                double[][] m = a.rotation().getMatrix();
                double[] ref = {
                    a.origin().getX(), a.origin().getY(), a.origin().getZ(),
                    a.originVelocity().getX(), a.originVelocity().getY(), a.originVelocity().getZ(),
                    a.originAcceleration().getX(), a.originAcceleration().getY(), a.originAcceleration().getZ(),
                    m[0][0], m[0][1], m[0][2], m[1][0], m[1][1], m[1][2], m[2][0], m[2][1], m[2][2],
                    a.angularVelocity().getX(), a.angularVelocity().getY(), a.angularVelocity().getZ(),
                    a.angularAcceleration().getX(), a.angularAcceleration().getY(), a.angularAcceleration().getZ(),
                };
                for (int c = 0; c < ref.length; c++) {
                    close(ref[c], lib[c], "depth " + depth + " t " + t + " library component " + c);
                    close(ref[c], out[c], "depth " + depth + " t " + t + " primitive component " + c);
                }
            }
        }
    }

    @Test
    void bulkPathsAgree() {
        BulkBenchmark b = new BulkBenchmark();
        b.fill();
        int n = 1000;
        double[] lib = new double[n * 9];
        double[] hand = new double[n * 9];
        b.placement.toBase(b.source, 0, lib, 0, n);
        PrimitiveBaseline.toBaseAll(b.p, b.source, hand, n);
        for (int i = 0; i < lib.length; i++) {
            close(hand[i], lib[i], "placement toBase " + i);
        }
        b.placement.fromBase(b.source, 0, lib, 0, n);
        PrimitiveBaseline.fromBaseAll(b.p, b.source, hand, n);
        for (int i = 0; i < lib.length; i++) {
            close(hand[i], lib[i], "placement fromBase " + i);
        }
        // times spread over 60 s: check the last states, where the spin-up has turned farthest
        double[] times = new double[n];
        for (int k = 0; k < n; k++) {
            times[k] = 60.0 * k / n;
        }
        b.spin.toBase(times, 0, b.source, 0, lib, 0, n);
        PrimitiveBaseline.spinUpToBaseAll(times, b.source, hand, n);
        for (int i = 0; i < lib.length; i++) {
            close(hand[i], lib[i], "motion toBase " + i);
        }
    }
}
