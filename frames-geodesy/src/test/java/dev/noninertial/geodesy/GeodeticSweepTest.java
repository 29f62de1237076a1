package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * The long accuracy sweep of {@link Ellipsoid#toGeodetic}, skipped in CI. Run with
 * {@code -Dgeodesy.sweep=1000000} (point count); same draw and reference as {@link GeodeticSweep}.
 */
class GeodeticSweepTest {

    @Test
    @EnabledIfSystemProperty(named = "geodesy.sweep", matches = "\\d+")
    void sweepMeetsTheMeasuredBounds() {
        int count = Integer.parseInt(System.getProperty("geodesy.sweep"));
        DfpGeodesy ref = DfpGeodesy.wgs84();
        SplittableRandom random = new SplittableRandom(20260320L);
        double worstNear = 0;
        double worstRelative = 0;
        for (int i = 0; i < count; i++) {
            double[] s = GeodeticSweep.draw(random, i);
            GeodeticConversionTest.Result r = GeodeticConversionTest.measure(ref, s[0], s[1], s[2]);
            if (s[2] >= -10e3 && s[2] <= 1000e3) {
                worstNear = Math.max(worstNear, r.error());
            } else {
                worstRelative = Math.max(worstRelative, r.error() / r.radius());
            }
        }
        System.out.printf("sweep of %d points: worst %.3e m near the surface, %.3e relative elsewhere%n", count,
                worstNear, worstRelative);
        // measured bounds of the accuracy report (Dfp reference, 50 digits)
        assertTrue(worstNear <= 2e-9, "near-surface " + worstNear);
        assertTrue(worstRelative <= 4e-16, "relative " + worstRelative);
    }
}
