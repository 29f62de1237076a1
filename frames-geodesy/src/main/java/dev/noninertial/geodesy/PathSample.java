package dev.noninertial.geodesy;

import java.io.Serializable;

import dev.noninertial.frames.Arguments;

/**
 * Where a vehicle is on a {@link GeodeticPath} at one instant: geodetic latitude, longitude and
 * height with their first and second time derivatives. Angles in radians, heights in metres,
 * rates per second.
 *
 * <p>Immutable and thread-safe.
 *
 * @param latitude geodetic latitude (rad), strictly inside (-pi/2, pi/2)
 * @param longitude longitude (rad), positive east
 * @param height ellipsoidal height (m)
 * @param latitudeRate d(lat)/dt (rad/s)
 * @param longitudeRate d(lon)/dt (rad/s)
 * @param heightRate dh/dt (m/s)
 * @param latitudeAcceleration d2(lat)/dt2 (rad/s^2)
 * @param longitudeAcceleration d2(lon)/dt2 (rad/s^2)
 * @param heightAcceleration d2h/dt2 (m/s^2)
 */
public record PathSample(double latitude, double longitude, double height,
                         double latitudeRate, double longitudeRate, double heightRate,
                         double latitudeAcceleration, double longitudeAcceleration, double heightAcceleration)
        implements Serializable {

    /**
     * Validates the sample.
     *
     * @param latitude geodetic latitude (rad), strictly inside (-pi/2, pi/2)
     * @param longitude longitude (rad)
     * @param height ellipsoidal height (m)
     * @param latitudeRate d(lat)/dt (rad/s)
     * @param longitudeRate d(lon)/dt (rad/s)
     * @param heightRate dh/dt (m/s)
     * @param latitudeAcceleration d2(lat)/dt2 (rad/s^2)
     * @param longitudeAcceleration d2(lon)/dt2 (rad/s^2)
     * @param heightAcceleration d2h/dt2 (m/s^2)
     * @throws IllegalArgumentException if a value is not finite or the latitude is at or beyond a pole
     *         (a north-aligned frame is undefined there)
     */
    public PathSample {
        if (!(Math.abs(latitude) < 0.5 * Math.PI)) {
            throw new IllegalArgumentException("latitude must be strictly inside (-pi/2, pi/2) rad for a "
                    + "north-aligned frame, got " + latitude + " rad (" + Math.toDegrees(latitude) + " deg)");
        }
        Arguments.finite("longitude", longitude);
        Arguments.finite("height", height);
        Arguments.finite("latitudeRate", latitudeRate);
        Arguments.finite("longitudeRate", longitudeRate);
        Arguments.finite("heightRate", heightRate);
        Arguments.finite("latitudeAcceleration", latitudeAcceleration);
        Arguments.finite("longitudeAcceleration", longitudeAcceleration);
        Arguments.finite("heightAcceleration", heightAcceleration);
    }

    /**
     * Returns the position part as a geodetic position.
     *
     * @return the position part as a geodetic position
     */
    public LatLonHeight position() {
        return new LatLonHeight(latitude, longitude, height);
    }
}
