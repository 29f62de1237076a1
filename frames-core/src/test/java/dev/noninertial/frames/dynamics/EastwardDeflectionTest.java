package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.PointState;

/**
 * A body dropped from rest at height h, integrated in a site frame on a body turning at the
 * Earth's rate, lands east of the plumb point by (1/3) w g t^3 cos(lat), t = sqrt(2h/g), to
 * first order in w (Landau and Lifshitz, Mechanics, sec. 39, problem 1; Taylor, Classical
 * Mechanics, sec. 9.9).
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class EastwardDeflectionTest {

    // WGS84 rotation rate and semi-major axis, NIMA TR8350.2 (2000), Table 3.1
    // sources: REFERENCES.md, Earth models
    static final double EARTH_RATE = 7.292115e-5;
    static final double RADIUS = 6378137.0;

    @Test
    void dropFromRestDeflectsEastAsFirstOrderTheory() {
        double lat = 49.0;
        double g = 9.81;     // plumb-line gravity chosen for the test
        double h = 150.0;
        SpinningSite earth = new SpinningSite(EARTH_RATE, lat, RADIUS);
        TrajectorySolver solver = TrajectorySolver.of(earth.site)
                .plusForce(SpecificForce.uniform(earth.plumbGravitation(g)))
                .withTolerance(1e-11, 1e-11, 1e-13)
                .plusEvent(TrajectoryEvent.groundImpact(Vector3D.PLUS_K, 0.0));
        Trajectory tr = solver.solve(PointState.stationary(new Vector3D(0, 0, h)), 0.0, 60.0);

        double t = Math.sqrt(2 * h / g);
        double expected = EARTH_RATE * g * t * t * t * Math.cos(Math.toRadians(lat)) / 3.0;
        double east = tr.at(t).state().position().getX();
        double impactTime = tr.stopEvent().orElseThrow().time();
        Vector3D impact = tr.finalState().state().position();
        System.out.printf("MEASURED east deflection: h=%.0f m, t=%.6f s, expected %.9e m, integrated %.9e m,"
                + " relative difference %.2e; impact time %.9f s (vs %.9f), south %.3e m%n",
                h, t, expected, east, (east - expected) / expected, impactTime, t, impact.getY());
        // The first-order formula neglects terms of relative size (w t)^2 ~ 1.6e-7 and the
        // centrifugal gradient w^2 h / g ~ 1e-7; integration error is below 1e-9 m (2e-8
        // relative). 1e-6 relative leaves a factor of ~5 for these estimates.
        assertEquals(expected, east, 1e-6 * expected);
        // fall time: O(w^2) corrections only (w^2 h / g ~ 1e-7 relative), 1e-6 relative
        assertEquals(t, impactTime, 1e-6 * t);
        // the deflection to the south is of second order in w (Landau and Lifshitz, same
        // problem): it must point south and stay far below the east one (measured ~3e-4 of it)
        // sources: REFERENCES.md, Analytic results of mechanics
        assertTrue(impact.getY() < 0 && -impact.getY() < 0.1 * expected, "south " + impact.getY());
    }
}
