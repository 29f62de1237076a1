package dev.noninertial.geodesy.navigation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Orientations;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Classical coning motion (issue 13): attitude drift of the uncorrected and the coning-corrected
 * updates against the closed-form drift of that motion.
 *
 * <p>The motion (defined here): the body's attitude in the level frame is the quaternion
 * {@code q(t) = (cos(a/2), sin(a/2) u(t))}, {@code u = (0, cos Wt, sin Wt)}, a cone of
 * half-angle a about x at frequency W. Its body rate, derived here from {@code w = 2 q* (x) dq/dt}:
 * {@code w = (-2 W sin^2(a/2), -W sin(a) sin(Wt), W sin(a) cos(Wt))}, so the exact delta-angle
 * over [t0, t1] is {@code (-2 W sin^2(a/2) h, sin a (cos Wt1 - cos Wt0), sin a (sin Wt1 - sin Wt0))}.
 * The attitude returns to itself every period: any steady turn about x is algorithm drift.
 *
 * <p>Closed-form drift rates about the cone axis (REFERENCES.md, "Inertial sensors and
 * navigation": Savage 1998 part 1; Ignagni 1990; Miller 1983; the forms below from memory and
 * re-derived here from the Bortz coning integral {@code 1/2 int(theta x w)}, whose x component over a
 * step is {@code (sin^2 a / 2)(x - sin x)}, {@code x = W h}):
 * <ul>
 *   <li>uncorrected ({@code phi = da}): {@code -(1/2) sin^2(a) W (1 - sin(x)/x)};</li>
 *   <li>with the previous-interval term {@code (1/12) da' x da}:
 *       {@code -(sin^2 a / h) [(x - sin x)/2 - (2 sin x - sin 2x)/12]}, whose leading term is
 *       {@code -sin^2(a) W x^4 / 60}, the published two-sample drift {@code a^2 W (W T)^4 / 960} with
 *       the update interval {@code T = 2h}.</li>
 * </ul>
 */
class ConingTest {

    static final double HALF_ANGLE = Math.toRadians(2.0);
    static final double FREQUENCY = 2.0 * Math.PI * 1.0;   // 1 Hz cone

    @Test
    void driftMatchesTheClosedFormWithAndWithoutCorrection() {
        // a non-rotating, all but massless Earth: no Earth rate, gravity 2.5e-14 m/s^2, so only the
        // body rotation is navigated (the vehicle stays at rest within 1e-10 m)
        EarthModel still = EarthModel.of(Ellipsoid.WGS84, 1.0, 0.0);
        LevelNavigator corrected = LevelNavigator.of(still, LocalAxes.NED);
        LevelNavigator uncorrected = corrected.without(NavigationTerm.CONING);
        double s2 = Math.sin(HALF_ANGLE) * Math.sin(HALF_ANGLE);
        for (int rate : new int[] {50, 100, 200}) {
            double h = 1.0 / rate;
            double x = FREQUENCY * h;
            double expectedU = -0.5 * s2 * FREQUENCY * (1.0 - Math.sin(x) / x);
            double expectedC = -(s2 / h) * (0.5 * (x - Math.sin(x)) - (2.0 * Math.sin(x) - Math.sin(2.0 * x)) / 12.0);
            // the difference of a 40-period and a 20-period run: the first step, which has no
            // previous increment and so no coning term, drops out
            double u = (40 * drift(uncorrected, rate, 40) - 20 * drift(uncorrected, rate, 20)) / 20;
            double c = (40 * drift(corrected, rate, 40) - 20 * drift(corrected, rate, 20)) / 20;
            System.out.printf(Locale.ROOT, "coning %d Hz: uncorrected %.4e rad/s (closed form %.4e), "
                    + "corrected %.4e rad/s (closed form %.4e)%n", rate, u, expectedU, c, expectedC);
            // 1 %: the closed forms drop terms of relative order a^2 = 1.2e-3 and the cone axis
            // and body x differ by up to a (projection cos a), far inside 1 %
            assertEquals(expectedU, u, 0.01 * Math.abs(expectedU), "uncorrected at " + rate + " Hz");
            assertEquals(expectedC, c, 0.01 * Math.abs(expectedC), "corrected at " + rate + " Hz");
        }
    }

    /** Drift rate about x (rad/s) over a whole number of cone periods. */
    static double drift(LevelNavigator nav, int rate, int periods) {
        double h = 1.0 / rate;
        int n = periods * rate;   // the cone has a 1 s period
        double a = HALF_ANGLE;
        double sa = Math.sin(a);
        double wx = -2.0 * FREQUENCY * Math.sin(0.5 * a) * Math.sin(0.5 * a);
        double[] ends = new double[n];
        double[] dv = new double[3 * n];
        double[] da = new double[3 * n];
        for (int k = 0; k < n; k++) {
            double t0 = k * h;
            double t1 = (k + 1) * h;
            ends[k] = t1;
            da[3 * k] = wx * h;
            da[3 * k + 1] = sa * (Math.cos(FREQUENCY * t1) - Math.cos(FREQUENCY * t0));
            da[3 * k + 2] = sa * (Math.sin(FREQUENCY * t1) - Math.sin(FREQUENCY * t0));
        }
        NavigationState start = NavigationState.of(0.0, LatLonHeight.ofDegrees(47.3, 8.6, 450.0), Vector3D.ZERO,
                LocalAxes.NED, Orientations.fromQuaternion(Math.cos(0.5 * a), 0.0, Math.sin(0.5 * a), 0.0));
        NavigationState end = nav.run(start, ends, dv, da);
        double t = ends[n - 1];
        double c = Math.cos(FREQUENCY * t);
        double s = Math.sin(FREQUENCY * t);
        double[] qt = {Math.cos(0.5 * a), 0.0, Math.sin(0.5 * a) * c, Math.sin(0.5 * a) * s};
        double[] qc = Orientations.toQuaternion(end.attitude());
        // error rotation in body axes: qt* (x) qc; small, so its vector part is half the rotation vector
        double ex = qt[0] * qc[1] - qt[1] * qc[0] - qt[2] * qc[3] + qt[3] * qc[2];
        double e0 = qt[0] * qc[0] + qt[1] * qc[1] + qt[2] * qc[2] + qt[3] * qc[3];
        return 2.0 * ex / e0 / t;
    }
}
