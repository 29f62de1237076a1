package dev.noninertial.bench;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.geodesy.LatLonHeight;

/**
 * Hand-written geodesy a user would write without the library, on WGS84: the textbook
 * geodetic-to-Cartesian formula, the common fixed-point iteration and Bowring's formula for the
 * inverse, and the Earth rotation angle formula of the IERS Conventions (2010), eq. 5.15.
 */
public final class GeodesyBaselines {

    /** An invented site: latitude 51.3 deg, longitude -3.7 deg, 250 m above the ellipsoid. */
    public static final LatLonHeight SITE = LatLonHeight.ofDegrees(51.3, -3.7, 250.0);
    /** Whole part of an invented UT1 Julian date (2026-03-20T00:00 is JD 2461119.5). */
    public static final double JD_WHOLE = 2461119.5;
    /** Fraction of the day. */
    public static final double JD_FRACTION = 0.4375;

    // WGS84 defining constants (NIMA TR8350.2): a and 1/f
    private static final double A = 6378137.0;
    private static final double F = 1.0 / 298.257223563;
    private static final double B = A * (1 - F);
    private static final double E2 = F * (2 - F);
    private static final double EP2 = E2 / (1 - E2);

    private GeodesyBaselines() {
    }

    /**
     * Geodetic to Cartesian, Vector3D result.
     *
     * @param lat latitude (rad)
     * @param lon longitude (rad)
     * @param h height (m)
     * @return ECEF position (m)
     */
    public static Vector3D toCartesian(double lat, double lon, double h) {
        double s = Math.sin(lat);
        double n = A / Math.sqrt(1 - E2 * s * s);
        double c = (n + h) * Math.cos(lat);
        return new Vector3D(c * Math.cos(lon), c * Math.sin(lon), (n * (1 - E2) + h) * s);
    }

    /**
     * Geodetic to Cartesian on primitives.
     *
     * @param lat latitude (rad)
     * @param lon longitude (rad)
     * @param h height (m)
     * @param out receives x, y, z (m)
     */
    public static void toCartesian(double lat, double lon, double h, double[] out) {
        double s = Math.sin(lat);
        double n = A / Math.sqrt(1 - E2 * s * s);
        double c = (n + h) * Math.cos(lat);
        out[0] = c * Math.cos(lon);
        out[1] = c * Math.sin(lon);
        out[2] = (n * (1 - E2) + h) * s;
    }

    /**
     * Cartesian to geodetic by the common fixed-point iteration
     * {@code lat = atan2(z + e^2 N sin lat, p)} until the change is below 1e-13 rad (not valid at
     * the poles; fine for the benchmark site).
     *
     * @param r ECEF position (m)
     * @return latitude (rad), longitude (rad), height (m)
     */
    public static double[] toGeodeticIterative(Vector3D r) {
        double p = Math.hypot(r.getX(), r.getY());
        double lat = Math.atan2(r.getZ(), p * (1 - E2));
        double n = A;
        for (int k = 0; k < 20; k++) {
            double s = Math.sin(lat);
            n = A / Math.sqrt(1 - E2 * s * s);
            double next = Math.atan2(r.getZ() + E2 * n * s, p);
            boolean done = Math.abs(next - lat) < 1e-13;
            lat = next;
            if (done) {
                break;
            }
        }
        double s = Math.sin(lat);
        n = A / Math.sqrt(1 - E2 * s * s);
        return new double[] {lat, Math.atan2(r.getY(), r.getX()), p / Math.cos(lat) - n};
    }

    /**
     * Cartesian to geodetic by Bowring's formula (parametric latitude), two passes, on
     * primitives; accurate near the Earth's surface, not everywhere.
     *
     * @param x ECEF x (m)
     * @param y ECEF y (m)
     * @param z ECEF z (m)
     * @param out receives latitude (rad), longitude (rad), height (m)
     */
    public static void toGeodeticBowring(double x, double y, double z, double[] out) {
        double p = Math.sqrt(x * x + y * y);
        double beta = Math.atan2(A * z, B * p);
        double lat = 0;
        for (int k = 0; k < 2; k++) {
            double sb = Math.sin(beta);
            double cb = Math.cos(beta);
            lat = Math.atan2(z + EP2 * B * sb * sb * sb, p - E2 * A * cb * cb * cb);
            beta = Math.atan2(B * Math.sin(lat), A * Math.cos(lat));
        }
        double s = Math.sin(lat);
        double c = Math.cos(lat);
        double n = A / Math.sqrt(1 - E2 * s * s);
        out[0] = lat;
        out[1] = Math.atan2(y, x);
        out[2] = p * c + z * s - A * A / n;
    }

    /**
     * Earth rotation angle, IERS Conventions (2010) eq. 5.15:
     * {@code 2 pi (0.7790572732640 + 1.00273781191135448 Tu)}, {@code Tu = JD(UT1) - 2451545.0},
     * reduced to [0, 2 pi); the integer days are dropped first to keep precision.
     *
     * @param whole whole part of the UT1 Julian date
     * @param fraction fraction of the day
     * @return the angle (rad)
     */
    public static double era(double whole, double fraction) {
        double tu = (whole - 2451545.0) + fraction;
        double turns = (whole - Math.floor(whole)) + fraction + 0.7790572732640 + 0.00273781191135448 * tu;
        return 2 * Math.PI * (turns - Math.floor(turns));
    }
}
