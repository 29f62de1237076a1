package dev.noninertial.geodesy.navigation;

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
}
