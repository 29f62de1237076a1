package dev.noninertial.site;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.examples.chart.Curve;
import dev.noninertial.examples.chart.CurveSheet;
import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.EventMark;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.frames.dynamics.TrajectoryEvent;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.units.Units;

/**
 * Plots that integrate motion on the rotating Earth with the library's {@link TrajectorySolver}:
 * the deflection of a long vacuum trajectory against latitude and azimuth, and the turning of a
 * Foucault pendulum's swing plane.
 *
 * <p>The Earth is built from core frames only: an inertial root, an Earth-fixed frame spinning at
 * the WGS84 rate (NIMA TR8350.2, Table 3.1) and an east-north-up frame fixed in it on the WGS84
 * ellipsoid. Results are for illustration; they are not firing data.
 */
final class TrajectoryPlots {

    /** WGS84 rotation rate (rad/s), NIMA TR8350.2 Table 3.1. */
    static final double EARTH_RATE = 7.292115e-5;
    /** WGS84 semi-major axis (m), NIMA TR8350.2 Table 3.1. */
    private static final double A = 6378137.0;
    /** WGS84 first eccentricity squared, NIMA TR8350.2 Table 3.3. */
    private static final double E2 = 6.69437999014e-3;
    /** Plumb-line gravity used for the demonstrations (m/s^2), a round mid-latitude value. */
    static final double GRAVITY = 9.81;

    /** Launch speed of the demonstration trajectory (m/s). */
    static final double LAUNCH_SPEED = 700.0;
    /** Launch elevation of the demonstration trajectory (rad). */
    static final double ELEVATION = Units.degrees(45.0);

    /** Length of the demonstration pendulum (m). */
    static final double PENDULUM_LENGTH = 40.0;
    /** Swing amplitude of the pendulum (m). */
    static final double PENDULUM_AMPLITUDE = 2.0;
    /** Time span of the Foucault plot (s). */
    static final double PENDULUM_SPAN = 3600.0;
    /** Latitude of the (invented) hall holding the pendulum (rad). */
    static final double PENDULUM_LATITUDE = Units.degrees(52.0);

    private TrajectoryPlots() {
    }

    /** An east-north-up frame at a latitude (longitude 0, height 0) on a spinning WGS84 Earth. */
    static ReferenceFrame localLevel(double lat, double rate) {
        double s = Math.sin(lat);
        double c = Math.cos(lat);
        double n = A / Math.sqrt(1 - E2 * s * s);
        Vector3D site = new Vector3D(n * c, 0, n * (1 - E2) * s);
        double[][] enu = {{0, 1, 0}, {-s, 0, c}, {c, 0, s}};
        ReferenceFrame inertial = ReferenceFrame.inertialRoot("Earth-centred inertial");
        ReferenceFrame ecef = inertial.attach("Earth-fixed", Motions.spin(Vector3D.PLUS_K, 0.0, rate));
        return ecef.attach("east-north-up", Motions.stationary(site, Orientations.fromMatrix(enu)));
    }

    /**
     * The real specific force that makes the site's plumb-line gravity exactly {@code GRAVITY}
     * straight down: gravitation = gravity minus the inertial terms felt at rest at the origin.
     */
    static Vector3D gravitationAtOrigin(ReferenceFrame enu) {
        FictitiousAccelerations atRest = enu.stateAt(0.0, PointState.stationary(Vector3D.ZERO)).fictitious();
        return new Vector3D(0, 0, -GRAVITY).subtract(atRest.total());
    }

    /** Impact point of the shot on the ground plane, rotating (rate) or not (rate 0). */
    static Vector3D impact(double lat, double azimuth, double rate) {
        ReferenceFrame enu = localLevel(lat, rate);
        Vector3D pull = gravitationAtOrigin(enu);
        double horizontal = LAUNCH_SPEED * Math.cos(ELEVATION);
        Vector3D v0 = new Vector3D(horizontal * Math.sin(azimuth), horizontal * Math.cos(azimuth),
                LAUNCH_SPEED * Math.sin(ELEVATION));
        Trajectory tr = TrajectorySolver.of(enu)
                .plusForce(SpecificForce.uniform(pull))
                .withTolerance(1e-6)
                .plusEvent(TrajectoryEvent.groundImpact(Vector3D.PLUS_K, 0.0))
                .solve(PointState.of(Vector3D.ZERO, v0), 0.0, 400.0);
        return tr.finalState().state().position();
    }

    /**
     * Cross-range deflection (to the right of the line of fire, m) and range change (m) against
     * latitude, for four azimuths.
     */
    static CurveSheet[] deflection() {
        double[] azimuthsDeg = {0, 90, 180, 270};
        String[] names = {"north (azimuth 0 deg)", "east (90 deg)", "south (180 deg)", "west (270 deg)"};
        int n = 17;
        double[] lats = new double[n];
        for (int i = 0; i < n; i++) {
            lats[i] = -80 + 10.0 * i;
        }
        CurveSheet cross = CurveSheet.titled("Vacuum shot, 700 m/s at 45 deg: cross-range deflection by Earth rotation")
                .withHorizontalAxis("geodetic latitude", "deg")
                .withVerticalAxis("deflection to the right of the line of fire", "m");
        CurveSheet along = CurveSheet.titled("Same shot: change of range by Earth rotation")
                .withHorizontalAxis("geodetic latitude", "deg")
                .withVerticalAxis("range change", "m");
        for (int k = 0; k < azimuthsDeg.length; k++) {
            double az = Units.degrees(azimuthsDeg[k]);
            Vector3D forward = new Vector3D(Math.sin(az), Math.cos(az), 0);
            Vector3D right = new Vector3D(Math.cos(az), -Math.sin(az), 0);
            double[] d = new double[n];
            double[] r = new double[n];
            for (int i = 0; i < n; i++) {
                double lat = Units.degrees(lats[i]);
                Vector3D spun = impact(lat, az, EARTH_RATE);
                Vector3D still = impact(lat, az, 0.0);
                Vector3D diff = spun.subtract(still);
                d[i] = diff.dotProduct(right);
                r[i] = diff.dotProduct(forward);
            }
            cross = cross.withCurve(Curve.of(names[k], lats, d));
            along = along.withCurve(Curve.of(names[k], lats, r));
        }
        return new CurveSheet[] {cross, along};
    }

    /**
     * Azimuth of a Foucault pendulum's swing plane over one hour, from the turning points of the
     * integrated motion, against {@code w sin(lat) t}, and their difference.
     *
     * @return the azimuth sheet and the difference sheet
     */
    static CurveSheet[] foucault() {
        ReferenceFrame enu = localLevel(PENDULUM_LATITUDE, EARTH_RATE);
        Vector3D hold = enu.stateAt(0.0, PointState.stationary(Vector3D.ZERO)).fictitious().total();
        double k = GRAVITY / PENDULUM_LENGTH;
        // small-swing pendulum as an isotropic 2-D oscillator about its rest point; the constant
        // part (gravitation plus string tension at rest) holds the rest point still
        SpecificForce restoring = (t, s) -> new Vector3D(-k * s.position().getX(), -k * s.position().getY(), 0)
                .subtract(hold);
        TrajectoryEvent turning = TrajectoryEvent.of("turning point",
                (t, s) -> s.position().dotProduct(s.velocity())).fallingOnly();
        Trajectory tr = TrajectorySolver.of(enu)
                .plusForce(restoring)
                .withTolerance(1e-9, 1e-9, 1e-11)
                .plusEvent(turning)
                .solve(PointState.of(new Vector3D(0, PENDULUM_AMPLITUDE, 0), Vector3D.ZERO), 0.0, PENDULUM_SPAN);
        List<EventMark> marks = tr.events("turning point");
        double[] t = new double[marks.size() + 1];
        double[] az = new double[marks.size() + 1];
        double previous = 0;
        for (int i = 0; i < marks.size(); i++) {
            Vector3D p = marks.get(i).state().state().position();
            // swing plane azimuth modulo 180 deg, unwrapped continuously from north
            double a = Units.toDegrees(Math.atan2(p.getX(), p.getY()));
            while (a - previous > 90) {
                a -= 180;
            }
            while (a - previous < -90) {
                a += 180;
            }
            previous = a;
            t[i + 1] = marks.get(i).time() / 60.0;
            az[i + 1] = a;
        }
        double[] line = new double[t.length];
        double rate = Units.toDegrees(EARTH_RATE * Math.sin(PENDULUM_LATITUDE));
        for (int i = 0; i < t.length; i++) {
            line[i] = rate * t[i] * 60.0;
        }
        double[] gap = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            gap[i] = (az[i] - line[i]) * 3.6e6;  // deg to milliarcseconds
        }
        CurveSheet plane = CurveSheet.titled("Foucault pendulum, 40 m, at 52 deg N: azimuth of the swing plane")
                .withHorizontalAxis("time", "min")
                .withVerticalAxis("swing-plane azimuth from north", "deg")
                .withCurve(Curve.of("integrated: turning points of the bob", t, az))
                .withCurve(Curve.of("w sin(lat) t, clockwise seen from above", t, line));
        CurveSheet difference = CurveSheet.titled("Same pendulum: integrated azimuth minus w sin(lat) t")
                .withHorizontalAxis("time", "min")
                .withVerticalAxis("difference", "milliarcsecond")
                .withCurve(Curve.of("integrated minus formula, at each turning point", t, gap));
        return new CurveSheet[] {plane, difference};
    }
}
