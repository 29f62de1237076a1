package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;

/**
 * Spin profiles and motion sequences: constant-acceleration kinematics (theta = theta0 + r0 t +
 * al t^2 / 2, any mechanics textbook), five-point finite differences of the angle, and refusals.
 */
class SpinProfileTest {

    /** Spin-up of an invented centrifuge: 0.15 rad/s^2 for 20 s, hold 60 s, spin-down. */
    private static final SpinProfile RUN = SpinProfile.startingAt(0.0, 0.0, 0.0).ramp(20.0, 0.15).hold(60.0)
            .ramp(20.0, -0.15);

    @Test
    void rampHoldRampFollowsConstantAccelerationKinematics() {
        // at 10 s: theta = 0.15 * 100 / 2 = 7.5 rad, rate 1.5 rad/s; at 20 s: 30 rad, 3 rad/s
        assertEquals(7.5, RUN.angle(10.0), 1e-14);
        assertEquals(1.5, RUN.rate(10.0), 1e-15);
        assertEquals(0.15, RUN.angularAcceleration(10.0), 0.0);
        // hold: 30 + 3 * 60 = 210 rad at 80 s; spin-down: 210 + 3 * 20 - 0.15 * 400 / 2 = 240 rad at 100 s
        assertEquals(210.0, RUN.angle(80.0), 1e-12);
        assertEquals(240.0, RUN.angle(100.0), 1e-12);
        assertEquals(0.0, RUN.rate(100.0), 1e-15);
        assertEquals(0.0, RUN.start(), 0.0);
        assertEquals(100.0, RUN.end(), 0.0);
        assertEquals(3, RUN.pieceCount());
    }

    @Test
    void ratesAreTheDerivativesOfTheAngle() {
        // five-point central differences, h = 1e-3 s: truncation ~h^4 theta^(5) ~ 1e-12, rounding
        // ~ eps * 240 rad / h ~ 1e-10 for the rate; tolerance 1e-8 (1e-6 for the second derivative)
        SpinProfile p = RUN.oscillate(0.3, 2.0, 2.5).steps(new double[] {0.5, -1.0, 0.0}, 3.0, 0.4);
        double h = 1e-3;
        for (double t = 0.37; t < p.end(); t += 1.3) {
            double d1 = (-p.angle(t + 2 * h) + 8 * p.angle(t + h) - 8 * p.angle(t - h) + p.angle(t - 2 * h)) / (12 * h);
            double d2 = (-p.rate(t + 2 * h) + 8 * p.rate(t + h) - 8 * p.rate(t - h) + p.rate(t - 2 * h)) / (12 * h);
            if (nearJoin(p, t, 3 * h)) {
                continue;   // the angular acceleration may jump at a join; differences straddling it are invalid
            }
            assertEquals(d1, p.rate(t), 1e-8, "rate at " + t);
            assertEquals(d2, p.angularAcceleration(t), 1e-6, "angular acceleration at " + t);
        }
    }

    private static boolean nearJoin(SpinProfile p, double t, double margin) {
        // joins of RUN and of the appended pieces, found as jumps of the angular acceleration
        return Math.abs(p.angularAcceleration(Math.min(p.end(), t + margin))
                - p.angularAcceleration(Math.max(p.start(), t - margin))) > 1e-3 * margin;
    }

    @Test
    void joinsAreContinuousInAngleAndRate() {
        SpinProfile p = RUN.oscillate(0.3, 2.0, 1.0).steps(new double[] {2.0, 1.0}, 5.0, 0.5);
        double eps = 1e-9;
        for (double t = p.start() + 1e-3; t < p.end() - 1e-3; t += 0.01) {
            // no jump larger than the slope over eps: |theta(t + eps) - theta(t - eps)| <= 2 eps max|rate|
            assertTrue(Math.abs(p.angle(t + eps) - p.angle(t - eps)) <= 2 * eps * 4 + 1e-12, "angle at " + t);
            assertTrue(Math.abs(p.rate(t + eps) - p.rate(t - eps)) <= 2 * eps * 2 + 1e-12, "rate at " + t);
        }
        // whole cycles of the oscillation end at the steady turn: 240 rad at rest, after 2 pi / 2 s
        assertEquals(240.0, p.angle(100.0 + Math.PI), 1e-12);
        // the step sequence reaches its plateaus
        double end = p.end();
        // 1e-13 rad/s: rounding of the start rates summed over the pieces
        assertEquals(1.0, p.rate(end), 1e-13);
        assertEquals(1.0, p.rate(end - 4.9), 1e-13);
    }

    @Test
    void discontinuousJoinsAndTimesOutsideTheSpanAreRefused() {
        SpinProfile later = SpinProfile.startingAt(100.0, 240.0, 0.5).hold(10.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RUN.then(later));
        assertTrue(e.getMessage().contains("continuous in rate"), e.getMessage());
        SpinProfile jump = SpinProfile.startingAt(100.0, 241.0, 0.0).hold(10.0);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RUN.then(jump)).getMessage()
                .contains("continuous in angle"));
        SpinProfile gap = SpinProfile.startingAt(101.0, 240.0, 0.0).hold(10.0);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RUN.then(gap)).getMessage()
                .contains("must start when"));
        SpinProfile ok = RUN.then(SpinProfile.startingAt(100.0, 240.0, 0.0).hold(10.0));
        assertEquals(110.0, ok.end(), 0.0);
        assertEquals(240.0, ok.angle(105.0), 1e-12);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RUN.angle(100.5)).getMessage()
                .contains("span of the spin profile"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RUN.ramp(-1.0, 0.1)).getMessage()
                .contains("duration"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RUN.steps(new double[0], 1.0, 1.0))
                .getMessage().contains("rates"));
    }

    @Test
    void turningMotionCarriesTheProfile() {
        Vector3D axis = new Vector3D(0, 0, 2);
        Motion m = Motions.turning(axis, RUN);
        Placement p = m.at(10.0);
        // rate and acceleration along the unit axis, in the moving frame (the axis is fixed)
        assertEquals(new Vector3D(0, 0, 1.5), p.angularVelocity());
        assertEquals(new Vector3D(0, 0, 0.15), p.angularAcceleration());
        // the orientation is the turn by the profile's angle (v_F = R v_B: x_B seen in F at -7.5 rad)
        Vector3D xInF = p.vectorFromBase(Vector3D.PLUS_I);
        assertEquals(Math.cos(7.5), xInF.getX(), 1e-14);
        assertEquals(-Math.sin(7.5), xInF.getY(), 1e-14);
        assertThrows(IllegalArgumentException.class, () -> m.at(-1.0));
    }

    @Test
    void sequencesSwitchMotionsAndRefuseJumps() {
        Vector3D n = Vector3D.PLUS_K;
        // spin up at 0.2 rad/s^2 for 5 s (angle 2.5 rad, rate 1 rad/s), then a steady 1 rad/s spin:
        // angle 2.5 + (t - 5) = t - 2.5
        Motion seq = Motions.sequence(new double[] {5.0}, Motions.spinUp(n, 0, 0, 0.2), Motions.spin(n, -2.5, 1.0));
        // 1e-15 rad/s: rounding of r0 + al t
        assertEquals(0.0, seq.at(3.0).angularVelocity().distance(new Vector3D(0, 0, 0.6)), 1e-15);
        assertEquals(0.0, seq.at(7.0).angularVelocity().distance(new Vector3D(0, 0, 1.0)), 1e-15);
        assertEquals(0.0, seq.at(5.0).angularAcceleration().getNorm(), 0.0);   // at a join: the later motion
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Motions.sequence(new double[] {5.0}, Motions.spinUp(n, 0, 0, 0.2), Motions.spin(n, -2.5, 1.1)));
        assertTrue(e.getMessage().contains("joinTimes[0]") && e.getMessage().contains("angular velocity"),
                e.getMessage());
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> Motions.sequence(new double[] {5.0}, Motions.spinUp(n, 0, 0, 0.2), Motions.spin(n, -2.4, 1.0)))
                .getMessage().contains("orientation"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> Motions.sequence(new double[] {1.0, 2.0}, Motions.spin(n, 0, 1))).getMessage()
                .contains("at least two"));
    }

    @Test
    void profilesAndTheirMotionsSurviveSerialization() throws Exception {
        Motion m = Motions.sequence(new double[] {100.0}, Motions.turning(Vector3D.PLUS_K, RUN.hold(5.0)),
                Motions.spin(Vector3D.PLUS_K, 240.0 - 0.0 * 100.0, 0.0));
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        try (java.io.ObjectOutputStream out = new java.io.ObjectOutputStream(bytes)) {
            out.writeObject(m);
            out.writeObject(RUN);
        }
        try (java.io.ObjectInputStream in = new java.io.ObjectInputStream(
                new java.io.ByteArrayInputStream(bytes.toByteArray()))) {
            Motion back = (Motion) in.readObject();
            SpinProfile p = (SpinProfile) in.readObject();
            // the same values after the round trip (same arithmetic on the same fields)
            assertEquals(m.at(42.0), back.at(42.0));
            assertEquals(RUN, p);
            assertEquals(RUN.angle(55.5), p.angle(55.5), 0.0);
        }
    }
}
