package dev.noninertial.geodesy;

import java.io.Serializable;
import java.util.Locale;

import dev.noninertial.frames.Arguments;

/**
 * Geodetic position of a point relative to an {@link Ellipsoid}: geodetic latitude, longitude
 * and ellipsoidal height.
 *
 * <p>Conventions: latitude and longitude are held in <b>radians</b>; latitude is positive north
 * and lies in [-pi/2, pi/2]; longitude is positive east, any finite value (it is kept as given,
 * never wrapped); height is measured along the ellipsoid normal in metres, positive outside the
 * ellipsoid. Use {@link #ofDegrees(double, double, double)} to build from degrees.
 *
 * <p>Immutable and thread-safe.
 *
 * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
 * @param longitude longitude (rad), positive east, finite
 * @param height ellipsoidal height (m), finite
 */
public record LatLonHeight(double latitude, double longitude, double height) implements Serializable {

    /**
     * Validates the components.
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @param longitude longitude (rad), finite
     * @param height ellipsoidal height (m), finite
     * @throws IllegalArgumentException if latitude is outside [-pi/2, pi/2] or NaN, or longitude
     *         or height is not finite
     */
    public LatLonHeight {
        if (!(Math.abs(latitude) <= 0.5 * Math.PI)) {
            throw new IllegalArgumentException("latitude must be in [-pi/2, pi/2] rad ([-90, 90] deg), got "
                    + latitude + " rad (" + Math.toDegrees(latitude) + " deg)");
        }
        Arguments.finite("longitude", longitude);
        Arguments.finite("height", height);
    }

    /**
     * A geodetic position from radians and metres.
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @param longitude longitude (rad), positive east
     * @param height ellipsoidal height (m)
     * @return the position
     * @throws IllegalArgumentException as for the canonical constructor
     */
    public static LatLonHeight of(double latitude, double longitude, double height) {
        return new LatLonHeight(latitude, longitude, height);
    }

    /**
     * A geodetic position from degrees and metres.
     *
     * @param latitudeDegrees geodetic latitude (deg), in [-90, 90]
     * @param longitudeDegrees longitude (deg), positive east
     * @param height ellipsoidal height (m)
     * @return the position (held in radians)
     * @throws IllegalArgumentException if the latitude is outside [-90, 90] deg or NaN, or a value
     *         is not finite
     */
    public static LatLonHeight ofDegrees(double latitudeDegrees, double longitudeDegrees, double height) {
        if (!(Math.abs(latitudeDegrees) <= 90.0)) {
            throw new IllegalArgumentException("latitudeDegrees must be in [-90, 90] deg, got " + latitudeDegrees);
        }
        Arguments.finite("longitudeDegrees", longitudeDegrees);
        // toRadians(90) rounds to the double nearest pi/2, which the constructor accepts
        double lat = Math.max(-0.5 * Math.PI, Math.min(0.5 * Math.PI, Math.toRadians(latitudeDegrees)));
        return new LatLonHeight(lat, Math.toRadians(longitudeDegrees), height);
    }

    /**
     * Returns geodetic latitude (deg).
     *
     * @return geodetic latitude (deg)
     */
    public double latitudeDegrees() {
        return Math.toDegrees(latitude);
    }

    /**
     * Returns longitude (deg).
     *
     * @return longitude (deg)
     */
    public double longitudeDegrees() {
        return Math.toDegrees(longitude);
    }

    /**
     * A copy with another height.
     *
     * @param newHeight ellipsoidal height (m)
     * @return the copy
     */
    public LatLonHeight withHeight(double newHeight) {
        Arguments.finite("newHeight", newHeight);
        return new LatLonHeight(latitude, longitude, newHeight);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "LatLonHeight{lat=%.9f deg, lon=%.9f deg, h=%.4f m}",
                latitudeDegrees(), longitudeDegrees(), height);
    }
}
