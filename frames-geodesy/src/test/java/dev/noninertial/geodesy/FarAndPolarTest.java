package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/**
 * Issue 15, class 4, geodesy: far points, gravitation far away and the steady course to its
 * documented latitude limit.
 */
class FarAndPolarTest {

    /** WGS84 GM (REFERENCES.md, WGS84). */
    private static final double GM = 3.986004418e14;

    @Test
    void gravitationFarAwayIsThePointMass() {
        // textbook: far from the Earth its attraction tends to -GM r / |r|^3 (Newton); the
        // flattening term is J2 (a/r)^2 ~ 1e-3 * 4e-13 = 4e-16 relative at 1e13 m, so 1e-12 is loose
        for (double r : new double[] {1e9, 1e11, 1e13, 1e20, 1e40, 1e77, 1e99, 1e101, 1e150}) {
            Vector3D x = new Vector3D(0.6 * r, 0.0, 0.8 * r);
            Vector3D g = EarthModel.WGS84.gravitation(x);
            double expected = GM / r / r;
            double tol = r < 1e12 ? 1e-6 : 1e-12; // J2 (a/r)^2 is 4e-8 at 1e9 m
            assertEquals(-0.6 * expected, g.getX(), tol * expected, "r = " + r);
            assertEquals(-0.8 * expected, g.getZ(), tol * expected, "r = " + r);
            assertEquals(0.0, g.getY(), 0.0, "r = " + r);
        }
        // beyond about 1e161 m the point mass underflows to zero, still finite
        Vector3D far = EarthModel.WGS84.gravitation(new Vector3D(1e300, 0, 0));
        assertTrue(Double.isFinite(far.getX()) && far.getX() <= 0.0);
    }

    @Test
    void aPointInsideTheMassesIsRefusedNamingItsComponents() {
        // the normal field is defined outside the masses only (its ellipsoidal coordinate u must
        // be at least b - 20 km); the primitive form names its parameters x, y, z in the refusal
        double[] out = new double[3];
        String m = assertThrows(IllegalArgumentException.class,
                () -> EarthModel.WGS84.gravitation(Double.MIN_VALUE, 0.0, 100.0, out, 0)).getMessage();
        assertTrue(m.startsWith("position (x, y, z) = (4.9E-324, 0.0, 100.0) m is deeper than 20000.0 m"), m);
        m = assertThrows(IllegalArgumentException.class,
                () -> EarthModel.WGS84.gravitation(7e6, 0.0, 0.0, out, 1)).getMessage();
        assertTrue(m.startsWith("offset must be in [0, 0] for 3 values in out of length 3"), m);
    }

    @Test
    void toGeodeticWorksForEveryFinitePosition() {
        // invariant: toCartesian(toGeodetic(X)) = X; far away the latitude tends to the geocentric
        // one corrected by e^2 a / r (below rounding from 1e30 m on)
        for (double r : new double[] {1e7, 1e13, 1e50, 1e100, 1e152, 1e200, 1e300}) {
            Vector3D x = new Vector3D(0.48 * r, 0.36 * r, 0.8 * r); // |X| = r exactly
            LatLonHeight g = Ellipsoid.WGS84.toGeodetic(x);
            if (r >= 1e30) {
                assertEquals(Math.asin(0.8), g.latitude(), 1e-15, "r = " + r);
                assertEquals(r, g.height(), 1e-14 * r, "r = " + r);
            }
            assertEquals(Math.atan2(0.36, 0.48), g.longitude(), 1e-15, "r = " + r);
            if (r <= 1e150) {
                Vector3D back = Ellipsoid.WGS84.toCartesian(g);
                assertEquals(0.0, back.subtract(x).getNorm() / r, 1e-15, "r = " + r);
            }
        }
        // a distance of sqrt(3) times the largest double has no double height: refused, naming position
        Vector3D max = new Vector3D(Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Ellipsoid.WGS84.toGeodetic(max));
        assertTrue(e.getMessage().startsWith("position"), e.getMessage());
        LatLonHeight edge = Ellipsoid.WGS84.toGeodetic(new Vector3D(0, 0, Double.MAX_VALUE));
        assertEquals(0.5 * Math.PI, edge.latitude(), 0.0);
    }

    @Test
    void aSteadyCourseNorthReachesItsDocumentedLimit() {
        // from the equator at 10 m/s north: the meridian arc to 89.99 deg is about 10,000 km
        // (meridian quadrant 10,001,965.7 m, WGS84, REFERENCES.md), so the limit is near t = 1.0001e6 s
        GeodeticPath p = GeodeticPath.steadyCourse(Ellipsoid.WGS84, LatLonHeight.ofDegrees(0, 0, 0),
                new Vector3D(0, 10, 0), LocalAxes.ENU);
        double lo = 9e5;
        double hi = 1.1e6;
        for (int i = 0; i < 80; i++) {
            double mid = 0.5 * (lo + hi);
            try {
                p.at(mid);
                lo = mid;
            } catch (IllegalArgumentException e) {
                hi = mid;
            }
        }
        // the last accepted time is at the documented limit of 89.99 deg (to the bisection's 1e-10 s)
        assertEquals(89.99, Math.toDegrees(p.at(lo).latitude()), 1e-9);
        // every time before it answers, with a latitude that grows with time
        double previous = -1;
        for (double t = 9.9e5; t < lo; t += (lo - 9.9e5) / 50) {
            double lat = p.at(t).latitude();
            assertTrue(lat > previous);
            previous = lat;
        }
        double beyond = hi + 1.0;
        assertThrows(IllegalArgumentException.class, () -> p.at(beyond));
        // the southbound mirror (symmetry of the ellipsoid about the equator)
        GeodeticPath south = GeodeticPath.steadyCourse(Ellipsoid.WGS84, LatLonHeight.ofDegrees(0, 0, 0),
                new Vector3D(0, -10, 0), LocalAxes.ENU);
        assertEquals(-p.at(lo).latitude(), south.at(lo).latitude(), 1e-12);
    }
}
