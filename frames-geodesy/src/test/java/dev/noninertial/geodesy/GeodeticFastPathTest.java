package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/**
 * The fast path of {@link Ellipsoid#toGeodetic} (from half the equatorial radius out to a
 * thousand of them) and its seed angle: both sides of each boundary are as exact as the rest.
 */
class GeodeticFastPathTest {

    private static final Ellipsoid WGS84 = Ellipsoid.WGS84;

    @Test
    void seedAngleIsWithinOneUlpOfPiOfThePlatformAtan2() {
        // independent computation: java.lang.Math.atan2 (within 2 ulp by its specification);
        // 1e-15 rad is the seed's documented accuracy, which the Newton corrections need
        SplittableRandom random = new SplittableRandom(11L);
        double worst = 0;
        for (int i = 0; i < 200_000; i++) {
            double y = random.nextDouble(-1, 1) * Math.scalb(1.0, random.nextInt(-40, 40));
            double x = random.nextDouble(-1, 1) * Math.scalb(1.0, random.nextInt(-40, 40));
            worst = Math.max(worst, Math.abs(Ellipsoid.seedAtan2(y, x) - Math.atan2(y, x)));
        }
        assertTrue(worst <= 1e-15, "worst seed error " + worst + " rad");
        // the axes and signed zeros follow atan2's quadrant rules exactly
        double[][] cases = {{0.0, 1.0}, {-0.0, 1.0}, {0.0, -1.0}, {-0.0, -1.0}, {1.0, 0.0}, {-1.0, 0.0},
            {1.0, -0.0}, {2.0, 2.0}, {-3.0, -3.0}};
        for (double[] c : cases) {
            assertEquals(Math.atan2(c[0], c[1]), Ellipsoid.seedAtan2(c[0], c[1]), 1e-15,
                    "atan2(" + c[0] + ", " + c[1] + ")");
            assertEquals(Math.copySign(1.0, Math.atan2(c[0], c[1])),
                    Math.copySign(1.0, Ellipsoid.seedAtan2(c[0], c[1])), 0.0, "sign at " + c[0] + ", " + c[1]);
        }
    }

    @Test
    void bothSidesOfTheFastPathBoundariesAreExact() {
        // reference: 50-digit Dfp forward formula (as in GeodeticConversionTest); the bound
        // 4e-16 of the distance from the centre is the module's measured bound away from the surface
        DfpGeodesy ref = DfpGeodesy.wgs84();
        double worst = 0;
        for (double lat : new double[] {1e-9, 0.4, 0.9, 1.3, 0.5 * Math.PI - 1e-9}) {
            for (int k = 0; k <= 40; k++) {
                double inner = -3.30e6 + k * 0.2e6 / 40;     // r crosses a/2 for every latitude
                double outer = 6.36e9 + k * 0.03e9 / 40;     // r crosses 1000 a for every latitude
                for (double h : new double[] {inner, outer}) {
                    GeodeticConversionTest.Result r = GeodeticConversionTest.measure(ref, lat, 2.9, h);
                    worst = Math.max(worst, r.error() / r.radius());
                }
            }
        }
        assertTrue(worst <= 4e-16, "worst relative error at the boundaries " + worst);
    }

    @Test
    void longitudeNearTheAntimeridianStaysInRangeAndExact() {
        // on the equator near lon = +-pi the rounding of atan2 alone would be up to 3 nm; the
        // corrected longitude must stay in [-pi, pi] and exact (Dfp reference, 2 nm goal)
        DfpGeodesy ref = DfpGeodesy.wgs84();
        double worst = 0;
        for (double d : new double[] {0.0, 1e-17, 1e-16, 4e-16, 1e-15, 1e-12, 1e-9}) {
            for (double lon : new double[] {Math.PI - d, -Math.PI + d}) {
                GeodeticConversionTest.Result r = GeodeticConversionTest.measure(ref, 1e-3, lon, 120.0);
                worst = Math.max(worst, r.error());
                LatLonHeight g = WGS84.toGeodetic(WGS84.toCartesian(LatLonHeight.of(1e-3, lon, 120.0)));
                assertTrue(Math.abs(g.longitude()) <= Math.PI, "longitude " + g.longitude());
            }
        }
        assertTrue(worst <= 2e-9, "worst error near the antimeridian " + worst + " m");
        // a point exactly behind the axis on the negative x axis: atan2 gives +pi or -pi by the sign of y
        assertEquals(Math.PI, WGS84.toGeodetic(new Vector3D(-7e6, 0.0, 1e6)).longitude(), 0.0);
        assertEquals(-Math.PI, WGS84.toGeodetic(new Vector3D(-7e6, -0.0, 1e6)).longitude(), 0.0);
    }
}
