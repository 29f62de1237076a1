package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;

/**
 * The traps of issue 11 stay closed: the heading sense of a body frame does not depend on the
 * parent's axis order, north and east speeds cannot be swapped silently, the poles are refused
 * alike, and a constant-rate attitude uses the rates it is given.
 */
class ApiTrapsTest {

    private static final EarthModel MODEL = EarthModel.WGS84;
    private static final EarthFrames EARTH = EarthFrames.of(MODEL, Instant.parse("2026-03-20T12:00:00Z"));
    private static final LatLonHeight SITE = LatLonHeight.ofDegrees(60.0, 5.0, 0.0);   // invented site

    @Test
    void headingMeansTheSameOverEnuAndNedParents() {
        // physical invariant: the same heading, pitch and roll over the two local-level frames of
        // one site give one body orientation and one angular velocity relative to the Earth
        AttitudeProfile turn = AttitudeProfile.constantRates(AttitudeSample.stationary(0.9, 0.05, -0.1)
                .withRates(0.02, 0.0, 0.004));
        ReferenceFrame overNed = EARTH.body("hull over NED", EARTH.localLevel("NED", SITE, LocalAxes.NED), turn,
                LocalAxes.NED);
        ReferenceFrame overEnu = EARTH.body("hull over ENU", EARTH.localLevel("ENU", SITE, LocalAxes.ENU), turn,
                LocalAxes.ENU);
        for (double t : new double[] {0.0, 12.5, 300.0}) {
            Placement a = overNed.placementIn(EARTH.earthFixed(), t);
            Placement b = overEnu.placementIn(EARTH.earthFixed(), t);
            // tolerance: rounding of two chains of three rotations, a few ulp of unit quantities
            assertEquals(0.0, Vector3D.angle(a.vectorToBase(Vector3D.PLUS_I), b.vectorToBase(Vector3D.PLUS_I)), 1e-14);
            assertEquals(0.0, Vector3D.angle(a.vectorToBase(Vector3D.PLUS_K), b.vectorToBase(Vector3D.PLUS_K)), 1e-14);
            assertEquals(0.0, a.angularVelocity().distance(b.angularVelocity()), 1e-17);
        }
        // heading 0 points the nose north over ENU too: body x is the ENU frame's y
        ReferenceFrame enu = EARTH.localLevel("ENU 2", SITE, LocalAxes.ENU);
        ReferenceFrame north = EARTH.body("nose north", enu, AttitudeProfile.stationary(0, 0, 0), LocalAxes.ENU);
        Vector3D nose = north.placementIn(enu, 0.0).vectorToBase(Vector3D.PLUS_I);
        assertEquals(0.0, nose.distance(Vector3D.PLUS_J), 1e-15);
    }

    @Test
    void eotvosTakesAVelocityInStatedAxes() {
        double v = 10 * 1852.0 / 3600.0;   // 10 kn, international knot (REFERENCES.md, Units)
        double east = MODEL.eotvosCorrection(SITE, new Vector3D(v, 0, 0), LocalAxes.ENU);
        assertEquals(east, MODEL.eotvosCorrection(SITE, new Vector3D(0, v, 0), LocalAxes.NED), 0.0);
        // due north only the centripetal term vN^2/(RM + h) is left (REFERENCES.md, Gravimetry;
        // radii in Inertial navigation): same arithmetic, so exact to rounding
        double north = MODEL.eotvosCorrection(SITE, new Vector3D(0, v, 0), LocalAxes.ENU);
        assertEquals(v * v / Ellipsoid.WGS84.meridianRadius(SITE.latitude()), north, 1e-20);
        // the swap the old (position, north, east) order allowed changes the answer ninetyfold
        assertTrue(east > 90 * north, east + " vs " + north);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MODEL.eotvosCorrection(SITE, new Vector3D(v, 0, 1), LocalAxes.ENU));
        assertTrue(e.getMessage().contains("groundVelocity"), e.getMessage());
    }

    @Test
    void eotvosAndTransportRateRefuseThePolesAlike() {
        LatLonHeight pole = LatLonHeight.ofDegrees(90.0, 0.0, 0.0);
        IllegalArgumentException a = assertThrows(IllegalArgumentException.class,
                () -> MODEL.eotvosCorrection(pole, new Vector3D(1, 0, 0), LocalAxes.ENU));
        IllegalArgumentException b = assertThrows(IllegalArgumentException.class,
                () -> MODEL.transportRate(pole, new Vector3D(1, 0, 0), LocalAxes.ENU));
        assertEquals(a.getMessage(), b.getMessage());
        assertThrows(IllegalArgumentException.class, () -> GeodeticPath.steadyCourse(Ellipsoid.WGS84, SITE,
                new Vector3D(1, 0, 0.5), LocalAxes.NED));
    }

    @Test
    void constantRatesUsesTheStartSampleRates() {
        AttitudeProfile p = AttitudeProfile.constantRates(AttitudeSample.stationary(0.1, 0.2, 0.3)
                .withRates(0.01, -0.02, 0.03));
        AttitudeSample at10 = p.at(10.0);
        // heading(t) = h0 + rate t, exact binary arithmetic to rounding
        assertEquals(0.1 + 0.01 * 10.0, at10.heading(), 0.0);
        assertEquals(0.2 - 0.02 * 10.0, at10.pitch(), 0.0);
        assertEquals(0.3 + 0.03 * 10.0, at10.roll(), 0.0);
        assertEquals(-0.02, at10.pitchRate(), 0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> AttitudeProfile.constantRates(new AttitudeSample(0, 0, 0, 0, 0, 0, 0.1, 0, 0)));
        assertTrue(e.getMessage().contains("start"), e.getMessage());
    }
}
