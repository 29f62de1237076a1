package dev.noninertial.geodesy;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

import dev.noninertial.frames.Arguments;

/**
 * Analytic Jacobians of the conversions between geodetic coordinates (latitude, longitude,
 * height) and Earth-fixed Cartesian coordinates on an {@link Ellipsoid}.
 *
 * <h2>Conventions</h2>
 * Geodetic triples are ordered (latitude (rad), longitude (rad), height (m)); Cartesian triples
 * (x, y, z) in ECEF axes (m), as in {@link Ellipsoid#toCartesian(LatLonHeight)}. With
 * {@code RM} the meridian radius and {@code RN} the prime-vertical radius at the latitude, and
 * the local unit vectors (ECEF components)
 * <pre>
 *   east  e = (-sin lon, cos lon, 0)
 *   north n = (-sin lat cos lon, -sin lat sin lon, cos lat)
 *   up    u = (cos lat cos lon, cos lat sin lon, sin lat)
 * </pre>
 *
 * <h2>Derivation</h2>
 * From {@code x = (RN + h) cos lat cos lon}, {@code y = (RN + h) cos lat sin lon},
 * {@code z = (RN (1 - e^2) + h) sin lat} and the identities
 * {@code d/dlat [RN cos lat] = -RM sin lat}, {@code d/dlat [RN (1 - e^2) sin lat] = RM cos lat}
 * (which follow from {@code dRN/dlat = RN e^2 sin lat cos lat / (1 - e^2 sin^2 lat)} and
 * {@code RM = RN (1 - e^2) / (1 - e^2 sin^2 lat)}), the columns of
 * {@code d(x, y, z) / d(lat, lon, h)} are
 * <pre>
 *   d/dlat = (RM + h) n,     d/dlon = (RN + h) cos lat e,     d/dh = u
 * </pre>
 * Because n, e, u are orthonormal, the inverse Jacobian has the rows
 * <pre>
 *   dlat/dX = n^T / (RM + h),   dlon/dX = e^T / ((RN + h) cos lat),   dh/dX = u^T
 * </pre>
 * It exists where {@code RM + h > 0} (outside the meridian evolute) and off the polar axis.
 *
 * <p>Thread-safe: stateless.
 */
public final class GeodeticJacobians {

    /**
     * Smallest distance from the polar axis, {@code (RN + h) cos lat} (m), at which the Jacobian
     * toward geodetic coordinates is given; closer, longitude is not differentiable in any useful
     * sense (it is undefined on the axis itself).
     */
    public static final double MIN_AXIS_DISTANCE = 1e-3;

    private GeodeticJacobians() {
    }

    /**
     * Jacobian of {@link Ellipsoid#toCartesian(LatLonHeight)}.
     *
     * @param ellipsoid the ellipsoid
     * @param position geodetic position at which the Jacobian is taken
     * @return {@code d(x, y, z) / d(lat, lon, h)}, 3x3 (columns in m/rad, m/rad, m/m)
     */
    public static RealMatrix toCartesian(Ellipsoid ellipsoid, LatLonHeight position) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        Arguments.nonNull("position", position);
        double lat = position.latitude();
        double lon = position.longitude();
        double h = position.height();
        double m = ellipsoid.meridianRadius(lat) + h;
        double n = ellipsoid.primeVerticalRadius(lat) + h;
        double sLat = Math.sin(lat);
        double cLat = Math.cos(lat);
        double sLon = Math.sin(lon);
        double cLon = Math.cos(lon);
        return MatrixUtils.createRealMatrix(new double[][] {
            {-m * sLat * cLon, -n * cLat * sLon, cLat * cLon},
            {-m * sLat * sLon, n * cLat * cLon, cLat * sLon},
            {m * cLat, 0.0, sLat}});
    }

    /**
     * Jacobian of {@link Ellipsoid#toGeodetic(Vector3D)}, taken at a geodetic position.
     *
     * @param ellipsoid the ellipsoid
     * @param position geodetic position at which the Jacobian is taken
     * @return {@code d(lat, lon, h) / d(x, y, z)}, 3x3 (rows in rad/m, rad/m, m/m)
     * @throws IllegalArgumentException if {@code RM + h <= 0} (inside the meridian evolute, where
     *         the conversion is not differentiable) or the point is closer than
     *         {@link #MIN_AXIS_DISTANCE} to the polar axis
     */
    public static RealMatrix toGeodetic(Ellipsoid ellipsoid, LatLonHeight position) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        Arguments.nonNull("position", position);
        double lat = position.latitude();
        double lon = position.longitude();
        double h = position.height();
        double m = ellipsoid.meridianRadius(lat) + h;
        double axisDistance = (ellipsoid.primeVerticalRadius(lat) + h) * Math.cos(lat);
        if (!(m > 0.0)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "position must lie outside the meridian evolute (RM + h > 0) for the geodetic Jacobian,"
                    + " got RM + h = %s m at %s", m, position));
        }
        if (!(axisDistance >= MIN_AXIS_DISTANCE)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "position must be at least %s m from the polar axis for the geodetic Jacobian"
                    + " (longitude is undefined on the axis), got (RN + h) cos lat = %s m at %s",
                    MIN_AXIS_DISTANCE, axisDistance, position));
        }
        double sLat = Math.sin(lat);
        double cLat = Math.cos(lat);
        double sLon = Math.sin(lon);
        double cLon = Math.cos(lon);
        return MatrixUtils.createRealMatrix(new double[][] {
            {-sLat * cLon / m, -sLat * sLon / m, cLat / m},
            {-sLon / axisDistance, cLon / axisDistance, 0.0},
            {cLat * cLon, cLat * sLon, sLat}});
    }

    /**
     * Jacobian of {@link Ellipsoid#toGeodetic(Vector3D)} at an Earth-fixed position.
     *
     * @param ellipsoid the ellipsoid
     * @param position Earth-fixed position (m), ECEF axes
     * @return {@code d(lat, lon, h) / d(x, y, z)}, 3x3
     * @throws IllegalArgumentException as for {@link #toGeodetic(Ellipsoid, LatLonHeight)}
     */
    public static RealMatrix toGeodetic(Ellipsoid ellipsoid, Vector3D position) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        return toGeodetic(ellipsoid, ellipsoid.toGeodetic(position));
    }
}
