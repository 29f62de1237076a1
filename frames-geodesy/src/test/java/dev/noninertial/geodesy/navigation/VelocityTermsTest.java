package dev.noninertial.geodesy.navigation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * The velocity equation's terms of one step (issue 13) against (a) a direct evaluation with the
 * library's frames at the step's midpoint (the same point seen from the Earth-fixed and inertial
 * frames: Earth rate, transport rate, velocity and acceleration of the carried level frame) and
 * (b) the textbook formulas of REFERENCES.md, "Inertial navigation": Earth rate in NED
 * {@code (w cos lat, 0, -w sin lat)}, transport rate {@code (vE/(RN+h), -vN/(RM+h), -vE tan(lat)/(RN+h))},
 * the radii {@code RM = a(1-e^2)/(1-e^2 sin^2 lat)^1.5}, {@code RN = a/sqrt(1-e^2 sin^2 lat)}, the
 * velocity equation {@code dv/dt = C f - (2 w_ie + w_en) x v + g} (Titterton and Weston Eq. 3.71;
 * Groves Eq. 5.54), and normal gravity by Somigliana with the height series (TR8350.2 Eq. 4-1, 4-3).
 */
class VelocityTermsTest {

    static final double STEP = 0.01;

    @Test
    void termsAgreeWithTheFramesAndTheTextbook() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T09:00:00Z"));
        ReferenceFrame level = earth.carriedLevel("level", ManeuverTrack.path(), LocalAxes.NED);
        ReferenceFrame body = earth.body("vehicle", level, ManeuverTrack.attitude(), LocalAxes.NED);
        LevelNavigator nav = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED);
        for (double t : new double[] {37.3, 211.9, 455.55}) {
            FrameIncrements inc = FrameIncrements.of(earth, body, t, STEP, 1);
            // one step from the truth at t - h, so that the state carries the previous increments
            // (the first step after a state without history has no sculling term)
            FrameIncrements before = FrameIncrements.of(earth, body, t - STEP, STEP, 1);
            NavigationState state = nav.advance(Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), t - STEP),
                    t, vector(before.deltaVelocity), vector(before.deltaAngle));
            assertTrue(state.hasHistory());
            StepTerms terms = nav.terms(state, t + STEP, vector(inc.deltaVelocity), vector(inc.deltaAngle));
            double tm = t + 0.5 * STEP;

            // (a) the frames at the midpoint
            Placement le = level.placementIn(earth.earthFixed(), tm);
            Vector3D v = le.vectorFromBase(le.originVelocity());
            Vector3D earthRate = le.vectorFromBase(earth.earthFixed().placementIn(earth.inertial(), tm).angularVelocity());
            Vector3D transport = le.angularVelocity();
            Vector3D wEcef = earth.earthFixed().placementIn(earth.inertial(), tm).angularVelocity();
            Vector3D centrifugal = le.vectorFromBase(Vector3D.crossProduct(wEcef,
                    Vector3D.crossProduct(wEcef, le.origin())).negate());
            Vector3D gravitation = earth.gravitationIn(level).at(tm, PointState.stationary(Vector3D.ZERO));
            Placement li = level.placementIn(earth.inertial(), tm);
            Vector3D specificForce = li.vectorFromBase(li.originAcceleration()).subtract(gravitation);
            // Coriolis ~1e-2 m/s^2: the midpoint is predicted from the start state, its velocity to
            // about 1e-6 m/s (second order in the step), so 1e-9 m/s^2 (relative 1e-7)
            close(Vector3D.crossProduct(earthRate, v).scalarMultiply(-2.0), terms.coriolis(), 1e-9, "Coriolis vs frames");
            close(Vector3D.crossProduct(transport, v).negate(), terms.transportRateTerm(), 1e-9, "transport vs frames");
            // gravity: the predicted midpoint height is good to 1e-7 m (gradient 3e-6 /s^2)
            close(gravitation.add(centrifugal), terms.gravity(), 1e-9, "gravity vs frames");
            // specific force: the step's mean against the midpoint value, second order in the
            // step: h^2/24 |f''| with |f''| below 1e-2 m/s^4 on this track, so 1e-6 m/s^2
            close(specificForce, terms.specificForce(), 1e-6, "specific force vs frames");
            // the whole equation: the terms sum to the mean dv/dt of the true track over the step
            NavigationState after = Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), t + STEP);
            Vector3D meanRate = after.velocity().subtract(Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), t)
                    .velocity()).scalarMultiply(1.0 / STEP);
            close(meanRate, terms.velocityRate(), 1e-6, "sum of terms vs the track's dv/dt");

            // (b) the textbook formulas at the true midpoint
            NavigationState mid = Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), tm);
            LatLonHeight p = mid.position();
            double w = 7.292115e-5;                 // TR8350.2 Table 3.1
            double a = 6378137.0;                   // same
            double e2 = 6.69437999014e-3;           // TR8350.2 Table 3.3
            double s = Math.sin(p.latitude());
            double rm = a * (1 - e2) / Math.pow(1 - e2 * s * s, 1.5) + p.height();
            double rn = a / Math.sqrt(1 - e2 * s * s) + p.height();
            Vector3D vm = mid.velocity();
            Vector3D wie = new Vector3D(w * Math.cos(p.latitude()), 0, -w * s);
            Vector3D wen = new Vector3D(vm.getY() / rn, -vm.getX() / rm, -vm.getY() * Math.tan(p.latitude()) / rn);
            close(Vector3D.crossProduct(wie, vm).scalarMultiply(-2.0), terms.coriolis(), 1e-9, "Coriolis vs textbook");
            close(Vector3D.crossProduct(wen, vm).negate(), terms.transportRateTerm(), 1e-9, "transport vs textbook");
            close(wie.scalarMultiply(STEP), terms.earthRateAngle(), 1e-14, "Earth rate angle vs textbook");
            close(wen.scalarMultiply(STEP), terms.transportRateAngle(), 1e-14, "transport angle vs textbook");
            // Somigliana with the height series along the normal: the series is good to 1e-7 m/s^2
            // at 1 km (TR8350.2; EarthModel's measured figure); the exact field also tilts off the
            // normal with height, by about 1e-6 rad per km (so 1e-5 m/s^2 sideways at 1 km)
            double ge = 9.7803253359;               // TR8350.2 Table 3.4
            double k = 0.00193185265241;             // same
            double f = 1 / 298.257223563;
            double m = 0.00344978650684;
            double h = p.height();
            double g0 = ge * (1 + k * s * s) / Math.sqrt(1 - e2 * s * s);
            double gh = g0 * (1 - 2 / a * (1 + f + m - 2 * f * s * s) * h + 3 * h * h / (a * a));
            assertEquals(gh, terms.gravity().getZ(), 2e-7, "down gravity vs Somigliana + height series");
            assertTrue(Math.hypot(terms.gravity().getX(), terms.gravity().getY()) < 1e-5 * Math.max(1.0, h / 1000),
                    "horizontal gravity " + terms.gravity());
        }
    }

    @Test
    void enuTermsAreTheNedTermsReordered() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T09:00:00Z"));
        ReferenceFrame level = earth.carriedLevel("level", ManeuverTrack.path(), LocalAxes.NED);
        ReferenceFrame body = earth.body("vehicle", level, ManeuverTrack.attitude(), LocalAxes.NED);
        double t = 100.0;
        FrameIncrements inc = FrameIncrements.of(earth, body, t, STEP, 1);
        NavigationState ned = Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), t);
        Vector3D v = ned.velocity();
        NavigationState enu = NavigationState.of(t, ned.position(), new Vector3D(v.getY(), v.getX(), -v.getZ()),
                LocalAxes.ENU, AtRestTest.enu(ned.attitude()));
        StepTerms a = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED).terms(ned, t + STEP, vector(inc.deltaVelocity),
                vector(inc.deltaAngle));
        StepTerms b = LevelNavigator.of(EarthModel.WGS84, LocalAxes.ENU).terms(enu, t + STEP, vector(inc.deltaVelocity),
                vector(inc.deltaAngle));
        // permutation (N, E, D) -> (E, N, U): exact up to the rounding of the axis conversion
        close(swap(a.specificForce()), b.specificForce(), 1e-12, "specific force");
        close(swap(a.coriolis()), b.coriolis(), 1e-15, "Coriolis");
        close(swap(a.gravity()), b.gravity(), 1e-12, "gravity");
        close(a.coning(), b.coning(), 0.0, "coning (body axes)");
    }

    static Vector3D swap(Vector3D ned) {
        return new Vector3D(ned.getY(), ned.getX(), -ned.getZ());
    }

    static Vector3D vector(double[] a) {
        return new Vector3D(a[0], a[1], a[2]);
    }

    static void close(Vector3D expected, Vector3D actual, double tolerance, String what) {
        assertTrue(expected.distance(actual) <= tolerance,
                what + ": expected " + expected + ", got " + actual + ", distance " + expected.distance(actual));
    }
}
