package dev.noninertial.geodesy.navigation;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Orientations;
import dev.noninertial.geodesy.AttitudeProfile;
import dev.noninertial.geodesy.AttitudeSample;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.GeodeticPath;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;
import dev.noninertial.geodesy.PathSample;

/** True navigation states of a track and an attitude profile, and distances between states. */
final class Truth {

    private Truth() {
    }

    /** The true state at t in NED (velocity from the path's rates and the radii of curvature). */
    static NavigationState at(GeodeticPath path, AttitudeProfile attitude, double t) {
        PathSample p = path.at(t);
        Ellipsoid e = Ellipsoid.WGS84;
        double rm = e.meridianRadius(p.latitude()) + p.height();
        double rn = e.primeVerticalRadius(p.latitude()) + p.height();
        Vector3D v = new Vector3D(rm * p.latitudeRate(), rn * Math.cos(p.latitude()) * p.longitudeRate(),
                -p.heightRate());
        AttitudeSample a = attitude.at(t);
        Rotation r = Orientations.fromYawPitchRoll(a.heading(), a.pitch(), a.roll());
        return NavigationState.of(t, p.position(), v, LocalAxes.NED, r);
    }

    /** Distance between the positions of two states (m), through Earth-fixed coordinates. */
    static double positionError(NavigationState a, NavigationState b) {
        return Ellipsoid.WGS84.toCartesian(a.position()).distance(Ellipsoid.WGS84.toCartesian(b.position()));
    }

    /** Angle between the attitudes of two states (rad). */
    static double attitudeError(NavigationState a, NavigationState b) {
        return Rotation.distance(a.attitude(), b.attitude());
    }

    /** Position of a state, Earth-fixed (m). */
    static Vector3D ecef(LatLonHeight p) {
        return Ellipsoid.WGS84.toCartesian(p);
    }
}
