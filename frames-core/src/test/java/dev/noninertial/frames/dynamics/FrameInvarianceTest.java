package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * Physical invariant: the motion of a point does not depend on the frame it is integrated in.
 * The same shot is integrated in the inertial root and in a frame that spins up about a tilted
 * axis (time-varying spin, so Euler, Coriolis and centrifugal terms all act) while its origin
 * accelerates with a jerk; the rotating-frame result, converted to the root, must match the
 * root result and the closed-form parabola r0 + v0 t + g t^2 / 2 (Newton's second law with
 * uniform gravitation, any mechanics text).
 */
class FrameInvarianceTest {

    static final Vector3D G = new Vector3D(0, 0, -9.81);
    static final Vector3D R0 = new Vector3D(120.0, -40.0, 15.0);
    static final Vector3D V0 = new Vector3D(250.0, 100.0, 480.0);

    static Vector3D parabola(double t) {
        return new Vector3D(1.0, R0, t, V0, 0.5 * t * t, G);
    }

    @Test
    void spinningAcceleratingFrameAgreesWithInertialRootToMicrometres() {
        ReferenceFrame range = ReferenceFrame.inertialRoot("range");
        ReferenceFrame carrier = range.attach("carrier", Motions.translation(new Vector3D(1000, -2000, 500), new Vector3D(30, 10, 0),
                        new Vector3D(0.5, -0.2, 0.1), new Vector3D(1e-3, 0, 2e-3))
                .then(Motions.spinUp(new Vector3D(0.3, -0.2, 1.0), 0.4, 0.05, 2e-3)));
        double t0 = 0.0;
        double t1 = 100.0;

        // Tolerances: in the carrier the point is up to ~20 km from the origin and moves at up to
        // ~5 km/s (w reaches 0.25 rad/s), so the relative tolerance sets the local error: 1e-13
        // of 2e4 m is 2e-9 m per step, and ~120 steps keep the global error near 1e-8 m.
        // Measured scan (same test, relative tolerance only changed): 1e-10 -> 3.2e-6 m (misses
        // the 1e-6 m target), 1e-12 -> 5.0e-8 m, 1e-13 -> 1.2e-8 m, 1e-14 -> 8.5e-9 m.
        TrajectorySolver inCarrier = TrajectorySolver.of(carrier)
                .plusForce(SpecificForce.fixedInAxesOf(range, G, carrier))
                .withTolerance(1e-9, 1e-9, 1e-13);
        TrajectorySolver inRange = TrajectorySolver.of(range)
                .plusForce(SpecificForce.uniform(G))
                .withTolerance(1e-9, 1e-9, 1e-13);

        FramedState start = range.stateAt(t0, PointState.of(R0, V0));
        Trajectory a = inCarrier.solve(start, t1);
        Trajectory b = inRange.solve(start, t1);

        double worstFrames = 0;
        double worstAnalytic = 0;
        double worstVelocity = 0;
        for (double t = t0; t <= t1 + 1e-9; t += 0.5) {
            FramedState fromCarrier = a.at(t).in(range);
            FramedState direct = b.at(t);
            worstFrames = Math.max(worstFrames,
                    fromCarrier.state().position().distance(direct.state().position()));
            worstAnalytic = Math.max(worstAnalytic, fromCarrier.state().position().distance(parabola(t)));
            worstVelocity = Math.max(worstVelocity, fromCarrier.state().velocity()
                    .distance(V0.add(t, G)));
        }
        // the acceleration seen in the root must come back as g (exact kinematics of the conversion)
        double accelError = a.at(60.0).in(range).state().acceleration().distance(G);
        System.out.printf("MEASURED invariance: carrier vs root %.3e m, carrier vs parabola %.3e m, "
                + "velocity %.3e m/s, acceleration %.3e m/s^2, steps %d / %d, evaluations %d / %d%n",
                worstFrames, worstAnalytic, worstVelocity, accelError, a.stepCount(), b.stepCount(),
                a.evaluations(), b.evaluations());
        // 1e-6 m: the brief's target for a 100 s, 30 km-class trajectory
        assertTrue(worstFrames < 1e-6, "carrier vs root " + worstFrames + " m");
        assertTrue(worstAnalytic < 1e-6, "carrier vs parabola " + worstAnalytic + " m");
        // velocity: same relative accuracy, 1e-8 m/s on ~500 m/s
        assertTrue(worstVelocity < 1e-8, "velocity " + worstVelocity + " m/s");
        // acceleration: rounding of the fictitious terms (~km/s^2-scale centrifugal in the carrier
        // cancelling to 9.81), 1e-9 m/s^2
        assertTrue(accelError < 1e-9, "acceleration " + accelError + " m/s^2");
    }
}
