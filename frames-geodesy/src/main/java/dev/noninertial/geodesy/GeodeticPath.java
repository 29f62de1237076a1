package dev.noninertial.geodesy;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;

/**
 * The track of a vehicle over the Earth: geodetic latitude, longitude and height and their first
 * and second time derivatives as functions of time. A local-level frame carried along it is made
 * by {@link EarthFrames#carriedLevel(String, GeodeticPath, LocalAxes)}.
 *
 * <p>Time {@code t} is in seconds from the epoch of the {@link EarthFrames} it is used with.
 * Implementations must return mutually consistent derivatives (the rates must be the time
 * derivatives of the positions) and should be immutable and thread-safe.
 */
@FunctionalInterface
public interface GeodeticPath {

    /**
     * The vehicle's position and its rates at time {@code t}.
     *
     * @param t time (s from the frames' epoch)
     * @return the sample
     * @throws IllegalArgumentException if the path is not defined at {@code t}
     */
    PathSample at(double t);

    /**
     * A vehicle standing still at a site (useful as the stationary reference of a comparison).
     *
     * @param site geodetic position (rad, m), not at a pole
     * @return the path
     */
    static GeodeticPath stationary(LatLonHeight site) {
        Arguments.nonNull("site", site);
        return constantRates(site, 0.0, 0.0, 0.0);
    }

    /**
     * Latitude, longitude and height changing at constant rates: {@code lat(t) = lat0 + latRate t},
     * and so on. The path is refused at times when the latitude would reach a pole.
     *
     * @param start position at t = 0 (rad, m)
     * @param latitudeRate d(lat)/dt (rad/s)
     * @param longitudeRate d(lon)/dt (rad/s)
     * @param heightRate dh/dt (m/s)
     * @return the path
     */
    static GeodeticPath constantRates(LatLonHeight start, double latitudeRate, double longitudeRate,
                                      double heightRate) {
        Arguments.nonNull("start", start);
        Arguments.finite("latitudeRate", latitudeRate);
        Arguments.finite("longitudeRate", longitudeRate);
        Arguments.finite("heightRate", heightRate);
        return new Courses.ConstantRates(start, latitudeRate, longitudeRate, heightRate);
    }

    /**
     * A vehicle holding constant north and east ground speeds over the ellipsoid at constant
     * height: {@code (RM + h) dlat/dt = vN} and {@code (RN + h) cos(lat) dlon/dt = vE} at all times
     * (RM, RN the radii of curvature). With {@code vN = 0} this is a steady run along a parallel.
     * The latitude follows from the exact meridian arc length (Gauss-Legendre quadrature, about
     * 1e-15 relative), so rates and positions stay consistent. Times that take the vehicle within
     * 0.01 deg of a pole are refused.
     *
     * @param ellipsoid the reference ellipsoid of the heights and radii
     * @param start position at t = 0 (rad, m)
     * @param groundVelocity velocity relative to the Earth (m/s), resolved in {@code axes}: its
     *        north and east components are vN and vE; its vertical component must be zero
     * @param axes local axis order of {@code groundVelocity}
     * @return the path
     * @throws IllegalArgumentException for a non-finite velocity or a non-zero vertical component
     */
    static GeodeticPath steadyCourse(Ellipsoid ellipsoid, LatLonHeight start, Vector3D groundVelocity,
                                     LocalAxes axes) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        Arguments.nonNull("start", start);
        Arguments.finite("groundVelocity", groundVelocity);
        Arguments.nonNull("axes", axes);
        if (groundVelocity.getZ() != 0.0) {
            throw new IllegalArgumentException("groundVelocity must be horizontal (zero "
                    + (axes == LocalAxes.ENU ? "up" : "down") + " component) on a constant-height course, got "
                    + groundVelocity + " m/s in " + axes + " axes");
        }
        return new Courses.Steady(ellipsoid, start, EarthModel.northComponent(groundVelocity, axes),
                EarthModel.eastComponent(groundVelocity, axes));
    }
}
