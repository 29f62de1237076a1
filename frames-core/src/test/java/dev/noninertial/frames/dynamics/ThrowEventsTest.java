package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * Events against the closed-form times of a throw in uniform gravity, no drag: height
 * z(t) = h0 + v t - g t^2 / 2 (any mechanics text), so z = H at t = (v -+ sqrt(v^2 - 2 g (H - h0))) / g,
 * impact at t = (v + sqrt(v^2 + 2 g h0)) / g, and horizontal range x = u t.
 */
class ThrowEventsTest {

    static final double G = 9.81;

    @Test
    void verticalThrowStopsAtAnalyticImpactTimeAndRecordsCrossings() {
        double h0 = 2.0;
        double v = 30.0;
        double mark = 20.0;
        ReferenceFrame yard = ReferenceFrame.inertialRoot("yard");
        Trajectory tr = TrajectorySolver.of(yard)
                .plusForce(SpecificForce.uniform(new Vector3D(0, 0, -G)))
                .plusEvent(TrajectoryEvent.groundImpact(Vector3D.PLUS_K, 0.0))
                .plusEvent(TrajectoryEvent.heightCrossing("20 m", Vector3D.PLUS_K, mark))
                .solve(PointState.of(new Vector3D(0, 0, h0), new Vector3D(0, 0, v)), 0.0, 60.0);

        double impact = (v + Math.sqrt(v * v + 2 * G * h0)) / G;
        double root = Math.sqrt(v * v - 2 * G * (mark - h0));
        double up = (v - root) / G;
        double down = (v + root) / G;
        EventMark stop = tr.stopEvent().orElseThrow();
        List<EventMark> crossings = tr.events("20 m");
        System.out.printf("MEASURED throw events: impact %.12f s (analytic %.12f, diff %.2e s), crossings"
                + " %.12f / %.12f s (diffs %.2e / %.2e s), impact height %.2e m%n", stop.time(), impact,
                stop.time() - impact, crossings.get(0).time(), crossings.get(1).time(),
                crossings.get(0).time() - up, crossings.get(1).time() - down, stop.state().state().position().getZ());
        // Dormand-Prince 8 is exact on this quadratic motion, so the event locator's 1e-10 s
        // accuracy sets the error: 1e-9 s
        assertEquals("ground impact", stop.eventName());
        assertTrue(stop.stoppedRun());
        assertFalse(stop.rising());
        assertEquals(impact, stop.time(), 1e-9);
        assertEquals(impact, tr.endTime(), 1e-9);
        assertEquals(0.0, tr.finalState().state().position().getZ(), 1e-7);   // |dz/dt| ~ 31 m/s times 1e-9 s
        assertEquals(2, crossings.size());
        assertTrue(crossings.get(0).rising());
        assertFalse(crossings.get(1).rising());
        assertEquals(up, crossings.get(0).time(), 1e-9);
        assertEquals(down, crossings.get(1).time(), 1e-9);
        // the stopping mark is listed with the recorded ones, in time order
        assertEquals(3, tr.events().size());
        assertEquals("ground impact", tr.events().get(2).eventName());
        // dense output past the stop is refused, not extrapolated
        assertTrue(tr.endTime() < 60.0);
    }

    @Test
    void rangeEventAndUserStopEventFireAtAnalyticTimes() {
        double u = 15.0;   // 50 m reached at 3.33 s, before the apex at 4.08 s
        ReferenceFrame yard = ReferenceFrame.inertialRoot("yard");
        Trajectory tr = TrajectorySolver.of(yard)
                .plusForce(SpecificForce.uniform(new Vector3D(0, 0, -G)))
                .plusEvent(TrajectoryEvent.rangeReached("50 m", Vector3D.PLUS_K, Vector3D.ZERO, 50.0))
                // user event: stop at the apex, where the vertical velocity changes sign
                .plusEvent(TrajectoryEvent.of("apex", (t, s) -> s.velocity().getZ()).fallingOnly().stopping())
                .solve(PointState.of(Vector3D.ZERO, new Vector3D(u, 0, 40.0)), 0.0, 60.0);
        double rangeTime = 50.0 / u;
        double apex = 40.0 / G;
        EventMark range = tr.events("50 m").get(0);
        System.out.printf("MEASURED range event %.12f s (analytic %.12f), apex %.12f s (analytic %.12f)%n",
                range.time(), rangeTime, tr.endTime(), apex);
        // event locator accuracy 1e-10 s on an exactly integrated quadratic motion: 1e-9 s
        assertEquals(rangeTime, range.time(), 1e-9);
        assertEquals("apex", tr.stopEvent().orElseThrow().eventName());
        assertEquals(apex, tr.endTime(), 1e-9);
    }
}
