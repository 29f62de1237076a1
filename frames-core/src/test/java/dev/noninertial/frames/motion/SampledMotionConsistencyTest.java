package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Placement;

/**
 * The outputs of a sampled motion agree with each other: central finite differences of the
 * interpolated position and orientation reproduce the reported velocity, acceleration, angular
 * velocity and angular acceleration, and all of them are continuous across samples.
 */
class SampledMotionConsistencyTest {

    /** Jittered time stamps (fixed seed): intervals 0.05 to 0.15 s. */
    private static double[] jitteredTimes(int n, long seed) {
        Random random = new Random(seed);
        double[] t = new double[n];
        for (int i = 1; i < n; i++) {
            t[i] = t[i - 1] + 0.05 + 0.1 * random.nextDouble();
        }
        return t;
    }

    @Test
    void finiteDifferencesReproduceReportedRates() {
        AnalyticRecord r = new AnalyticRecord(jitteredTimes(400, 42));
        checkDifferences(r.poses(), r.times);
        checkDifferences(r.withRates(), r.times);
    }

    private static void checkDifferences(SampledMotion m, double[] times) {
        Random random = new Random(7);
        double d = 1e-5; // s; FD truncation d^2 |x'''| ~ 1e-10, rounding 1e-16 / d ~ 1e-11
        for (int trial = 0; trial < 200; trial++) {
            int i = 1 + random.nextInt(times.length - 3);
            // stay inside one interval, so the difference sees one polynomial
            double t = times[i] + (0.1 + 0.8 * random.nextDouble()) * (times[i + 1] - times[i]);
            Placement p = m.at(t);
            Placement before = m.at(t - d);
            Placement after = m.at(t + d);
            Vector3D v = after.origin().subtract(before.origin()).scalarMultiply(0.5 / d);
            Vector3D a = after.originVelocity().subtract(before.originVelocity()).scalarMultiply(0.5 / d);
            // tolerance: FD truncation plus rounding, 1e-8 relative to unit-scale motion
            assertEquals(0, v.distance(p.originVelocity()), 1e-8, "velocity at t = " + t);
            assertEquals(0, a.distance(p.originAcceleration()), 1e-7, "acceleration at t = " + t);
            // angular velocity from the orientation alone: R(t+d) R(t-d)^T is the turn of F over 2d,
            // about w in F axes; for v_F = R v_B this matrix is I - 2d [w]x to first order (Hipparchus
            // matrices, independent of the quaternion algebra under test)
            double[][] ra = after.orientationMatrix();
            double[][] rb = before.orientationMatrix();
            double[][] inc = new double[3][3];
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    inc[r][c] = ra[r][0] * rb[c][0] + ra[r][1] * rb[c][1] + ra[r][2] * rb[c][2];
                }
            }
            Vector3D w = new Vector3D(inc[1][2] - inc[2][1], inc[2][0] - inc[0][2], inc[0][1] - inc[1][0])
                    .scalarMultiply(0.25 / d);
            assertEquals(0, w.distance(p.angularVelocity()), 1e-8, "angular velocity at t = " + t);
            Vector3D al = after.angularVelocity().subtract(before.angularVelocity()).scalarMultiply(0.5 / d);
            assertEquals(0, al.distance(p.angularAcceleration()), 1e-7, "angular acceleration at t = " + t);
        }
    }

    @Test
    void valuesAndTwoDerivativesAreContinuousAcrossSamples() {
        AnalyticRecord r = new AnalyticRecord(jitteredTimes(100, 3));
        for (SampledMotion m : new SampledMotion[] {r.poses(), r.withRates()}) {
            for (int i = 1; i < r.times.length - 1; i++) {
                double e = 1e-9; // s: a C2 function changes its second derivative by ~ e |x'''|
                Placement left = m.at(r.times[i] - e);
                Placement right = m.at(r.times[i] + e);
                assertEquals(0, left.originAcceleration().distance(right.originAcceleration()), 1e-6);
                assertEquals(0, left.angularAcceleration().distance(right.angularAcceleration()), 1e-6);
                assertEquals(0, left.originVelocity().distance(right.originVelocity()), 1e-8);
                assertEquals(0, left.angularVelocity().distance(right.angularVelocity()), 1e-8);
            }
        }
    }

    @Test
    void samplesAreReproducedExactlyAtTheirTimes() {
        AnalyticRecord r = AnalyticRecord.uniform(20, 10);
        SampledMotion m = r.withRates();
        for (int i = 0; i < r.times.length; i++) {
            Placement p = m.at(r.times[i]);
            Placement ref = AnalyticRecord.REFERENCE.at(r.times[i]);
            // interpolation conditions: the samples themselves, to rounding (1e-14)
            assertEquals(0, p.origin().distance(ref.origin()), 1e-14);
            assertEquals(0, Rotation.distance(p.orientation(), ref.orientation()), 1e-14);
            // measured rates are the first derivatives at the samples (rounding of the quotient rule)
            assertEquals(0, p.originVelocity().distance(ref.originVelocity()), 1e-14);
            assertEquals(0, p.angularVelocity().distance(ref.angularVelocity()), 1e-13);
        }
    }

    @Test
    void uniformSpinGivesTheTextbookAngularVelocityInFrameAxes() {
        // a frame turned by rate * t about n has w = rate * n, constant, and al = 0 (Landau & Lifshitz,
        // Mechanics, sec. 35); the axis is fixed so its F components equal its B components
        // sources: REFERENCES.md, Analytic results of mechanics
        Vector3D n = new Vector3D(1, -2, 3).normalize();
        double rate = 0.7;
        double[] times = new double[601];
        for (int i = 0; i < times.length; i++) {
            times[i] = i * 0.05;
        }
        // quaternion of a frame turned by a about n: (cos(a/2), sin(a/2) n) (Orientations class comment)
        double[] q = new double[4 * times.length];
        for (int i = 0; i < times.length; i++) {
            double half = 0.5 * rate * times[i];
            q[4 * i] = Math.cos(half);
            q[4 * i + 1] = Math.sin(half) * n.getX();
            q[4 * i + 2] = Math.sin(half) * n.getY();
            q[4 * i + 3] = Math.sin(half) * n.getZ();
        }
        SampledMotion m = SampledMotion.fromArrays(times, new double[3 * times.length], q);
        for (double t = 0.01; t < 30; t += 0.37) {
            Placement p = m.at(t);
            // interpolation error of a 0.05 s step of a 0.7 rad/s turn: (0.035)^4 ~ 1.5e-6, relative
            assertEquals(0, p.angularVelocity().distance(n.scalarMultiply(rate)), 2e-6 * rate, "w at " + t);
            assertEquals(0, p.angularAcceleration().getNorm(), 1e-4 * rate, "al at " + t);
        }
        // the same orientation as the core's analytic spin (independent closed form)
        Placement spin = Motions.spin(n, 0.0, rate).at(12.34);
        assertEquals(0, Rotation.distance(spin.orientation(), m.at(12.34).orientation()), 1e-7);
        assertTrue(m.at(10).angularVelocity().dotProduct(n) > 0);
    }

    @Test
    void shortRunsReproducePolynomialsOfTheirDegree() {
        // interpolation through m points reproduces every polynomial of degree below m (Lagrange;
        // any numerical analysis text): 2 samples give the line, 3 the parabola, 5 the quartic
        for (int m = 2; m <= 6; m++) {
            int degree = Math.min(m - 1, 4);
            double[] t = new double[m];
            double[] p = new double[3 * m];
            double[] q = new double[4 * m];
            for (int i = 0; i < m; i++) {
                t[i] = 0.3 * i + 0.05 * i * i; // uneven spacing
                p[3 * i] = Math.pow(t[i], degree) - 0.5 * t[i];
                q[4 * i] = 1;
            }
            SampledMotion motion = SampledMotion.fromArrays(t, p, q);
            for (double x = 0; x <= t[m - 1]; x += t[m - 1] / 7) {
                Placement at = motion.at(x);
                double value = Math.pow(x, degree) - 0.5 * x;
                double slope = degree * Math.pow(x, degree - 1) - 0.5;
                double curvature = degree < 2 ? 0 : degree * (degree - 1) * Math.pow(x, degree - 2);
                // rounding of a few operations on values of order 1 to 10: 1e-12
                assertEquals(value, at.origin().getX(), 1e-12, m + " samples, value at " + x);
                assertEquals(slope, at.originVelocity().getX(), 1e-11, m + " samples, slope at " + x);
                assertEquals(curvature, at.originAcceleration().getX(), 1e-10, m + " samples, curvature at " + x);
            }
        }
    }

    @Test
    void concurrentQueriesAnswerAsSequentialOnes() throws Exception {
        // immutability by construction: threads sharing one motion see bit-identical answers
        AnalyticRecord r = new AnalyticRecord(jitteredTimes(300, 5));
        SampledMotion m = r.withRates();
        double[] queries = new double[5000];
        Random random = new Random(9);
        for (int k = 0; k < queries.length; k++) {
            queries[k] = random.nextDouble() * m.endTime();
        }
        Placement[] expected = new Placement[queries.length];
        for (int k = 0; k < queries.length; k++) {
            expected[k] = m.at(queries[k]);
        }
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(4);
        try {
            java.util.List<java.util.concurrent.Future<Integer>> results = new java.util.ArrayList<>();
            for (int thread = 0; thread < 4; thread++) {
                int offset = thread;
                results.add(pool.submit(() -> {
                    int mismatches = 0;
                    for (int k = 0; k < queries.length; k++) {
                        int index = (k * 7 + offset * 1237) % queries.length;
                        if (!m.at(queries[index]).equals(expected[index])) {
                            mismatches++;
                        }
                    }
                    return mismatches;
                }));
            }
            for (java.util.concurrent.Future<Integer> f : results) {
                assertEquals(0, f.get().intValue());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void serializedCopyAnswersTheSame() throws Exception {
        AnalyticRecord r = AnalyticRecord.uniform(10, 5);
        SampledMotion m = r.withRates().withMaxGap(0.5);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(m);
        }
        SampledMotion back;
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            back = (SampledMotion) in.readObject();
        }
        // same arrays, same arithmetic: bit-identical answers
        assertEquals(m, back);
        assertEquals(m.hashCode(), back.hashCode());
        assertEquals(m.at(2.345), back.at(2.345));
        assertEquals(0.5, back.maxGap(), 0.0);
    }
}
