package dev.noninertial.geodesy.navigation;

import dev.noninertial.geodesy.AttitudeProfile;
import dev.noninertial.geodesy.AttitudeSample;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.GeodeticPath;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.PathSample;

/**
 * An invented maneuvering vehicle at mid latitude (test data, not a real vehicle): a cruise
 * at about 60 m/s with weaving turns of about +-30 deg, speed changes of +-35 m/s, climbs of up to
 * 10 m/s and a rolling, pitching, yawing body. Every quantity is a sum of sines and polynomials,
 * so positions, rates and accelerations are analytic and mutually consistent.
 */
final class ManeuverTrack {

    /** Start: 47.3 deg N, 8.6 deg E, 450 m (an invented point). */
    static final LatLonHeight START = LatLonHeight.ofDegrees(47.3, 8.6, 450.0);

    private static final double TWO_PI = 2.0 * Math.PI;

    /** Scale of north metres to latitude radians and east metres to longitude radians at the start. */
    private static final double RM0 = Ellipsoid.WGS84.meridianRadius(START.latitude());
    private static final double RN0 = Ellipsoid.WGS84.primeVerticalRadius(START.latitude());
    private static final double COS0 = Math.cos(START.latitude());

    private ManeuverTrack() {
    }

    /** North displacement (m) and its two derivatives at t. */
    private static double[] north(double t) {
        // cruise heading 30 deg: 52 m/s north; weave of 800 m over 150 s; speed pulse over 240 s
        double w1 = TWO_PI / 150.0;
        double w2 = TWO_PI / 240.0;
        return new double[] {
            52.0 * t + 800.0 * Math.sin(w1 * t) + 600.0 * (1.0 - Math.cos(w2 * t)),
            52.0 + 800.0 * w1 * Math.cos(w1 * t) + 600.0 * w2 * Math.sin(w2 * t),
            -800.0 * w1 * w1 * Math.sin(w1 * t) + 600.0 * w2 * w2 * Math.cos(w2 * t)};
    }

    /** East displacement (m) and its two derivatives. */
    private static double[] east(double t) {
        double w1 = TWO_PI / 110.0;
        double w2 = TWO_PI / 330.0;
        return new double[] {
            30.0 * t - 500.0 * (1.0 - Math.cos(w1 * t)) + 900.0 * Math.sin(w2 * t),
            30.0 - 500.0 * w1 * Math.sin(w1 * t) + 900.0 * w2 * Math.cos(w2 * t),
            -500.0 * w1 * w1 * Math.cos(w1 * t) - 900.0 * w2 * w2 * Math.sin(w2 * t)};
    }

    /** Height (m) and its two derivatives: climbs and descents. */
    private static double[] height(double t) {
        double w1 = TWO_PI / 200.0;
        double w2 = TWO_PI / 70.0;
        return new double[] {
            START.height() + 300.0 * (1.0 - Math.cos(w1 * t)) + 1.5 * t + 40.0 * Math.sin(w2 * t),
            300.0 * w1 * Math.sin(w1 * t) + 1.5 + 40.0 * w2 * Math.cos(w2 * t),
            300.0 * w1 * w1 * Math.cos(w1 * t) - 40.0 * w2 * w2 * Math.sin(w2 * t)};
    }

    /** @return the track over the ellipsoid, t in s from the frames' epoch */
    static GeodeticPath path() {
        return t -> {
            double[] n = north(t);
            double[] e = east(t);
            double[] h = height(t);
            double k = 1.0 / (RN0 * COS0);
            return new PathSample(START.latitude() + n[0] / RM0, START.longitude() + e[0] * k, h[0],
                    n[1] / RM0, e[1] * k, h[1], n[2] / RM0, e[2] * k, h[2]);
        };
    }

    /** @return the body attitude over the NED level frame */
    static AttitudeProfile attitude() {
        return t -> {
            double a = TWO_PI / 150.0;
            double b = TWO_PI / 200.0;
            double c = TWO_PI / 40.0;
            double d = TWO_PI / 2.0;   // a 0.5 Hz wobble: exercises coning and sculling
            double heading = Math.toRadians(30.0) + 0.6 * Math.sin(a * t);
            double pitch = 0.08 * Math.sin(b * t) + 0.01 * Math.sin(d * t);
            double roll = 0.5 * Math.sin(c * t) + 0.02 * Math.cos(d * t);
            return new AttitudeSample(heading, pitch, roll,
                    0.6 * a * Math.cos(a * t),
                    0.08 * b * Math.cos(b * t) + 0.01 * d * Math.cos(d * t),
                    0.5 * c * Math.cos(c * t) - 0.02 * d * Math.sin(d * t),
                    -0.6 * a * a * Math.sin(a * t),
                    -0.08 * b * b * Math.sin(b * t) - 0.01 * d * d * Math.sin(d * t),
                    -0.5 * c * c * Math.sin(c * t) - 0.02 * d * d * Math.cos(d * t));
        };
    }
}
