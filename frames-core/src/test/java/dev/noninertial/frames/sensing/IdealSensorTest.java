package dev.noninertial.frames.sensing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.motion.Motions;

/**
 * Ideal readings in laboratory trees (root declared inertial, uniform field) against textbook
 * kinematics computed independently with Hipparchus vectors and rotations.
 */
class IdealSensorTest {

    /** Standard gravity, used here only as a uniform laboratory field (value of the 1901 CGPM). */
    private static final Vector3D G = new Vector3D(0, 0, -9.80665);

    /** A body on a rocking, heaving, slewing platform: every rate and acceleration non-zero. */
    private static ReferenceFrame body(ReferenceFrame lab) {
        ReferenceFrame deck = lab.attach("deck", 
                Motions.translation(new Vector3D(3, -2, 1), new Vector3D(1.5, 0.4, 0), new Vector3D(0.1, -0.05, 0.02))
                        .then(Motions.heave(Vector3D.PLUS_K, 0.8, 0.9, 0.3)));
        ReferenceFrame slew = deck.attach("slew", Motions.spinUp(new Vector3D(0.1, 0.2, 1), 0.4, 0.3, 0.05));
        return slew.attach("boom", Motions.oscillation(new Vector3D(1, -0.3, 0.2), 0.25, 1.3, 0.7));
    }

    @Test
    void atRestInTheLaboratoryTheAccelerometerReadsMinusTheField() {
        // definition f = a - g with a = 0 (at rest in an inertial root): f = -g exactly, w = 0
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame s = lab.attach("bench", Motions.stationary(new Vector3D(1, 2, 3),
                Orientations.aboutAxis(Vector3D.PLUS_I, Math.PI)));
        // the field is uniform in the lab's axes, re-resolved in the bench's
        InertialReading r = IdealSensor.of(s, SpecificForce.fixedInAxesOf(lab, G, s)).readingAt(5.0);
        // the bench turned upside down about x: the upward 9.80665 m/s^2 shows on -z; 1e-15: rounding of R
        assertEquals(0.0, r.specificForce().getX(), 1e-15);
        assertEquals(0.0, r.specificForce().getY(), 1e-14);
        assertEquals(-9.80665, r.specificForce().getZ(), 1e-14);
        assertEquals(0.0, r.angularRate().getNorm(), 0.0);
    }

    @Test
    void inFreeFallTheAccelerometerReadsZero() {
        // physical invariant (equivalence principle): a frame falling with the field reads f = 0
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame s = lab.attach("capsule", 
                Motions.translation(new Vector3D(0, 0, 100), new Vector3D(2, 0, 5), G.scalarMultiply(0.5))
                        .then(Motions.spin(new Vector3D(1, 1, 0), 0.2, 0.7)));
        InertialReading r = IdealSensor.of(s, SpecificForce.fixedInAxesOf(lab, G, s)).readingAt(1.7);
        // 1e-14 m/s^2: rounding of the rotation applied to terms of 10 m/s^2
        assertEquals(0.0, r.specificForce().getNorm(), 1e-14);
        // the gyro reads the spin, 0.7 rad/s about the (normalised) axis, in S axes (the axis is fixed)
        assertEquals(0.7, r.angularRate().getNorm(), 1e-15);
        assertEquals(0.0, Vector3D.angle(r.angularRate(), new Vector3D(1, 1, 0)), 1e-14);
    }

    @Test
    void leverArmAddsEulerAndCentripetalTermsComputedIndependently() {
        // textbook rigid-body kinematics (Taylor, Classical Mechanics, ch. 9; REFERENCES.md,
        // Analytic results of mechanics): a point fixed at r in a body turning at w, al has inertial
        // acceleration a_centre + al x r + w x (w x r); the gyro reading is w turned into S axes
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame body = body(lab);
        Vector3D r = new Vector3D(12.0, -3.5, 7.25);
        Rotation mounting = new Rotation(new Vector3D(0.3, -1, 0.5), 0.9, RotationConvention.FRAME_TRANSFORM);
        ReferenceFrame sensor = body.attach("hook", Motions.stationary(r, mounting));
        SpecificForce field = SpecificForce.uniform(G);
        // the field is uniform in the lab: re-resolved into each frame's axes
        IdealSensor atCentre = IdealSensor.of(body, SpecificForce.fixedInAxesOf(lab, G, body));
        IdealSensor atHook = IdealSensor.of(sensor, SpecificForce.fixedInAxesOf(lab, G, sensor));
        for (double t : new double[] {0.0, 1.3, 7.9, 21.0}) {
            Placement p = body.placementIn(lab, t);
            Vector3D w = p.angularVelocity();
            Vector3D al = p.angularAcceleration();
            InertialReading c = atCentre.readingAt(t);
            Vector3D expectedBody = c.specificForce().add(Vector3D.crossProduct(al, r))
                    .add(Vector3D.crossProduct(w, Vector3D.crossProduct(w, r)));
            Vector3D expected = mounting.applyTo(expectedBody);          // v_S = M v_body
            InertialReading h = atHook.readingAt(t);
            // 1e-12 relative: rounding of the chain (terms up to ~20 m/s^2)
            assertClose(expected, h.specificForce(), 1e-12 * 20, "f at t=" + t);
            assertClose(mounting.applyTo(w), h.angularRate(), 1e-12 * w.getNorm(), "w at t=" + t);
        }
        // and the body reading itself is (o'' in body axes) - g: independent Hipparchus rotation
        Placement p = body.placementIn(lab, 4.0);
        Vector3D a = p.orientation().applyTo(p.originAcceleration());
        Vector3D g = p.orientation().applyTo(G);
        assertClose(a.subtract(g), atCentre.readingAt(4.0).specificForce(), 1e-13 * 20, "body f");
        assertTrue(field.at(0, null) == G, "uniform field returns its vector");
    }

    @Test
    void bulkReadingsAreTheObjectReadings() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame sensor = body(lab).attach("imu", Motions.stationary(new Vector3D(0.4, 0.1, -0.2)));
        IdealSensor imu = IdealSensor.of(sensor, SpecificForce.fixedInAxesOf(lab, G, sensor));
        double[] times = {0.5, 1.0, 2.25, 9.0, -3.0};
        double[] out = new double[2 + 6 * 4];
        imu.readingsAt(times, 1, out, 2, 4);
        for (int k = 0; k < 4; k++) {
            InertialReading r = imu.readingAt(times[1 + k]);
            // same arithmetic on the same path: identical bits
            assertEquals(r.specificForce(), new Vector3D(out[2 + 6 * k], out[3 + 6 * k], out[4 + 6 * k]));
            assertEquals(r.angularRate(), new Vector3D(out[5 + 6 * k], out[6 + 6 * k], out[7 + 6 * k]));
        }
    }

    @Test
    void badInputIsRefusedWithItsName() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        IdealSensor imu = IdealSensor.of(lab, SpecificForce.uniform(G));
        assertTrue(assertThrows(NullPointerException.class, () -> IdealSensor.of(null, SpecificForce.uniform(G)))
                .getMessage().contains("sensorFrame"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> imu.readingAt(Double.NaN))
                .getMessage().contains("t must be finite"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> imu.readingsAt(new double[3], 0, new double[12], 0, 3)).getMessage().contains("targetOffset"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> imu.incrementsOver(1.0, 1.0))
                .getMessage().contains("end must be greater"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> imu.withTolerance(0.1))
                .getMessage().contains("relativeTolerance"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> imu.incrementsOver(0.0, -0.1, 2, new double[12], 0)).getMessage().contains("interval"));
    }

    static void assertClose(Vector3D expected, Vector3D actual, double tolerance, String what) {
        double error = expected.subtract(actual).getNorm();
        assertTrue(error <= tolerance, () -> what + ": expected " + expected + ", got " + actual + ", error "
                + error + " > " + tolerance);
    }
}
