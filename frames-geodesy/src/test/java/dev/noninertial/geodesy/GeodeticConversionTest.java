package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

class GeodeticConversionTest {

    private static final Ellipsoid WGS84 = Ellipsoid.WGS84;

    @Test
    void iogpWorkedExampleToOneMillimetre() {
        // IOGP Publication 373-7-2 (EPSG Guidance Note 7-2), geographic/geocentric example, WGS84
        // (REFERENCES.md, Geodetic conversions; the published figures are from memory, so they are
        // recomputed below from the closed-form formulas in 50-digit Dfp, independently of the
        // library): 53deg48'33.820"N, 2deg07'46.380"E, h = 73.0 m -> X, Y, Z below. Tolerance 1 mm:
        // the published values are given to the millimetre.
        double lat = 53 + 48 / 60.0 + 33.820 / 3600.0;
        double lon = 2 + 7 / 60.0 + 46.380 / 3600.0;
        Vector3D x = WGS84.toCartesian(LatLonHeight.ofDegrees(lat, lon, 73.0));
        assertEquals(3771793.968, x.getX(), 1e-3);
        assertEquals(140253.342, x.getY(), 1e-3);
        assertEquals(5124304.349, x.getZ(), 1e-3);
        LatLonHeight back = WGS84.toGeodetic(new Vector3D(3771793.968, 140253.342, 5124304.349));
        // 1 mm of arc on the Earth is about 1.6e-10 rad; the published figures are rounded to 0.5 mm
        assertEquals(Math.toRadians(lat), back.latitude(), 1e-3 / 6.4e6);
        assertEquals(Math.toRadians(lon), back.longitude(), 1e-3 / 3.8e6);
        assertEquals(73.0, back.height(), 1e-3);
    }

    @Test
    void iogpFiguresAreWhatTheClosedFormGives() {
        // Recomputation of the published (from memory) IOGP figures: X = (N + h) cos(lat) cos(lon),
        // Y = (N + h) cos(lat) sin(lon), Z = (N (1 - e^2) + h) sin(lat), N = a / sqrt(1 - e^2 sin^2 lat),
        // e^2 = f (2 - f), WGS84 a and 1/f (REFERENCES.md, Earth models), the angles converted from
        // degrees, minutes and seconds in Dfp (no double rounding anywhere).
        DfpField field = DfpGeodesy.FIELD;
        Dfp degree = field.getPi().divide(180);
        Dfp lat = field.newDfp(53).add(field.newDfp(48).divide(60)).add(field.newDfp("33.820").divide(3600))
                .multiply(degree);
        Dfp lon = field.newDfp(2).add(field.newDfp(7).divide(60)).add(field.newDfp("46.380").divide(3600))
                .multiply(degree);
        Dfp[] exact = DfpGeodesy.wgs84().forward(DfpMath.sin(lat), DfpMath.cos(lat), DfpMath.sin(lon),
                DfpMath.cos(lon), field.newDfp("73.0"));
        double[] published = {3771793.968, 140253.342, 5124304.349};
        for (int i = 0; i < 3; i++) {
            // the published figure is the exact value rounded to the millimetre: within 0.5 mm
            assertEquals(published[i], exact[i].toDouble(), 0.5e-3, "component " + i);
        }
        // and the library's double-precision forward conversion agrees with the exact value to
        // rounding (a few ulp of 5e6 m, ~1e-9 m; 1e-8 m allows the rounding of the inputs)
        Vector3D x = WGS84.toCartesian(LatLonHeight.of(lat.toDouble(), lon.toDouble(), 73.0));
        assertEquals(exact[0].toDouble(), x.getX(), 1e-8);
        assertEquals(exact[1].toDouble(), x.getY(), 1e-8);
        assertEquals(exact[2].toDouble(), x.getZ(), 1e-8);
    }

    @Test
    void wgs84DerivedConstantsMatchTr83502() {
        // NIMA TR8350.2 3rd ed. Table 3.3: b = 6356752.3142 m (4 decimals), e^2 = 6.69437999014e-3
        // sources: REFERENCES.md, Earth models
        assertEquals(6356752.3142, WGS84.semiMinorAxis(), 0.5e-4);
        assertEquals(6.69437999014e-3, WGS84.eccentricitySquared(), 0.5e-14);
        // Moritz, GRS80 (Bull. Geod. 2000): b = 6356752.3141 m
        // sources: REFERENCES.md, Earth models
        assertEquals(6356752.3141, Ellipsoid.GRS80.semiMinorAxis(), 0.5e-4);
    }

    @Test
    void radiiAtEquatorAndPoleMatchClosedForms() {
        // textbook values: RM(0) = a(1-e^2) = b^2/a, RN(0) = a, RM(90) = RN(90) = a^2/b
        double a = WGS84.semiMajorAxis();
        double b = WGS84.semiMinorAxis();
        assertEquals(b * b / a, WGS84.meridianRadius(0.0), 1e-8);
        assertEquals(a, WGS84.primeVerticalRadius(0.0), 1e-8);
        assertEquals(a * a / b, WGS84.meridianRadius(0.5 * Math.PI), 1e-8);
        assertEquals(a * a / b, WGS84.primeVerticalRadius(0.5 * Math.PI), 1e-8);
    }

    @Test
    void meridianRadiusIsCurvatureOfTheMeridianByFiniteDifferences() {
        // independent check: RM = ds/dlat along the meridian, from positions of toCartesian
        // (central difference, step 1e-5 rad: truncation ~ RM'' h^2/6 ~ 1e-5 m, rounding ~1e-5 m)
        for (double deg : new double[] {0, 17, 45, 63, 89}) {
            double lat = Math.toRadians(deg);
            double step = 1e-5;
            Vector3D lo = WGS84.toCartesian(LatLonHeight.of(lat - step, 0.3, 0));
            Vector3D hi = WGS84.toCartesian(LatLonHeight.of(lat + step, 0.3, 0));
            double rm = hi.distance(lo) / (2 * step);
            assertEquals(WGS84.meridianRadius(lat), rm, 1e-3, "lat " + deg);
        }
    }

    @Test
    void inverseIsExactAgainstDfpOnAModerateSample() {
        // reference: forward formula in 50-digit Dfp; distance between the exact point and the
        // exact image of our double result (see GeodeticSweep for the full million-point sweep)
        DfpGeodesy ref = DfpGeodesy.wgs84();
        SplittableRandom random = new SplittableRandom(20260320L);
        double worstNear = 0;
        double worstRelative = 0;
        for (int i = 0; i < 2000; i++) {
            double[] sample = GeodeticSweep.draw(random, i);
            Result r = measure(ref, sample[0], sample[1], sample[2]);
            if (sample[2] >= -10e3 && sample[2] <= 1000e3) {
                worstNear = Math.max(worstNear, r.error);
            } else {
                worstRelative = Math.max(worstRelative, r.error / r.radius);
            }
        }
        // goal of the module: 2 nm near the surface, 2e-16 of the distance from the centre elsewhere
        assertTrue(worstNear <= 2e-9, "worst near-surface error " + worstNear + " m");
        assertTrue(worstRelative <= 4e-16, "worst relative error elsewhere " + worstRelative);
    }

    @Test
    void polesCentreAndAxisGiveFiniteResults() {
        // physical invariants: the nearest surface points of the centre are the poles (b < a)
        LatLonHeight centre = WGS84.toGeodetic(Vector3D.ZERO);
        assertEquals(0.5 * Math.PI, centre.latitude(), 0.0);
        assertEquals(-WGS84.semiMinorAxis(), centre.height(), 1e-9);
        LatLonHeight south = WGS84.toGeodetic(new Vector3D(0, 0, -7e6));
        assertEquals(-0.5 * Math.PI, south.latitude(), 0.0);
        assertEquals(7e6 - WGS84.semiMinorAxis(), south.height(), 1e-9);
        // on the equatorial plane inside the evolute (p < E^2/a = 42.7 km)
        LatLonHeight inner = WGS84.toGeodetic(new Vector3D(1000.0, 0, 0));
        Vector3D foot = WGS84.toCartesian(inner.withHeight(0));
        // the foot point is on the ellipsoid and at distance -h from the point
        assertEquals(-inner.height(), foot.distance(new Vector3D(1000.0, 0, 0)), 1e-8);
        for (double z : new double[] {1e-300, 1e-3, 1.0, 3e4}) {
            LatLonHeight g = WGS84.toGeodetic(new Vector3D(20e3, 0, z));
            assertTrue(Double.isFinite(g.latitude()) && Double.isFinite(g.height()), "z " + z);
            Vector3D back = WGS84.toCartesian(g);
            assertEquals(0.0, back.distance(new Vector3D(20e3, 0, z)), 1e-8, "z " + z);
        }
    }

    @Test
    void pointsNearTheCentreInvertToTheNearestFootPoint() {
        // invariants of the nearest-point problem: the foot point F = toCartesian(lat, lon, 0) is at
        // distance |h| from X, X - F is along the normal, and no pole is nearer than F
        SplittableRandom random = new SplittableRandom(7L);
        for (int i = 0; i < 500; i++) {
            Vector3D x = new Vector3D(random.nextDouble(-60e3, 60e3), random.nextDouble(-60e3, 60e3),
                    random.nextDouble(-60e3, 60e3));
            LatLonHeight g = WGS84.toGeodetic(x);
            Vector3D foot = WGS84.toCartesian(g.withHeight(0));
            // 1e-8 m: rounding of coordinates of 6.4e6 m
            assertEquals(-g.height(), foot.distance(x), 1e-8, x.toString());
            Vector3D along = x.subtract(foot);
            assertTrue(Vector3D.crossProduct(along, WGS84.normal(g)).getNorm() < 1e-8, x.toString());
            double p = Math.hypot(x.getX(), x.getY());
            double toPole = Math.hypot(p, WGS84.semiMinorAxis() - Math.abs(x.getZ()));
            assertTrue(-g.height() <= toPole + 1e-8, x.toString());
        }
    }

    @Test
    void onASphereGeodeticIsGeocentric() {
        // textbook: with f = 0 the normal passes through the centre, lat = atan2(z, p), h = r - R
        Ellipsoid sphere = Ellipsoid.of(6371000.0, 0.0);
        Vector3D x = new Vector3D(-2.1e6, 3.3e6, -5.0e6);
        LatLonHeight g = sphere.toGeodetic(x);
        assertEquals(Math.atan2(x.getZ(), Math.hypot(x.getX(), x.getY())), g.latitude(), 1e-15);
        assertEquals(x.getNorm() - 6371000.0, g.height(), 1e-8);
        assertEquals(6371000.0, sphere.meridianRadius(0.7), 1e-8);
    }

    @Test
    void badInputIsRefusedWithClearMessages() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LatLonHeight.ofDegrees(90.5, 0, 0));
        assertTrue(e.getMessage().contains("latitudeDegrees") && e.getMessage().contains("90.5"));
        assertThrows(IllegalArgumentException.class, () -> LatLonHeight.of(Double.NaN, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> LatLonHeight.of(0, Double.NaN, 0));
        assertThrows(IllegalArgumentException.class, () -> LatLonHeight.of(0, 0, Double.POSITIVE_INFINITY));
        e = assertThrows(IllegalArgumentException.class, () -> Ellipsoid.of(-1.0, 0.003));
        assertTrue(e.getMessage().contains("semiMajorAxis") && e.getMessage().contains("-1.0"));
        assertThrows(IllegalArgumentException.class, () -> Ellipsoid.of(Double.NaN, 0.003));
        e = assertThrows(IllegalArgumentException.class, () -> Ellipsoid.of(6378137.0, 1.0));
        assertTrue(e.getMessage().contains("flattening"));
        assertThrows(IllegalArgumentException.class, () -> Ellipsoid.of(6378137.0, -0.1));
        assertThrows(IllegalArgumentException.class, () -> Ellipsoid.ofInverseFlattening(6378137.0, 0.3));
        assertThrows(IllegalArgumentException.class,
                () -> WGS84.toGeodetic(new Vector3D(Double.NaN, 0, 0)));
        assertThrows(IllegalArgumentException.class, () -> WGS84.meridianRadius(2.0));
    }

    @Test
    void toStringReadsInDegreesAndMetres() {
        String text = LatLonHeight.ofDegrees(47.5, 8.25, 420.0).toString();
        assertTrue(text.contains("47.5") && text.contains("8.25") && text.contains("420") && text.contains("deg")
                && text.contains(" m"), text);
    }

    record Result(double error, double radius) {
    }

    static Result measure(DfpGeodesy ref, double lat, double lon, double h) {
        Dfp[] trig = ref.trig(lat, lon);
        Dfp[] exact = ref.forward(trig[0], trig[1], trig[2], trig[3], DfpGeodesy.FIELD.newDfp(h));
        Vector3D rounded = new Vector3D(exact[0].toDouble(), exact[1].toDouble(), exact[2].toDouble());
        LatLonHeight back = WGS84.toGeodetic(rounded);
        boolean near = Math.abs(back.latitude() - lat) < 1e-6 && Math.abs(back.longitude() - lon) < 1e-6;
        Dfp[] image = near ? ref.toCartesianNear(trig, lat, lon, back.latitude(), back.longitude(), back.height())
                : ref.toCartesian(back.latitude(), back.longitude(), back.height());
        return new Result(DfpGeodesy.distance(exact, image), DfpGeodesy.norm(exact));
    }
}
