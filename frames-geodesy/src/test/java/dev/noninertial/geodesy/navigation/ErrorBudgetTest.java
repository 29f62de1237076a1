package dev.noninertial.geodesy.navigation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.geodesy.AttitudeProfile;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.GeodeticPath;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * The error budget (issue 13) on a run whose omissions have textbook answers: a level vehicle
 * running due east at 100 m/s at 47.3 deg N and constant height for 60 s, 100 Hz increments from
 * the library's frames. Over 60 s the Schuler loop (84 min period) and the vertical channel
 * (time constant about 800 s) change a constant acceleration error's effect ({@code e T^2 / 2})
 * by less than 0.3 %.
 */
class ErrorBudgetTest {

    static final LatLonHeight START = LatLonHeight.ofDegrees(47.3, 8.6, 450.0);   // invented
    static final double SPEED = 100.0;
    static final double T = 60.0;

    @Test
    void eachOmissionCostsWhatTheTextbookSays() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T09:00:00Z"));
        GeodeticPath path = GeodeticPath.steadyCourse(Ellipsoid.WGS84, START, new Vector3D(0, SPEED, 0), LocalAxes.NED);
        AttitudeProfile attitude = AttitudeProfile.stationary(0.5 * Math.PI, 0.0, 0.0);
        ReferenceFrame level = earth.carriedLevel("level", path, LocalAxes.NED);
        ReferenceFrame body = earth.body("vehicle", level, attitude, LocalAxes.NED);
        FrameIncrements inc = FrameIncrements.of(earth, body, 0.0, 0.01, (int) (T * 100));
        LevelNavigator nav = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED);
        NavigationState start = Truth.at(path, attitude, 0.0);
        ErrorBudget budget = ErrorBudget.of(nav, start, inc.ends, inc.deltaVelocity, inc.deltaAngle);
        System.out.println(budget);

        // the reference run is the navigator's own run, bit for bit
        NavigationState direct = nav.run(start, inc.ends, inc.deltaVelocity, inc.deltaAngle);
        assertEquals(0.0, Truth.positionError(direct, budget.reference()), 0.0);

        double w = EarthModel.WGS84.rotationRate();
        double lat = START.latitude();
        double rn = Ellipsoid.WGS84.primeVerticalRadius(lat) + START.height();
        // Earth rate left out of the attitude update: the level frame's turn with the Earth,
        // |w_ie| T (REFERENCES.md, Earth rate in NED), is missed
        assertEquals(w * T, budget.effect(NavigationTerm.EARTH_RATE).attitudeAtEnd(), 0.01 * w * T, "Earth rate");
        // transport rate left out: the frame's turn over the curved Earth, |w_en| T with
        // w_en = (vE/(RN+h), 0, -vE tan(lat)/(RN+h)) (REFERENCES.md), is missed
        double transport = SPEED / rn / Math.cos(lat) * T;
        assertEquals(transport, budget.effect(NavigationTerm.TRANSPORT_RATE).attitudeAtEnd(), 0.01 * transport,
                "transport rate");
        // Coriolis left out: -2 w_ie x v for v due east is 2 w vE sin(lat) southward and
        // 2 w vE cos(lat) upward (REFERENCES.md, velocity equation), each costing e T^2 / 2
        ErrorBudget.TermEffect coriolis = budget.effect(NavigationTerm.CORIOLIS);
        double horizontal = w * SPEED * Math.sin(lat) * T * T;
        double vertical = w * SPEED * Math.cos(lat) * T * T;
        assertEquals(horizontal, coriolis.horizontalAtEnd(), 0.01 * horizontal, "Coriolis horizontal");
        assertEquals(-vertical, coriolis.verticalAtEnd(), 0.01 * vertical, "Coriolis vertical (left out: lower)");
        // gravity's height dependence at the reference height (the start, and the run keeps its
        // height to the nanometre): no effect, up to rounding
        assertTrue(budget.effect(NavigationTerm.GRAVITY_HEIGHT).peakPosition() < 1e-6, budget.toString());
        // a level, steady body has no coning and almost no sculling: they can be dropped here
        assertTrue(budget.effect(NavigationTerm.CONING).peakAttitude() < 1e-12, budget.toString());
        assertTrue(budget.effect(NavigationTerm.SCULLING).peakPosition() < 1e-6, budget.toString());
        // no accelerometer offsets: the size-effect row is exactly zero
        assertEquals(0.0, budget.effect(NavigationTerm.SIZE_EFFECT).peakPosition(), 0.0);
    }
}
