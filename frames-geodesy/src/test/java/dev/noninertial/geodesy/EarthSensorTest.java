package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.motion.SpinProfile;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.frames.sensing.InertialReading;
import dev.noninertial.frames.sensing.SensorIncrements;
import dev.noninertial.frames.units.Units;

/**
 * Ideal sensor readings on the spinning Earth against the textbook terms of inertial navigation
 * and gravimetry (REFERENCES.md, Earth models, Inertial navigation, Gravimetry), computed here
 * independently of the library's frames.
 */
class EarthSensorTest {

    /** WGS84 constants, REFERENCES.md, Earth models (TR8350.2 Tables 3.1, 3.3, 3.4). */
    private static final double A = 6378137.0;
    private static final double E2 = 6.69437999014e-3;
    private static final double W = 7.292115e-5;
    private static final double GAMMA_E = 9.7803253359;
    private static final double K = 0.00193185265241;

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T00:00:00Z"));

    /** Somigliana closed form, TR8350.2 Eq. 4-1 (REFERENCES.md, Earth models). */
    private static double somigliana(double lat) {
        double s2 = Math.sin(lat) * Math.sin(lat);
        return GAMMA_E * (1 + K * s2) / Math.sqrt(1 - E2 * s2);
    }

    private static double primeVertical(double lat) {
        return A / Math.sqrt(1 - E2 * Math.sin(lat) * Math.sin(lat));
    }

    private static IdealSensor sensor(ReferenceFrame frame) {
        return IdealSensor.of(frame, EARTH.gravitationIn(frame));
    }

    @Test
    void atRestOnTheEllipsoidTheTriadsReadMinusNormalGravityAndTheEarthRate() {
        double worst = 0;
        for (double latDeg : new double[] {-63.0, -12.5, 0.0, 27.0, 48.7, 81.0}) {
            double lat = Math.toRadians(latDeg);
            LatLonHeight site = LatLonHeight.ofDegrees(latDeg, 37.0, 0.0);
            ReferenceFrame ned = EARTH.localLevel(site, LocalAxes.NED);
            for (double headingDeg : new double[] {0.0, 71.0, 200.0}) {
                double heading = Math.toRadians(headingDeg);
                ReferenceFrame body = EARTH.body("hull", ned, AttitudeProfile.stationary(heading, 0, 0), LocalAxes.NED);
                InertialReading r = sensor(body).readingAt(1234.5);
                // level body, heading about NED down: turning a vector about z changes only x, y
                Rotation toBody = new Rotation(Vector3D.PLUS_K, heading, RotationConvention.FRAME_TRANSFORM);
                Vector3D f = new Vector3D(0, 0, -somigliana(lat));                     // minus normal gravity, "up"
                Vector3D w = toBody.applyTo(new Vector3D(W * Math.cos(lat), 0, -W * Math.sin(lat)));  // Earth rate, NED
                double ef = r.specificForce().subtract(f).getNorm() / f.getNorm();
                double ew = r.angularRate().subtract(w).getNorm() / W;
                worst = Math.max(worst, Math.max(ef, ew));
                // the requirement, 1e-12 relative
                assertTrue(ef <= 1e-12, "f at " + latDeg + " deg, heading " + headingDeg + ": " + r + " rel " + ef);
                assertTrue(ew <= 1e-12, "w at " + latDeg + " deg, heading " + headingDeg + ": " + r + " rel " + ew);
            }
        }
        System.out.printf(Locale.ROOT, "MEASURED at rest on the ellipsoid vs Somigliana and Earth rate: worst relative "
                + "error %.2e%n", worst);
    }

    @Test
    void primitiveGravitationIsTheObjectGravitation() {
        // the allocation-free form used by the sensor must return what the object form returns
        ReferenceFrame ned = EARTH.localLevel(LatLonHeight.ofDegrees(33.0, -71.0, 150.0), LocalAxes.NED);
        ReferenceFrame hull = ned.attach("hull", Motions.oscillation(Vector3D.PLUS_I, 0.1, 0.7, 0.2));
        for (ReferenceFrame f : new ReferenceFrame[] {hull, EARTH.inertial(), EARTH.earthFixed()}) {
            dev.noninertial.frames.dynamics.SpecificForce g = EARTH.gravitationIn(f);
            double[] state = {3.0, -2.0, 40.0, 1.0, 0.5, 0.0};
            if (f != hull) {
                Vector3D onSurface = EARTH.earthFixed().placementIn(f, 7.0).positionToBase(
                        Ellipsoid.WGS84.toCartesian(LatLonHeight.ofDegrees(10, 20, 0)));
                state = new double[] {onSurface.getX(), onSurface.getY(), onSurface.getZ(), 0, 0, 0};
            }
            double[] out = new double[3];
            g.at(7.0, state, 0, out, 0);
            Vector3D expected = g.at(7.0, dev.noninertial.frames.PointState.of(new Vector3D(state[0], state[1],
                    state[2]), new Vector3D(state[3], state[4], state[5])));
            // 1e-14 relative: the two paths round the chain differently
            assertTrue(new Vector3D(out[0], out[1], out[2]).subtract(expected).getNorm() <= 1e-14 * expected.getNorm(),
                    f.path());
        }
    }

    @Test
    void drivingAlongAParallelReadsTheTextbookTerms() {
        // velocity equation in NED with dv/dt = 0 (Titterton & Weston Eq. 3.71, REFERENCES.md,
        // Inertial navigation): f = (2 w_ie + w_en) x v - g, gyro w_ie + w_en
        for (double latDeg : new double[] {-35.0, 10.0, 52.0}) {
            double lat = Math.toRadians(latDeg);
            double ve = 31.0;   // m/s east
            LatLonHeight start = LatLonHeight.ofDegrees(latDeg, -20.0, 0.0);
            GeodeticPath east = GeodeticPath.steadyCourse(Ellipsoid.WGS84, start, new Vector3D(0, ve, 0), LocalAxes.NED);
            ReferenceFrame ned = EARTH.carriedLevel("car", east, LocalAxes.NED);
            InertialReading r = sensor(ned).readingAt(600.0);
            double rn = primeVertical(lat);
            Vector3D wie = new Vector3D(W * Math.cos(lat), 0, -W * Math.sin(lat));
            Vector3D wen = new Vector3D(ve / rn, 0, -ve * Math.tan(lat) / rn);
            Vector3D v = new Vector3D(0, ve, 0);
            Vector3D g = new Vector3D(0, 0, somigliana(lat));    // h = 0: normal gravity along the normal
            Vector3D f = Vector3D.crossProduct(wie.scalarMultiply(2).add(wen), v).subtract(g);
            Vector3D w = wie.add(wen);
            assertTrue(r.specificForce().subtract(f).getNorm() <= 1e-12 * f.getNorm(), latDeg + ": " + r + " vs " + f);
            assertTrue(r.angularRate().subtract(w).getNorm() <= 1e-12 * w.getNorm(), latDeg + ": " + r + " vs " + w);
        }
    }

    @Test
    void rateTableAtALatitudeReadsTableRatePlusEarthRateOverAWholeTurn() {
        // table turning about the local vertical at rate r: gyro (w cos lat sin th, w cos lat cos th,
        // w sin lat + r) in table axes, th = r t (Earth rate in ENU, REFERENCES.md, Inertial navigation)
        double lat = Math.toRadians(44.2);
        ReferenceFrame enu = EARTH.localLevel(LatLonHeight.ofDegrees(44.2, 5.0, 0.0), LocalAxes.ENU);
        double rate = Units.degreesPerSecond(30.0);
        double period = 2 * Math.PI / rate;
        ReferenceFrame table = enu.attach("table",
                Motions.turning(Vector3D.PLUS_K, SpinProfile.startingAt(0.0, 0.0, rate).hold(period)));
        IdealSensor gyro = sensor(table);
        for (int k = 0; k <= 36; k++) {
            double t = period * k / 36;
            double th = rate * t;
            Vector3D expected = new Vector3D(W * Math.cos(lat) * Math.sin(th), W * Math.cos(lat) * Math.cos(th),
                    W * Math.sin(lat) + rate);
            // 1e-15 rad/s: rounding of the table angle (~6 rad) times the Earth rate, far below 1e-12 of the rate
            assertTrue(gyro.readingAt(t).angularRate().subtract(expected).getNorm() <= 1e-15, "t " + t);
        }
        // over the whole turn the horizontal Earth-rate components average out: delta-angle
        // (0, 0, 2 pi + w sin(lat) T) (exact integral of the expression above)
        SensorIncrements d = gyro.incrementsOver(0.0, period);
        Vector3D expected = new Vector3D(0, 0, 2 * Math.PI + W * Math.sin(lat) * period);
        assertTrue(d.deltaAngle().subtract(expected).getNorm() <= 1e-12 * expected.getNorm(), d.toString());
    }

    @Test
    void gravimeterOnAShipAt60NorthGoingEastMatchesTheEotvosRuleOfThumb() {
        // ideal scalar gravimeter on a level platform: the upward specific force. Eotvos effect =
        // reading at rest minus reading under way, at the same place and time
        LatLonHeight site = LatLonHeight.ofDegrees(60.0, 4.0, 0.0);
        double v = Units.knots(10.0);
        ReferenceFrame moving = EARTH.carriedLevel("ship", GeodeticPath.steadyCourse(Ellipsoid.WGS84, site,
                new Vector3D(v, 0, 0), LocalAxes.ENU), LocalAxes.ENU);
        ReferenceFrame still = EARTH.carriedLevel("moored", GeodeticPath.stationary(site), LocalAxes.ENU);
        double eotvos = sensor(still).readingAt(0.0).specificForce().getZ()
                - sensor(moving).readingAt(0.0).specificForce().getZ();
        // rule of thumb, common practice (REFERENCES.md, Gravimetry): 7.503 V cos(lat) sin(course) + 0.004154 V^2
        double rule = 7.503 * 10.0 * Math.cos(Math.toRadians(60.0)) * 1.0 + 0.004154 * 100.0;
        System.out.printf(Locale.ROOT, "MEASURED Eotvos at 60 N, 10 kn east: %.5f mGal, rule of thumb %.5f mGal%n",
                Units.toMilligals(eotvos), rule);
        // 0.01 mGal: the requirement (the rule uses one spherical radius and 4 digits)
        assertEquals(rule, Units.toMilligals(eotvos), 0.01);
        // and the library's exact formula for the same speed, to rounding (1e-9 m/s^2 out of 4e-4)
        assertEquals(EarthModel.WGS84.eotvosCorrection(site, new Vector3D(v, 0, 0), LocalAxes.ENU), eotvos, 1e-9);
    }
}
