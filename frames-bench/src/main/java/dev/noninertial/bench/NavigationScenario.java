package dev.noninertial.bench;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Orientations;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;
import dev.noninertial.geodesy.navigation.LevelNavigator;
import dev.noninertial.geodesy.navigation.NavigationState;

/**
 * Inputs of the navigation benchmarks: a vehicle at rest at an invented site, its exact
 * at-rest increments at 100 Hz (specific force minus normal gravity and the Earth rate, both in
 * body axes), so that any number of steps stays well defined.
 */
public final class NavigationScenario {

    /** Step (s): 100 Hz. */
    public static final double STEP = 0.01;
    /** Invented site. */
    public static final LatLonHeight SITE = LatLonHeight.ofDegrees(51.3, -3.7, 250.0);
    /** Body attitude over NED. */
    public static final Rotation ATTITUDE = Orientations.fromYawPitchRoll(0.7, 0.04, -0.02);

    /** The navigator under test. */
    public final LevelNavigator navigator = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED);
    /** Start state. */
    public final NavigationState start = NavigationState.of(0.0, SITE, Vector3D.ZERO, LocalAxes.NED, ATTITUDE);
    /** Delta-velocity of a step (m/s, body axes). */
    public final double[] dv = new double[3];
    /** Delta-angle of a step (rad, body axes). */
    public final double[] da = new double[3];

    /** Builds the inputs. */
    public NavigationScenario() {
        Vector3D f = ATTITUDE.applyTo(EarthModel.WGS84.normalGravityIn(SITE, LocalAxes.NED).negate());
        Vector3D w = ATTITUDE.applyTo(EarthModel.WGS84.earthRateIn(SITE.latitude(), LocalAxes.NED));
        dv[0] = f.getX() * STEP;
        dv[1] = f.getY() * STEP;
        dv[2] = f.getZ() * STEP;
        da[0] = w.getX() * STEP;
        da[1] = w.getY() * STEP;
        da[2] = w.getZ() * STEP;
    }

    /** @return a baseline state array at the start */
    public double[] baselineState() {
        return NavigationBaseline.atRest(SITE.latitude(), SITE.longitude(), SITE.height(),
                Orientations.toQuaternion(ATTITUDE));
    }

    /**
     * Packed increments of {@code n} steps.
     *
     * @param n steps
     * @return {ends, deltaVelocities, deltaAngles}
     */
    public double[][] run(int n) {
        double[] ends = new double[n];
        double[] dvs = new double[3 * n];
        double[] das = new double[3 * n];
        for (int k = 0; k < n; k++) {
            ends[k] = (k + 1) * STEP;
            System.arraycopy(dv, 0, dvs, 3 * k, 3);
            System.arraycopy(da, 0, das, 3 * k, 3);
        }
        return new double[][] {ends, dvs, das};
    }
}
