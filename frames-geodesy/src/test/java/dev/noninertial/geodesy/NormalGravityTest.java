package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpMath;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

class NormalGravityTest {

    private static final EarthModel WGS84 = EarthModel.WGS84;

    @Test
    void wgs84DerivedConstantsMatchTr83502Tables() {
        // NIMA TR8350.2 3rd ed.: Table 3.1 (defining), Table 3.4 (derived gravity constants)
        // sources: REFERENCES.md, Earth models
        assertEquals(6378137.0, WGS84.ellipsoid().semiMajorAxis(), 0.0);
        assertEquals(1 / 298.257223563, WGS84.ellipsoid().flattening(), 0.0);
        assertEquals(3.986004418e14, WGS84.gm(), 0.0);
        assertEquals(7.292115e-5, WGS84.rotationRate(), 0.0);
        // tolerance 1e-10 m/s^2: the tables give 10 decimals
        assertEquals(9.7803253359, WGS84.equatorialGravity(), 1e-10);
        assertEquals(9.8321849378, WGS84.polarGravity(), 1e-10);
        // tables give 14 decimals (k, m). Measured difference of k: 4.8e-14 (our k is computed from
        // our ge and gp, which agree with the tables to 1e-11 relative); tolerance 1e-13
        assertEquals(0.00193185265241, WGS84.somiglianaConstant(), 1e-13);
        assertEquals(0.00344978650684, WGS84.centrifugalRatio(), 1e-13);
    }

    @Test
    void grs80NormalGravityMatchesMoritz() {
        // Moritz, "Geodetic Reference System 1980", Bull. Geod. (2000): ge, gp to 10 decimals.
        // GRS80 defines J2 rather than f; 1/f = 298.257222101 is published to 9 decimals, which
        // moves ge by well under 1e-10 m/s^2.
        // sources: REFERENCES.md, Earth models
        assertEquals(9.7803267715, EarthModel.GRS80.equatorialGravity(), 1e-10);
        assertEquals(9.8321863685, EarthModel.GRS80.polarGravity(), 1e-10);
        assertEquals(6378137.0, EarthModel.GRS80.ellipsoid().semiMajorAxis(), 0.0);
        assertEquals(1 / 298.257222101, EarthModel.GRS80.ellipsoid().flattening(), 0.0);
    }

    @Test
    void qSeriesAgreesWithDfpClosedForm() {
        // independent computation: the closed form of q evaluated with 50-digit Dfp (no cancellation issue)
        for (double x : new double[] {1e-4, 0.01, 0.0821, 0.2, 0.249}) {
            Dfp dx = DfpGeodesy.FIELD.newDfp(x);
            Dfp one = DfpGeodesy.FIELD.getOne();
            Dfp three = DfpGeodesy.FIELD.newDfp(3);
            Dfp exact = one.add(three.divide(dx.multiply(dx))).multiply(DfpMath.atan(dx))
                    .subtract(three.divide(dx)).divide(2);
            // relative 1e-14: a few ulps of the series sum
            assertEquals(exact.toDouble(), EarthModel.q(x), 1e-14 * exact.toDouble(), "x " + x);
        }
    }

    @Test
    void exactVectorOnTheEllipsoidIsSomiglianaAndNormalToTheSurface() {
        // Somigliana closed form (TR8350.2 Eq. 4-1) is the exact magnitude on the ellipsoid, and the
        // ellipsoid is an equipotential surface, so gravity is along the inward normal there
        // sources: REFERENCES.md, Earth models
        for (double deg = -90; deg <= 90; deg += 7.5) {
            LatLonHeight site = LatLonHeight.ofDegrees(deg, 33.0, 0.0);
            Vector3D x = WGS84.ellipsoid().toCartesian(site);
            Vector3D g = WGS84.normalGravityVector(x);
            // 1e-12 m/s^2: rounding of the closed forms (values ~10 m/s^2)
            assertEquals(WGS84.normalGravityOnEllipsoid(site.latitude()), g.getNorm(), 1e-12, "lat " + deg);
            double angle = Vector3D.angle(g.negate(), WGS84.ellipsoid().normal(site));
            assertTrue(angle < 1e-13, "lat " + deg + " angle " + angle);
        }
        // two ways of the same closed form: a few ulps (ulp of 9.8 is 1.8e-15)
        assertEquals(WGS84.equatorialGravity(), WGS84.normalGravityOnEllipsoid(0.0), 4e-15);
        assertEquals(WGS84.polarGravity(), WGS84.normalGravityOnEllipsoid(0.5 * Math.PI), 4e-15);
    }

    @Test
    void potentialIsConstantOnTheEllipsoid() {
        // physical invariant: the level ellipsoid is an equipotential surface, U0 = GM/E atan(E/b) + w^2 a^2/3
        // (Heiskanen and Moritz, Eq. 2-61); relative 1e-15: rounding of terms ~6e7 m^2/s^2
        // sources: REFERENCES.md, Earth models
        double e = WGS84.ellipsoid().linearEccentricity();
        double a = WGS84.ellipsoid().semiMajorAxis();
        double u0 = WGS84.gm() / e * Math.atan(e / WGS84.ellipsoid().semiMinorAxis())
                + WGS84.rotationRate() * WGS84.rotationRate() * a * a / 3;
        for (double deg = -90; deg <= 90; deg += 10) {
            Vector3D x = WGS84.ellipsoid().toCartesian(LatLonHeight.ofDegrees(deg, -70, 0));
            assertEquals(u0, WGS84.normalPotential(x), 1e-15 * u0 * 4, "lat " + deg);
        }
        // TR8350.2 3rd ed., Table 3.4 (REFERENCES.md, Earth models; recalled from memory):
        // U0 = 62636851.7146 m^2/s^2, recomputed above by the closed form from a, f, GM and w
        assertEquals(62636851.7146, u0, 1e-4);
    }

    @Test
    void vectorIsTheGradientOfThePotentialByFiniteDifferences() {
        // central differences of the potential, step 10 m: truncation ~ g''' h^2/6 ~ 1e-17, rounding
        // ~ 2 ulp(6.3e7)/20 m ~ 1e-9 m/s^2
        double step = 10.0;
        for (double[] s : new double[][] {{12, 40, 0}, {-61, 200, 35e3}, {89.9, 0, 2000e3}, {0, -120, 500}, {45, 45, 36000e3}}) {
            Vector3D x = WGS84.ellipsoid().toCartesian(LatLonHeight.ofDegrees(s[0], s[1], s[2]));
            Vector3D g = WGS84.normalGravityVector(x);
            double[] fd = new double[3];
            for (int i = 0; i < 3; i++) {
                Vector3D d = new Vector3D(i == 0 ? step : 0, i == 1 ? step : 0, i == 2 ? step : 0);
                fd[i] = (WGS84.normalPotential(x.add(d)) - WGS84.normalPotential(x.subtract(d))) / (2 * step);
            }
            assertEquals(fd[0], g.getX(), 2e-9, "x at " + s[0]);
            assertEquals(fd[1], g.getY(), 2e-9, "y at " + s[0]);
            assertEquals(fd[2], g.getZ(), 2e-9, "z at " + s[0]);
        }
    }

    @Test
    void farFieldTendsToPointMass() {
        // textbook limit: at a distance r >> a the field is GM/r^2 toward the centre, plus the
        // centrifugal term w^2 p and the J2 term of relative size ~ J2 (a/r)^2 ~ 1e-3 (a/r)^2
        Vector3D x = new Vector3D(3.0e8, 1.0e8, 2.0e8);
        double r = x.getNorm();
        Vector3D grav = WGS84.gravitation(x);
        double expected = WGS84.gm() / (r * r);
        assertEquals(expected, grav.getNorm(), 2e-3 * Math.pow(6.4e6 / r, 2) * expected);
        assertTrue(Vector3D.angle(grav.negate(), x) < 1e-6);
    }

    @Test
    void heightSeriesAgreesWithExactFieldNearTheSurface() {
        // TR8350.2 Eq. 4-3 is a series in h/a that keeps the first-order coefficient to O(f) and the
        // h^2 coefficient to O(1): the neglected terms are about 2 g h/a * f^2 and 3 g (h/a)^2 * f
        // (factor 5 on each as margin). Measured: 1.0e-7 m/s^2 at 1 km, 7.0e-7 m/s^2 at 10 km (equator).
        // sources: REFERENCES.md, Earth models
        double g = 9.8;
        double a = 6378137.0;
        double f = 1 / 298.257223563;
        for (double deg : new double[] {0, 30, 60, 90}) {
            for (double h : new double[] {-400.0, 1000.0, 10e3}) {
                LatLonHeight site = LatLonHeight.ofDegrees(deg, 10, h);
                double exact = WGS84.normalGravityVector(WGS84.ellipsoid().toCartesian(site)).getNorm();
                double tolerance = 2 * g * Math.abs(h) / a * 5 * f * f + 3 * g * (h / a) * (h / a) * 5 * f;
                assertEquals(exact, WGS84.normalGravity(site), tolerance, "lat " + deg + " h " + h);
            }
        }
    }

    @Test
    void gravitySplitsIntoGravitationAndCentrifugal() {
        // definition: gravity = gravitation + w^2 (x, y, 0); at the equator the centrifugal part is
        // w^2 a = 0.0339 m/s^2 (textbook value, e.g. Heiskanen and Moritz sec. 2-1)
        // sources: REFERENCES.md, Earth models
        Vector3D x = WGS84.ellipsoid().toCartesian(LatLonHeight.ofDegrees(0, 0, 0));
        Vector3D c = WGS84.centrifugal(x);
        assertEquals(7.292115e-5 * 7.292115e-5 * 6378137.0, c.getX(), 1e-15);
        Vector3D sum = WGS84.gravitation(x).add(c);
        assertEquals(0.0, sum.subtract(WGS84.normalGravityVector(x)).getNorm(), 1e-15);
        assertEquals(0.0339, c.getNorm(), 1e-4);
    }

    @Test
    void localAxesComponentsAreMostlyDown() {
        // on the ellipsoid the normal gravity is exactly along the normal: NED (0, 0, g), ENU (0, 0, -g)
        LatLonHeight site = LatLonHeight.ofDegrees(49.0, 6.0, 0.0);
        double g = WGS84.normalGravityOnEllipsoid(site.latitude());
        Vector3D ned = WGS84.normalGravityIn(site, LocalAxes.NED);
        Vector3D enu = WGS84.normalGravityIn(site, LocalAxes.ENU);
        assertEquals(g, ned.getZ(), 1e-12);
        assertEquals(-g, enu.getZ(), 1e-12);
        assertEquals(0.0, Math.hypot(ned.getX(), ned.getY()), 1e-12);
    }

    @Test
    void badModelsAndDepthsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> EarthModel.of(Ellipsoid.WGS84, -1.0, 7e-5));
        assertTrue(e.getMessage().contains("gm"));
        assertThrows(IllegalArgumentException.class, () -> EarthModel.of(Ellipsoid.WGS84, 3.9e14, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> EarthModel.of(Ellipsoid.of(6.4e6, 0.0), 3.9e14, 7e-5));
        // spin so fast that the equator would fly apart
        e = assertThrows(IllegalArgumentException.class, () -> EarthModel.of(Ellipsoid.WGS84, 3.9e14, 1.5e-3));
        assertTrue(e.getMessage().contains("rotationRate"));
        e = assertThrows(IllegalArgumentException.class, () -> WGS84.normalGravityVector(new Vector3D(1e5, 0, 0)));
        assertTrue(e.getMessage().contains("deeper"));
        e = assertThrows(IllegalArgumentException.class,
                () -> WGS84.normalGravity(LatLonHeight.ofDegrees(10, 10, 200e3)));
        assertTrue(e.getMessage().contains("height"));
    }
}
