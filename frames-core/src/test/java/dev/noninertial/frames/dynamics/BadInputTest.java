package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.nonstiff.ClassicalRungeKuttaIntegrator;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * Bad input is refused early with a message naming the argument, the value and the allowed range
 * (project rule, DESIGN "What done means"); failures during a run name the time and state.
 */
class BadInputTest {

    static final ReferenceFrame LAB = ReferenceFrame.inertialRoot("lab");
    static final PointState START = PointState.of(new Vector3D(1, 2, 3), new Vector3D(0, 0, 1));

    static void assertMessage(Throwable e, String... parts) {
        for (String p : parts) {
            assertTrue(e.getMessage().contains(p), "message '" + e.getMessage() + "' lacks '" + p + "'");
        }
    }

    @Test
    void spanMustRunForwardAndBeFinite() {
        TrajectorySolver s = TrajectorySolver.of(LAB);
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.solve(START, 5.0, 2.0)),
                "endTime", "after startTime = 5.0", "2.0");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.solve(START, 5.0, 5.0)), "endTime");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.solve(START, Double.NaN, 1.0)),
                "startTime", "NaN");
        assertMessage(assertThrows(IllegalArgumentException.class,
                () -> s.solve(START, 0.0, Double.POSITIVE_INFINITY)), "endTime", "Infinity");
        assertThrows(NullPointerException.class, () -> s.solve((PointState) null, 0.0, 1.0));
        // a non-finite state cannot even be built
        assertMessage(assertThrows(IllegalArgumentException.class,
                () -> PointState.of(new Vector3D(Double.NaN, 0, 0), Vector3D.ZERO)), "position");
    }

    @Test
    void tolerancesAndSettingsMustBePositive() {
        TrajectorySolver s = TrajectorySolver.of(LAB);
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.withTolerance(0.0)), "tolerance", "0.0");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.withTolerance(-1e-9)), "tolerance");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.withTolerance(1e-9, Double.NaN, 1e-9)),
                "velocityTolerance", "NaN");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.withTolerance(1e-9, 1e-9, 0.0)),
                "relative");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.withMaxStep(0.0)), "seconds");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> s.withMaxEvaluations(0)), "count", "0");
        assertThrows(NullPointerException.class, () -> s.plusForce(null));
        assertThrows(NullPointerException.class, () -> s.plusEvent(null));
        assertMessage(assertThrows(IllegalArgumentException.class,
                () -> TrajectoryEvent.groundImpact(Vector3D.ZERO, 0.0)), "up");
        assertMessage(assertThrows(IllegalArgumentException.class,
                () -> TrajectoryEvent.rangeReached("r", Vector3D.PLUS_K, Vector3D.ZERO, -5.0)), "range", "-5.0");
        assertMessage(assertThrows(IllegalArgumentException.class,
                () -> TrajectoryEvent.of(" ", (t, st) -> 0.0)), "name");
    }

    @Test
    void nonFiniteForceIsReportedWithTimeAndState() {
        SpecificForce bad = (t, st) -> t > 1.0 ? new Vector3D(Double.NaN, 0, 0) : Vector3D.ZERO;
        TrajectoryFailure f = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce(bad).withMaxStep(0.1).solve(START, 0.0, 3.0));
        assertMessage(f, "specific force #0", "non-finite", "NaN", "at t = ", "state r = (");
        assertTrue(f.time() > 1.0 && f.time() <= 1.1, "time " + f.time());
        assertEquals(6, f.components().length);
        // free motion up to the failure: z = 3 + t (rounding only)
        assertEquals(3.0 + f.time(), f.components()[2], 1e-9);
    }

    @Test
    void stateOverflowIsReportedWithTimeAndState() {
        // finite but absurd force: the state overflows to infinity within a step or two
        SpecificForce huge = (t, st) -> new Vector3D(1e308, 0, 0);
        TrajectoryFailure f = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce(huge).solve(START, 0.0, 10.0));
        assertMessage(f, "non-finite", "at t = ");
    }

    @Test
    void throwingAndNullForcesAreReportedWithTimeAndState() {
        SpecificForce throwing = (t, st) -> {
            if (st.position().getZ() > 4.0) {
                throw new IllegalStateException("table lookup out of range");
            }
            return Vector3D.ZERO;
        };
        TrajectoryFailure f = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce(throwing).solve(START, 0.0, 3.0));
        assertMessage(f, "threw", "table lookup out of range", "at t = ");
        assertTrue(f.getCause() instanceof IllegalStateException);
        TrajectoryFailure n = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce((t, st) -> null).solve(START, 0.0, 3.0));
        assertMessage(n, "returned null", "at t = 0 s");
    }

    @Test
    void failingFrameMotionAndExhaustedBudgetAreReported() {
        Motion limited = t -> {
            if (t > 2.0) {
                throw new IllegalArgumentException("t must be in [0, 2] s, got " + t);
            }
            return Motions.spin(Vector3D.PLUS_K, 0, 1.0).at(t);
        };
        ReferenceFrame logged = LAB.attach("logged", limited);
        TrajectoryFailure m = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(logged).solve(START, 0.0, 5.0));
        assertMessage(m, "motion of frame 'lab/logged'", "t must be in [0, 2] s");
        assertTrue(m.time() > 2.0);
        TrajectoryFailure budget = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce((t, st) -> st.position().scalarMultiply(-100.0))
                        .withTolerance(1e-12).withMaxEvaluations(50).solve(START, 0.0, 100.0));
        assertMessage(budget, "gave up", "at t = ");
        // a stiff spring (period 6e-4 s) cannot be followed with steps of at least 0.01 s
        TrajectoryFailure stiff = assertThrows(TrajectoryFailure.class,
                () -> TrajectorySolver.of(LAB).plusForce((t, st) -> st.position().scalarMultiply(-1e8))
                        .withMinStep(0.01).solve(START, 0.0, 10.0));
        assertMessage(stiff, "gave up", "at t = ");
        assertMessage(assertThrows(IllegalArgumentException.class,
                () -> TrajectorySolver.of(LAB).withMinStep(1.0).withMaxStep(0.5).solve(START, 0.0, 10.0)),
                "minimum step", "0.5", "1.0");
    }

    @Test
    void eventFunctionAndDenseOutputRangeAreChecked() {
        TrajectoryFailure e = assertThrows(TrajectoryFailure.class, () -> TrajectorySolver.of(LAB)
                .plusEvent(TrajectoryEvent.of("broken", (t, st) -> t > 0.5 ? Double.NaN : 1.0))
                .solve(START, 0.0, 2.0));
        assertMessage(e, "event 'broken'", "non-finite", "at t = ");
        Trajectory tr = TrajectorySolver.of(LAB).solve(START, 0.0, 2.0);
        assertMessage(assertThrows(IllegalArgumentException.class, () -> tr.at(2.5)), "t must be in [0.0, 2.0]",
                "2.5");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> tr.at(-0.1)), "-0.1");
        assertMessage(assertThrows(IllegalArgumentException.class, () -> tr.samples(0.0)), "interval");
        assertMessage(assertThrows(IllegalArgumentException.class,
                () -> TrajectorySolver.of(LAB).withIntegrator(() -> null).solve(START, 0.0, 1.0)), "null");
    }

    @Test
    void customIntegratorIsUsed() {
        // fixed-step classical Runge-Kutta is exact on free motion (rounding only, 1e-12 m)
        Trajectory tr = TrajectorySolver.of(LAB).withIntegrator(() -> new ClassicalRungeKuttaIntegrator(0.25))
                .solve(START, 0.0, 2.0);
        assertEquals(8, tr.stepCount());
        assertEquals(5.0, tr.finalState().state().position().getZ(), 1e-12);
    }
}
