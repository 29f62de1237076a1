package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

class EarthFramesTest {

    private static final EarthModel MODEL = EarthModel.WGS84;
    private static final Instant EPOCH = Instant.parse("2026-03-20T12:00:00Z");
    private static final EarthFrames EARTH = EarthFrames.of(MODEL, EPOCH);
    private static final double W = MODEL.rotationRate();

    // ------------------------------------------------------------------ finite-difference helpers

    /** Five-point central difference weights at t - 2h, t - h, t + h, t + 2h (error ~ h^4 f^(5) / 30). */
    private static final double[] STENCIL = {1.0 / 12, -8.0 / 12, 8.0 / 12, -1.0 / 12};
    private static final double[] OFFSETS = {-2, -1, 1, 2};

    /** Angular velocity of F in B, in F axes, from differences of the orientation: dR/dt = -[w]x R. */
    static Vector3D angularVelocityByDifferences(ReferenceFrame f, ReferenceFrame b, double t, double h) {
        double[][] rdot = new double[3][3];
        for (int s = 0; s < 4; s++) {
            double[][] m = f.placementIn(b, t + OFFSETS[s] * h).orientationMatrix();
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    rdot[i][j] += STENCIL[s] * m[i][j] / h;
                }
            }
        }
        double[][] r = f.placementIn(b, t).orientationMatrix();
        double[][] omega = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double sum = 0;
                for (int k = 0; k < 3; k++) {
                    sum += rdot[i][k] * r[j][k];
                }
                omega[i][j] = -sum;
            }
        }
        return new Vector3D(0.5 * (omega[2][1] - omega[1][2]), 0.5 * (omega[0][2] - omega[2][0]),
                0.5 * (omega[1][0] - omega[0][1]));
    }

    static Vector3D differentiate(java.util.function.DoubleFunction<Vector3D> g, double t, double h) {
        Vector3D sum = Vector3D.ZERO;
        for (int s = 0; s < 4; s++) {
            sum = sum.add(STENCIL[s] / h, g.apply(t + OFFSETS[s] * h));
        }
        return sum;
    }

    private static void assertVectorEquals(Vector3D expected, Vector3D actual, double tolerance, String what) {
        double d = expected.distance(actual);
        assertTrue(d <= tolerance, what + ": expected " + expected + " got " + actual + " (difference " + d + ")");
    }

    /** Checks w, al, o' and o'' of F in B against five-point differences of the sampled placements. */
    private static void checkByDifferences(ReferenceFrame f, ReferenceFrame b, double t, double h,
                                           double omegaTol, double alphaTol, double velTol, double accTol) {
        Placement p = f.placementIn(b, t);
        assertVectorEquals(angularVelocityByDifferences(f, b, t, h), p.angularVelocity(), omegaTol,
                f.name() + " angular velocity in " + b.name());
        assertVectorEquals(differentiate(x -> f.placementIn(b, x).angularVelocity(), t, h), p.angularAcceleration(),
                alphaTol, f.name() + " angular acceleration in " + b.name());
        assertVectorEquals(differentiate(x -> f.placementIn(b, x).origin(), t, h), p.originVelocity(), velTol,
                f.name() + " origin velocity in " + b.name());
        assertVectorEquals(differentiate(x -> f.placementIn(b, x).originVelocity(), t, h), p.originAcceleration(),
                accTol, f.name() + " origin acceleration in " + b.name());
    }

    // ------------------------------------------------------------------ Earth-fixed and local frames

    @Test
    void earthFixedSpinsAtTheModelRateFromTheEpochAngle() {
        // decision of the design: angle = ERA(epoch) + w t (IERS TN 36 Eq. 5.15 for ERA)
        // sources: REFERENCES.md, Earth rotation
        double t = 3600.0;
        Placement p = EARTH.earthFixed().placementIn(EARTH.inertial(), t);
        double angle = EarthRotationAngle.at(EPOCH) + W * t;
        // the inertial x axis seen in Earth-fixed axes is turned by -angle
        Vector3D xSeen = p.vectorFromBase(Vector3D.PLUS_I);
        assertEquals(Math.cos(angle), xSeen.getX(), 1e-14);
        assertEquals(-Math.sin(angle), xSeen.getY(), 1e-14);
        assertVectorEquals(new Vector3D(0, 0, W), p.angularVelocity(), 0.0, "earth rate");
        assertEquals(angle, EARTH.rotationAngle(t), 0.0);
        assertTrue(EARTH.toString().contains("2026-03-20"));
    }

    @Test
    void localLevelFrameSitsOnTheSiteWithNamedAxes() {
        // ENU rows (e, n, u) and NED rows (n, e, -u) (REFERENCES.md, Inertial navigation; the
        // section number is from memory, so the axes are also recomputed below by finite
        // differences: north and east are the directions in which toCartesian moves when the
        // latitude and the longitude grow)
        LatLonHeight site = LatLonHeight.ofDegrees(-33.9, 151.2, 58.0);   // invented site "Quarry Hill"
        ReferenceFrame enu = EARTH.localLevel("Quarry Hill ENU", site, LocalAxes.ENU);
        ReferenceFrame ned = EARTH.localLevel(site, LocalAxes.NED);
        Placement pe = enu.placementIn(EARTH.earthFixed(), 0);
        assertVectorEquals(Ellipsoid.WGS84.toCartesian(site), pe.origin(), 1e-9, "origin");
        Vector3D up = Ellipsoid.WGS84.normal(site);
        assertVectorEquals(new Vector3D(0, 0, 1), pe.vectorFromBase(up), 1e-15, "up in ENU");
        assertVectorEquals(new Vector3D(0, 0, -1), ned.placementIn(EARTH.earthFixed(), 0).vectorFromBase(up), 1e-15,
                "up in NED");
        // independent recomputation: central differences of toCartesian, step 1e-7 rad (truncation
        // ~ h^2/6 of the curvature, 2e-15 relative; rounding ~ ulp(6.4e6 m)/(6.4e6 m * 1e-7) ~ 1e-9)
        double h = 1e-7;
        Vector3D dLat = Ellipsoid.WGS84.toCartesian(LatLonHeight.of(site.latitude() + h, site.longitude(), 58.0))
                .subtract(Ellipsoid.WGS84.toCartesian(LatLonHeight.of(site.latitude() - h, site.longitude(), 58.0)));
        Vector3D dLon = Ellipsoid.WGS84.toCartesian(LatLonHeight.of(site.latitude(), site.longitude() + h, 58.0))
                .subtract(Ellipsoid.WGS84.toCartesian(LatLonHeight.of(site.latitude(), site.longitude() - h, 58.0)));
        assertVectorEquals(new Vector3D(0, 1, 0), pe.vectorFromBase(dLat.normalize()), 1e-8, "north in ENU");
        assertVectorEquals(new Vector3D(1, 0, 0), pe.vectorFromBase(dLon.normalize()), 1e-8, "east in ENU");
        Placement pn = ned.placementIn(EARTH.earthFixed(), 0);
        assertVectorEquals(new Vector3D(1, 0, 0), pn.vectorFromBase(dLat.normalize()), 1e-8, "north in NED");
        assertVectorEquals(new Vector3D(0, 1, 0), pn.vectorFromBase(dLon.normalize()), 1e-8, "east in NED");
        // north points to the pole: the z axis of ECEF has positive north component cos(lat)
        Vector3D zInEnu = pe.vectorFromBase(Vector3D.PLUS_K);
        assertEquals(Math.cos(site.latitude()), zInEnu.getY(), 1e-15);
        assertEquals(Math.sin(site.latitude()), zInEnu.getZ(), 1e-15);
        // relative to inertial space: Earth rate in local axes, ENU (0, w cos lat, w sin lat) (REFERENCES.md, Inertial navigation)
        assertVectorEquals(MODEL.earthRateIn(site.latitude(), LocalAxes.ENU),
                enu.placementIn(EARTH.inertial(), 100.0).angularVelocity(), 1e-19, "earth rate ENU");
        // Titterton and Weston: Earth rate in NED (w cos lat, 0, -w sin lat)
        // sources: REFERENCES.md, Inertial navigation
        assertVectorEquals(new Vector3D(W * Math.cos(site.latitude()), 0, -W * Math.sin(site.latitude())),
                ned.placementIn(EARTH.inertial(), 100.0).angularVelocity(), 1e-19, "earth rate NED");
        assertEquals(2 * W * Math.sin(site.latitude()), MODEL.coriolisParameter(site.latitude()), 1e-20);
    }

    @Test
    void engineCoriolisAndCentrifugalInEarthFixedEqualClosedForms() {
        // Landau and Lifshitz, Mechanics, sec. 39: -2 w x v and -w x (w x r) for uniform rotation
        // sources: REFERENCES.md, Analytic results of mechanics
        Vector3D r = new Vector3D(4.1e6, -2.2e6, 4.3e6);
        Vector3D v = new Vector3D(120.0, 35.0, -80.0);
        FictitiousAccelerations f = EARTH.earthFixed().placementIn(EARTH.inertial(), 777.0)
                .fictitious(PointState.of(r, v));
        assertVectorEquals(MODEL.centrifugal(r), f.centrifugal(), 1e-17, "centrifugal");
        assertVectorEquals(MODEL.coriolis(v), f.coriolis(), 1e-18, "coriolis");
        assertEquals(0.0, f.euler().getNorm(), 0.0);
        assertEquals(0.0, f.frameAcceleration().getNorm(), 0.0);
    }

    @Test
    void pointHeldAgainstNormalGravityStaysAtRestInEarthFixed() {
        // DESIGN.md pitfall test: reaction = -gravity, real forces = reaction + gravitation; the
        // engine adds the centrifugal term; the sum must vanish (physical invariant: equilibrium)
        for (double deg : new double[] {0, 23, 49, 71, 90}) {
            Vector3D r = Ellipsoid.WGS84.toCartesian(LatLonHeight.ofDegrees(deg, 8.0, 0.0));
            Vector3D reaction = MODEL.normalGravityVector(r).negate();
            Vector3D specific = reaction.add(MODEL.gravitation(r));
            FictitiousAccelerations f = EARTH.earthFixed().placementIn(EARTH.inertial(), 12.0)
                    .fictitious(PointState.stationary(r));
            Vector3D seen = specific.add(f.total());
            // 1e-14 m/s^2: gravitation is the gradient of the gravitational potential alone (accurate
            // far away), normal gravity that of the full potential, so the two 9.8 m/s^2 vectors
            // are rounded independently: a few ulps of 9.8 (1.8e-15 each)
            assertTrue(seen.getNorm() < 1e-14, "lat " + deg + ": " + seen);
            // and passing gravity instead would leave the centrifugal term uncompensated
            Vector3D wrong = reaction.add(MODEL.normalGravityVector(r)).add(f.total());
            if (deg < 90) {
                assertTrue(wrong.getNorm() > 1e-3, "lat " + deg);
            }
        }
    }

    // ------------------------------------------------------------------ carried frames

    @Test
    void carriedFrameRatesMatchFiniteDifferencesAndTransportRate() {
        LatLonHeight start = LatLonHeight.ofDegrees(58.0, -4.0, 30.0);
        double vn = 8.0;
        double ve = -5.0;
        GeodeticPath path = GeodeticPath.steadyCourse(Ellipsoid.WGS84, start, new Vector3D(vn, ve, 0), LocalAxes.NED);
        for (LocalAxes axes : LocalAxes.values()) {
            ReferenceFrame level = EARTH.carriedLevel("research vessel Larkspur Tern", path, axes);
            double t = 5400.0;
            // five-point differences, step 1 s: truncation ~ h^4 f^(5)/30 (below 1e-13 of the values);
            // rounding ~ 2 ulp / h: 1e-16 rad/s on orientations, ~5e-9 m/s on positions of 6.4e6 m
            checkByDifferences(level, EARTH.earthFixed(), t, 1.0, 1e-15, 1e-19, 1e-8, 1e-9);
            checkByDifferences(level, EARTH.inertial(), t, 1.0, 1e-15, 1e-17, 1e-8, 1e-9);
            // closed forms (REFERENCES.md, Inertial navigation): transport rate, then Earth rate + transport
            LatLonHeight here = path.at(t).position();
            Vector3D transport = MODEL.transportRate(here,
                    axes == LocalAxes.ENU ? new Vector3D(ve, vn, 0) : new Vector3D(vn, ve, 0), axes);
            assertVectorEquals(transport, level.placementIn(EARTH.earthFixed(), t).angularVelocity(), 1e-20,
                    "transport rate " + axes);
            assertVectorEquals(transport.add(MODEL.earthRateIn(here.latitude(), axes)),
                    level.placementIn(EARTH.inertial(), t).angularVelocity(), 1e-19, "inertial rate " + axes);
            // the speed over ground really is (vN, vE): origin velocity seen from Earth-fixed, in local axes
            Placement p = level.placementIn(EARTH.earthFixed(), t);
            Vector3D local = p.vectorFromBase(p.originVelocity());
            Vector3D expected = axes == LocalAxes.ENU ? new Vector3D(ve, vn, 0) : new Vector3D(vn, ve, 0);
            assertVectorEquals(expected, local, 1e-12, "ground velocity " + axes);
        }
        // the latitude really grows by the meridian arc: after 5400 s at 8 m/s, 43.2 km of arc;
        // the arc from the path and from finite differences of toCartesian agree
        double lat = path.at(5400.0).latitude();
        double arc = 0;
        int steps = 20000;
        for (int i = 0; i < steps; i++) {
            double a0 = start.latitude() + (lat - start.latitude()) * i / steps;
            double a1 = start.latitude() + (lat - start.latitude()) * (i + 1) / steps;
            arc += Ellipsoid.WGS84.toCartesian(LatLonHeight.of(a0, 0, 30.0))
                    .distance(Ellipsoid.WGS84.toCartesian(LatLonHeight.of(a1, 0, 30.0)));
        }
        // chord sum with 20000 chords of 2 m: under-estimate ~ L (d/R)^2/24 ~ 1e-14 m; rounding ~1e-6 m
        assertEquals(8.0 * 5400.0, arc, 1e-5);
    }

    @Test
    void wavingPathAndBodyFrameMatchFiniteDifferences() {
        // a path with non-zero second derivatives of all three coordinates (a ship heaving and weaving)
        double lat0 = Math.toRadians(44.0);
        double lon0 = Math.toRadians(12.0);
        GeodeticPath weave = t -> new PathSample(
                lat0 + 1e-6 * Math.sin(0.05 * t) + 2e-7 * t, lon0 + 3e-6 * Math.cos(0.03 * t), 2.0 * Math.sin(0.4 * t),
                5e-8 * Math.cos(0.05 * t) + 2e-7, -9e-8 * Math.sin(0.03 * t), 0.8 * Math.cos(0.4 * t),
                -2.5e-9 * Math.sin(0.05 * t), -2.7e-9 * Math.cos(0.03 * t), -0.32 * Math.sin(0.4 * t));
        ReferenceFrame level = EARTH.carriedLevel("tender Pell Marrow", weave, LocalAxes.NED);
        double t = 37.0;
        checkByDifferences(level, EARTH.earthFixed(), t, 1e-3, 1e-12, 1e-12, 1e-6, 1e-6);
        // attitude: heading, pitch and roll all oscillating (ship motion)
        AttitudeProfile sway = s -> new AttitudeSample(
                0.7 + 0.1 * Math.sin(0.2 * s), 0.05 * Math.sin(0.5 * s + 1), 0.2 * Math.sin(0.3 * s),
                0.02 * Math.cos(0.2 * s), 0.025 * Math.cos(0.5 * s + 1), 0.06 * Math.cos(0.3 * s),
                -0.004 * Math.sin(0.2 * s), -0.0125 * Math.sin(0.5 * s + 1), -0.018 * Math.sin(0.3 * s));
        ReferenceFrame body = EARTH.body("hull", level, sway, LocalAxes.NED);
        // step 1e-4 s: truncation ~ w''' h^2 ~ 1e-10, rounding ~ 1e-16 / 1e-4 = 1e-12
        checkByDifferences(body, level, t, 1e-4, 1e-10, 1e-9, 1e-9, 1e-9);
        checkByDifferences(body, EARTH.inertial(), t, 1e-4, 1e-10, 1e-9, 1e-5, 1e-5);
        // the z-y-x angular velocity formula at a simple point: pure heading rate gives w = rate along
        // the level frame's z, seen in body axes (-sin p, sin r cos p, cos r cos p) rate
        Placement still = AttitudeProfile.bodyPlacement(new AttitudeSample(0.3, 0.2, 0.1, 0.5, 0, 0, 0, 0, 0));
        assertVectorEquals(still.vectorFromBase(new Vector3D(0, 0, 0.5)), still.angularVelocity(), 1e-15, "yaw rate");
    }

    // ------------------------------------------------------------------ Eotvos

    @Test
    void eotvosFromTheEngineAgreesWithClosedForms() {
        // 10 kn due east at 60 deg N, sea level
        double knot = 1852.0 / 3600.0;
        double ve = 10 * knot;
        LatLonHeight start = LatLonHeight.ofDegrees(60.0, 5.0, 0.0);
        GeodeticPath run = GeodeticPath.steadyCourse(Ellipsoid.WGS84, start, new Vector3D(ve, 0, 0), LocalAxes.ENU);
        ReferenceFrame moving = EARTH.carriedLevel("gravimeter on launch Ossery", run, LocalAxes.ENU);
        double t = 600.0;
        ReferenceFrame still = EARTH.localLevel("gravimeter ashore", run.at(t).position(), LocalAxes.ENU);
        // vertical specific force of a point at each origin = up component of (a_inertial - gravitation);
        // gravitation is the same at the same point, so the difference is in a_inertial alone
        double upMoving = inertialUp(moving, t);
        double upStill = inertialUp(still, t);
        double engine = upStill - upMoving;
        // exact ellipsoidal closed form, 2 w vE cos(lat) + vE^2/(RN + h): same physics, rounding only
        assertEquals(MODEL.eotvosCorrection(start, new Vector3D(ve, 0, 0), LocalAxes.ENU), engine, 1e-12);
        // gravimetry rule of thumb (common practice): 7.503 V cos(lat) sin(heading) + 0.004154 V^2 mGal.
        // Tolerance 0.01 mGal: the rule uses one spherical radius (about 0.3 % off RN at 60 deg on the
        // 0.41 mGal term) and rounds 2 w to 7.503 (0.001 mGal here); measured difference 0.0027 mGal
        double rule = (7.503 * 10 * Math.cos(Math.toRadians(60)) * 1.0 + 0.004154 * 100) * 1e-5;
        assertEquals(rule, engine, 0.01e-5);
        assertEquals(37.93e-5, engine, 0.01e-5);   // REFERENCES.md, Gravimetry: about 37.93 mGal
    }

    private static double inertialUp(ReferenceFrame frame, double t) {
        Placement p = frame.placementIn(EARTH.inertial(), t);
        return p.vectorFromBase(p.originAcceleration()).getZ();
    }

    @Test
    void oneLineGivesAnEarthFixedFrameAndBadInputIsRefused() {
        ReferenceFrame ecef = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-03-20T12:00:00Z")).earthFixed();
        assertEquals("ECI/ECEF", ecef.path());
        assertThrows(NullPointerException.class, () -> EarthFrames.of(null, EPOCH));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> EarthFrames.of(MODEL, Instant.parse("1850-01-01T00:00:00Z")));
        assertTrue(e.getMessage().contains("1850"));
        GeodeticPath north = GeodeticPath.steadyCourse(Ellipsoid.WGS84, LatLonHeight.ofDegrees(89.0, 0, 0),
                new Vector3D(100, 0, 0), LocalAxes.NED);
        e = assertThrows(IllegalArgumentException.class, () -> north.at(3600.0));
        assertTrue(e.getMessage().contains("t = 3600"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> MODEL.transportRate(LatLonHeight.ofDegrees(90, 0, 0), new Vector3D(1, 1, 0), LocalAxes.NED));
        assertThrows(IllegalArgumentException.class, () -> new PathSample(Math.PI / 2, 0, 0, 0, 0, 0, 0, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> AttitudeSample.stationary(Double.NaN, 0, 0));
    }
}
