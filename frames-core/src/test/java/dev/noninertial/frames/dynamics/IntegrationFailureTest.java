package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * Issue 15, class 5: a failing integration keeps what it computed, blames the right part and
 * gives the step-limit hint only where it can help. Check values: a point under a constant
 * specific force g in an inertial frame follows x = v0 t + g t^2 / 2 (textbook kinematics).
 */
class IntegrationFailureTest {

    private static final ReferenceFrame LAB = ReferenceFrame.inertialRoot("lab");
    private static final PointState START = PointState.of(Vector3D.ZERO, new Vector3D(2, 0, 0));

    @Test
    void aFailingRunKeepsItsPartialTrajectory() {
        // the force is defined only for x < 20 m: the run from x = 0 at 2 m/s (plus 1 m/s^2) fails
        // when a trial step probes beyond; everything before stays available
        SpecificForce regional = (t, s) -> {
            if (s.position().getX() >= 20.0) {
                throw new IllegalArgumentException("position x must be below 20 m, got " + s.position().getX());
            }
            return new Vector3D(1.0, 0, 0);
        };
        TrajectoryFailure e = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce(regional).withMaxStep(0.5).solve(START, 0.0, 100.0));
        Trajectory partial = e.partial().orElseThrow();
        assertTrue(partial.endTime() > 3.0 && partial.endTime() <= e.time(), "partial ends at " + partial.endTime());
        // x(t) = 2 t + t^2 / 2 reaches 20 m at t = -2 + sqrt(44) = 4.633 s
        double t = 3.0;
        // 1e-6 m: the solver's default position tolerance (TrajectorySolver.DEFAULT_POSITION_TOLERANCE)
        assertEquals(2 * t + 0.5 * t * t, partial.at(t).state().position().getX(), 1e-6);
        assertTrue(Double.isFinite(e.time()));
        assertTrue(e.getMessage().contains("withMaxStep"), e.getMessage());
    }

    @Test
    void theStepHintIsGivenOnlyWhereItApplies() {
        // refused at the start state: no step was taken, a step limit cannot help
        SpecificForce never = (t, s) -> {
            throw new IllegalArgumentException("this force is not defined anywhere");
        };
        TrajectoryFailure atStart = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce(never).solve(START, 0.0, 10.0));
        assertFalse(atStart.getMessage().contains("withMaxStep"), atStart.getMessage());
        assertTrue(atStart.partial().isEmpty());
        // a configuration error (not an argument refusal) later in the run: no hint either
        SpecificForce broken = (t, s) -> {
            if (t > 1.0) {
                throw new IllegalStateException("the force's table was never loaded");
            }
            return Vector3D.ZERO;
        };
        TrajectoryFailure config = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce(broken).withMaxStep(0.25).solve(START, 0.0, 10.0));
        assertFalse(config.getMessage().contains("withMaxStep"), config.getMessage());
        assertTrue(config.partial().isPresent());
    }

    @Test
    void anOverflowingSumOfForcesIsBlamedOnTheForces() {
        SpecificForce big = (t, s) -> new Vector3D(1e308, 0, 0);
        TrajectoryFailure e = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce(big).plusForce(big).solve(START, 0.0, 1.0));
        assertTrue(e.getMessage().contains("sum of the specific forces overflows when force #1"), e.getMessage());
    }

    @Test
    void theFailureTimeIsNeverNaN() {
        TrajectoryFailure raw = new TrajectoryFailure("integrator lost its way", Double.NaN, new double[6], null);
        TrajectoryFailure reported = raw.completed(null, 12.5, 0.0);
        assertEquals(12.5, reported.time(), 0.0);
        assertTrue(reported.getMessage().contains("last accepted time 12.5 s"), reported.getMessage());
    }

    @Test
    void aRunIsRefusedAtTheStoredStepCapWithItsSteps() {
        // free particle with steps of at most 1 ms over 1,000 s: 1e6 steps, above the cap
        System.gc();
        Runtime rt = Runtime.getRuntime();
        long before = rt.totalMemory() - rt.freeMemory();
        TrajectoryFailure e = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).withMaxStep(1e-3).solve(START, 0.0, 1000.0));
        assertTrue(e.getMessage().contains("more than " + TrajectorySolver.MAX_STORED_STEPS + " accepted steps"),
                e.getMessage());
        Trajectory partial = e.partial().orElseThrow();
        // 200,000 steps of 1 ms: the partial trajectory reaches t = 200 s (to rounding of the steps)
        assertEquals(200.0, partial.endTime(), 1e-6);
        // free particle: x = v t (Newton's first law)
        assertEquals(2.0 * 150.0, partial.at(150.0).state().position().getX(), 1e-6);
        System.gc();
        long held = rt.totalMemory() - rt.freeMemory() - before;
        System.out.println("stored-step cap: " + TrajectorySolver.MAX_STORED_STEPS + " steps held, heap growth "
                + held / 1_000_000 + " MB (" + held / TrajectorySolver.MAX_STORED_STEPS + " B per step)");
        assertTrue(partial.endTime() < 1000.0);
    }
}
