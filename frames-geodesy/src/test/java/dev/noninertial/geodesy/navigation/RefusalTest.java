package dev.noninertial.geodesy.navigation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Orientations;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/** What the mechanization cannot do is refused, with a message naming the step (issue 13). */
class RefusalTest {

    final LevelNavigator nav = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED);
    final NavigationState start = NavigationState.of(10.0, LatLonHeight.ofDegrees(47.3, 8.6, 450.0),
            Vector3D.ZERO, LocalAxes.NED, Orientations.identity());
    final Vector3D dv = new Vector3D(0, 0, -0.098);

    @Test
    void nanIncrementsAreRefusedWithTheStep() {
        double[] ends = {10.01, 10.02, 10.03};
        double[] dvs = {0, 0, -0.098, 0, 0, -0.098, 0, Double.NaN, -0.098};
        double[] das = new double[9];
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> nav.run(start, ends, dvs, das));
        assertTrue(e.getMessage().contains("step 2") && e.getMessage().contains("deltaVelocity"), e.getMessage());
        das[3] = Double.POSITIVE_INFINITY;
        e = assertThrows(IllegalArgumentException.class, () -> nav.run(start, ends, new double[9], das));
        assertTrue(e.getMessage().contains("step 1") && e.getMessage().contains("deltaAngle"), e.getMessage());
    }

    @Test
    void nonIncreasingTimeIsRefusedWithTheStep() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> nav.advance(start, 10.0, dv, Vector3D.ZERO));
        assertTrue(e.getMessage().contains("step 0") && e.getMessage().contains("increase"), e.getMessage());
        double[] ends = {10.01, 10.02, 10.02};
        e = assertThrows(IllegalArgumentException.class, () -> nav.run(start, ends, new double[9], new double[9]));
        assertTrue(e.getMessage().contains("step 2"), e.getMessage());
    }

    @Test
    void aPathOverThePoleIsRefusedWithTheStep() {
        // 300 m/s due north from 89.8 deg N, 10 s steps: 0.027 deg per step, so the 89.9 deg limit
        // is passed in the fourth step (index 3); the increments hold the vehicle level (f = -g up)
        NavigationState polar = NavigationState.of(0.0, LatLonHeight.ofDegrees(89.8, 0.0, 0.0),
                new Vector3D(300, 0, 0), LocalAxes.NED, Orientations.identity());
        int n = 10;
        double[] ends = new double[n];
        double[] dvs = new double[3 * n];
        for (int k = 0; k < n; k++) {
            ends[k] = 10.0 * (k + 1);
            dvs[3 * k + 2] = -9.832 * 10.0;
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> nav.run(polar, ends, dvs, new double[3 * n]));
        assertTrue(e.getMessage().contains("step 3") && e.getMessage().contains("pole"), e.getMessage());
    }

    @Test
    void otherMisuseIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> NavigationState.of(0.0, LatLonHeight.ofDegrees(90, 0, 0),
                Vector3D.ZERO, LocalAxes.NED, Orientations.identity()));
        assertThrows(IllegalArgumentException.class,
                () -> LevelNavigator.of(EarthModel.WGS84, LocalAxes.ENU).advance(start, 10.01, dv, Vector3D.ZERO));
        assertThrows(IllegalStateException.class,
                () -> nav.without(NavigationTerm.GRAVITY_HEIGHT).advance(start, 10.01, dv, Vector3D.ZERO));
        assertThrows(IllegalArgumentException.class, () -> nav.run(start, new double[2], new double[3], new double[6]));
    }

    private static String refusal(Class<? extends RuntimeException> type, org.junit.jupiter.api.function.Executable call) {
        return assertThrows(type, call).getMessage();
    }

    @Test
    void inputsOutsideTheDocumentedDomainAreRefusedByTheCallersNames() {
        // issue 15: before, huge increments and steps were refused as a latitude beyond the pole
        // limit (NaN or infinite degrees) and named no argument, the primitive form did not check
        // its work array, and the names were the vector groups, not the parameters
        String m = refusal(IllegalArgumentException.class,
                () -> nav.advance(start, 10.01, new Vector3D(1e300, 0, 0), Vector3D.ZERO));
        assertTrue(m.contains("deltaVelocity = (1.0E300, 0.0, 0.0) m/s must have a norm of at most "
                + "MAX_SPECIFIC_FORCE x step"), m);
        m = refusal(IllegalArgumentException.class, () -> nav.advance(start, 10.01, dv, new Vector3D(0, 4.0, 0)));
        assertTrue(m.contains("deltaAngle = (0.0, 4.0, 0.0) rad must have a norm of at most MAX_DELTA_ANGLE"), m);
        m = refusal(IllegalArgumentException.class, () -> nav.advance(start, 1e300, dv, Vector3D.ZERO));
        assertTrue(m.contains("end makes a step of 1.0E300 s, must be at most 3600.0 s"), m);

        double[] work = nav.newWork(start);
        m = refusal(IllegalArgumentException.class, () -> nav.advance(work, 10.01, 0, Double.NaN, 0, 0, 0, 0));
        assertTrue(m.contains("dvy (deltaVelocity y) must be finite, got NaN"), m);
        m = refusal(IllegalArgumentException.class, () -> nav.advance(work, 10.01, 0, 0, 0, 0, 0, 1e300));
        assertTrue(m.contains("deltaAngle (dax, day, daz) = (0.0, 0.0, 1.0E300) rad"), m);
        assertEquals("work must not be null",
                refusal(NullPointerException.class, () -> nav.advance(null, 10.01, 0, 0, 0, 0, 0, 0)));
        m = refusal(IllegalArgumentException.class, () -> nav.advance(new double[3], 10.01, 0, 0, 0, 0, 0, 0));
        assertTrue(m.startsWith("work must have length 37"), m);
        double[] broken = nav.newWork(start);
        broken[0] = Double.NaN;
        m = refusal(IllegalArgumentException.class, () -> nav.advance(broken, 10.01, 0, 0, 0, 0, 0, 0));
        assertTrue(m.startsWith("work[0] (time, position, velocity or attitude) must be finite, got NaN"), m);

        // bulk forms name the array element; the grid forms name the interval
        m = refusal(IllegalArgumentException.class, () -> nav.run(start, new double[] {10.01, 10.02},
                new double[] {0, 0, 0, 0, 0, Double.POSITIVE_INFINITY}, new double[6]));
        assertTrue(m.contains("step 1") && m.contains("deltaVelocities[5] (deltaVelocity z) must be finite"), m);
        m = refusal(IllegalArgumentException.class,
                () -> nav.run(start, Double.MIN_VALUE, 1, new double[6], 0, null));
        assertTrue(m.startsWith("step 0: end time start.time() + 1 x interval = 10.0 s must be finite and after "
                + "the state's time 10.0 s"), m);
        m = refusal(IllegalArgumentException.class,
                () -> ErrorBudget.of(nav, start, Double.MIN_VALUE, 1, new double[6], 0));
        assertTrue(m.contains("interval"), m);
        m = refusal(IllegalArgumentException.class, () -> ErrorBudget.of(nav, start, 1e300, 1, new double[6], 0));
        assertTrue(m.contains("end time start.time() + 1 x interval makes a step of 1.0E300 s"), m);
        double[] grid = new double[12];
        grid[10] = 5.0;   // the second step's delta-angle y: more than half a turn
        m = refusal(IllegalArgumentException.class, () -> nav.run(start, 0.01, 2, grid, 0, null));
        assertTrue(m.contains("step 1") && m.contains("increments[9..11] (deltaAngle)"), m);
    }
}
