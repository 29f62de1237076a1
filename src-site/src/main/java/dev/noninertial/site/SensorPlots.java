package dev.noninertial.site;

import java.time.Instant;
import java.util.List;

import dev.noninertial.examples.chart.Curve;
import dev.noninertial.examples.chart.CurveSheet;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.frames.sensing.InertialReading;
import dev.noninertial.frames.units.Units;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.GeodeticTrack;
import dev.noninertial.geodesy.LocalAxes;
import dev.noninertial.geodesy.SurveyPoint;

/**
 * Plots of the sensors page, computed by the library at build time: the invented survey vessel
 * Brannoch Wake runs east along 60 N at 10 kn, turns to the north over two minutes, heaving and
 * rolling; its track is logged at 1 Hz (invented data) and read back as a {@link GeodeticTrack}.
 */
final class SensorPlots {

    /** Track length (s). */
    static final int SECONDS = 600;

    private SensorPlots() {
    }

    /** The invented 1 Hz log: position, heading, pitch, roll. */
    static GeodeticTrack track() {
        int n = SECONDS + 1;
        double[] t = new double[n];
        double[] lat = new double[n];
        double[] lon = new double[n];
        double[] h = new double[n];
        double[] heading = new double[n];
        double[] pitch = new double[n];
        double[] roll = new double[n];
        double v = Units.knots(10.0);
        double a = 6378137.0;
        double la = Math.toRadians(60.0);
        double lo = Math.toRadians(4.0);
        for (int k = 0; k < n; k++) {
            t[k] = k;
            // heading 90 deg until 240 s, turn at 0.75 deg/s to 0 deg (north) by 360 s, smooth in the turn
            double s = Math.min(1.0, Math.max(0.0, (k - 240) / 120.0));
            double hd = Math.toRadians(90.0 * (1 - (s - Math.sin(2 * Math.PI * s) / (2 * Math.PI))));
            heading[k] = hd;
            lat[k] = la;
            lon[k] = lo;
            h[k] = 0.6 * Math.sin(2 * Math.PI * k / 8.0);
            pitch[k] = Math.toRadians(1.0) * Math.sin(2 * Math.PI * k / 6.5);
            roll[k] = Math.toRadians(4.0) * Math.sin(2 * Math.PI * k / 11.0);
            // dead reckoning on a sphere of radius a for the demo positions (1 s steps)
            la += v * Math.cos(hd) / a;
            lo += v * Math.sin(hd) / (a * Math.cos(la));
        }
        return GeodeticTrack.fromArrays(t, lat, lon, h, heading, pitch, roll, 2.0);
    }

    /**
     * The survey line (Eotvos correction and vertical acceleration, mGal) and the body-fixed
     * triads (forward specific force and yaw-axis gyro).
     *
     * @return two sheets
     */
    static CurveSheet[] survey() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-01T06:00:00Z"));
        GeodeticTrack track = track();
        List<SurveyPoint> line = track.surveyAtSamples(earth);
        int n = line.size();
        double[] t = new double[n];
        double[] eotvos = new double[n];
        double[] vertical = new double[n];
        double[] anomaly = new double[n];
        for (int i = 0; i < n; i++) {
            SurveyPoint p = line.get(i);
            t[i] = p.time();
            eotvos[i] = Units.toMilligals(p.eotvosCorrection());
            vertical[i] = Units.toMilligals(p.verticalAcceleration()) / 1000.0;
            anomaly[i] = Units.toMilligals(p.gravimeterReading() + p.eotvosCorrection() - p.verticalAcceleration()
                    - p.normalGravity());
        }
        CurveSheet gravity = CurveSheet.titled("Brannoch Wake (invented) survey line: east along 60 N, then a turn north")
                .withHorizontalAxis("time t", "s").withVerticalAxis("correction", "mGal")
                .withCurve(Curve.of("Eotvos correction", t, eotvos))
                .withCurve(Curve.of("vertical acceleration / 1000", t, vertical))
                .withCurve(Curve.of("reading + Eotvos - vertical acc. - normal gravity", t, anomaly));
        ReferenceFrame level = earth.carriedLevel("Brannoch Wake level", track, LocalAxes.NED);
        ReferenceFrame body = earth.body("Brannoch Wake hull", level, track.attitude(), LocalAxes.NED);
        IdealSensor imu = IdealSensor.of(body, earth.gravitationIn(body));
        double[] fx = new double[n];
        double[] fy = new double[n];
        double[] wz = new double[n];
        for (int i = 0; i < n; i++) {
            InertialReading r = imu.readingAt(t[i]);
            fx[i] = r.specificForce().getX();
            fy[i] = r.specificForce().getY();
            wz[i] = Units.toDegreesPerSecond(r.angularRate().getZ());
        }
        CurveSheet triads = CurveSheet.titled("Brannoch Wake (invented): ideal IMU at the hull origin, body axes")
                .withHorizontalAxis("time t", "s").withVerticalAxis("reading", "m/s^2 or deg/s")
                .withCurve(Curve.of("specific force x (forward), m/s^2", t, fx))
                .withCurve(Curve.of("specific force y (starboard), m/s^2", t, fy))
                .withCurve(Curve.of("gyro z (down axis), deg/s", t, wz));
        return new CurveSheet[] {gravity, triads};
    }
}
