package dev.noninertial.geodesy.air;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * The Earth-tree helpers that make a drop or a shot a few lines: the geodetic position of any
 * framed state (against the IOGP worked example), and the non-rotating twin Earth whose
 * difference to the rotating one is the rotation's effect (against the textbook eastward
 * deflection of a dropped body).
 */
class EarthAirCaseTest {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-04-02T18:30:00Z"));

    @Test
    void geodeticOfAnyFramedStateMatchesTheIogpExample() {
        // IOGP 373-7-2 geographic/geocentric example, WGS84 (REFERENCES.md, Geodetic conversions)
        Vector3D x = new Vector3D(3771793.968, 140253.342, 5124304.349);
        double lat = Math.toRadians(53 + 48 / 60.0 + 33.820 / 3600.0);
        double lon = Math.toRadians(2 + 7 / 60.0 + 46.380 / 3600.0);
        ReferenceFrame eci = EARTH.inertial();
        ReferenceFrame ned = EARTH.localLevel(LatLonHeight.ofDegrees(50.0, 1.0, 10.0), LocalAxes.NED);
        for (double t : new double[] {0.0, 777.7, 40000.0}) {
            FramedState inEcef = EARTH.earthFixed().stateAt(t, PointState.stationary(x));
            for (FramedState s : new FramedState[] {inEcef, inEcef.in(eci), inEcef.in(ned)}) {
                LatLonHeight g = EARTH.geodeticOf(s);
                // the example is given to 0.001" (3e-8 rad half unit ~ 1.5 mm) and 1 mm in height;
                // frame conversions of 6.4e6 m coordinates add ~1e-9 m
                assertEquals(lat, g.latitude(), 0.0005 / 3600 * Math.PI / 180 + 1e-12, s.frame().path());
                assertEquals(lon, g.longitude(), 0.0005 / 3600 * Math.PI / 180 + 1e-12, s.frame().path());
                assertEquals(73.0, g.height(), 0.001, s.frame().path());
            }
        }
        EarthFrames other = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-04-02T18:30:00Z"));
        assertThrows(IllegalArgumentException.class,
                () -> other.geodeticOf(EARTH.earthFixed().stateAt(0.0, PointState.stationary(x))));
    }

    @Test
    void rotationsEffectOnADropIsTheEastwardDeflection() {
        LatLonHeight site = LatLonHeight.ofDegrees(45.0, 12.0, 0.0);
        double h = 500.0;
        LatLonHeight rotating = landing(EARTH, site, h);
        EarthFrames still = EARTH.withoutRotation();
        assertFalse(still.isRotating());
        assertEquals(EARTH.rotationAngle(0.0), still.rotationAngle(3600.0), 0.0);
        LatLonHeight fixed = landing(still, site, h);
        // east difference of the two landing points, metres along the parallel
        double rn = EARTH.model().ellipsoid().primeVerticalRadius(site.latitude());
        double east = (rotating.longitude() - fixed.longitude()) * rn * Math.cos(site.latitude());
        // textbook: (1/3) w g t^3 cos(lat), t = sqrt(2 h / g) (REFERENCES.md, Analytic results of
        // mechanics); g normal gravity at the site (TR8350.2 Somigliana). The first-order formula
        // leaves out O(w t) ~ 1e-3 and the change of g over 500 m (1.6e-4): 1 % covers both
        double g = EARTH.model().normalGravity(site.withHeight(h / 2));
        double t = Math.sqrt(2 * h / g);
        double expected = 7.292115e-5 * g * t * t * t * Math.cos(site.latitude()) / 3.0;
        System.out.printf("MEASURED rotation's effect on a 500 m drop at 45 deg (rotating minus non-rotating Earth):"
                + " east %.6e m, textbook %.6e m, relative difference %.2e%n", east, expected, (east - expected) / expected);
        assertEquals(expected, east, 0.01 * expected);
    }

    private static LatLonHeight landing(EarthFrames earth, LatLonHeight site, double h) {
        ReferenceFrame enu = earth.localLevel(site, LocalAxes.ENU);
        FramedState end = TrajectorySolver.of(enu).plusForce(earth.gravitationIn(enu))
                .plusEvent(earth.groundImpactIn(enu, 0.0)).withTolerance(1e-12)
                .solve(PointState.stationary(new Vector3D(0, 0, h)), 0.0, 100.0).finalState();
        LatLonHeight g = earth.geodeticOf(end);
        assertTrue(Math.abs(g.height()) < 1e-6, "on the ground");
        return g;
    }
}
