package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.PointState;

/**
 * The gravity-versus-gravitation pitfall (project DESIGN): in a frame fixed to a rotating body a
 * point held by a reaction equal and opposite to plumb-line gravity stays at rest when the force
 * integrated is gravitation (gravity minus the centrifugal part); passing gravity counts the
 * centrifugal term twice and the point drifts away with exactly that extra acceleration,
 * w^2 d (d = distance from the spin axis), whose horizontal part points to the equator
 * (Taylor, Classical Mechanics, sec. 9.4: centrifugal w^2 d away from the axis).
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class GravitationPitfallTest {

    static final double EARTH_RATE = 7.292115e-5;   // NIMA TR8350.2 (2000), Table 3.1 (REFERENCES.md, Earth models)
    static final double RADIUS = 6378137.0;         // same table (spherical body of radius a)

    @Test
    void pointHeldAgainstGravityStaysAtRestUnderGravitation() {
        double g = 9.81;
        SpinningSite earth = new SpinningSite(EARTH_RATE, 49.0, RADIUS);
        SpecificForce reaction = SpecificForce.uniform(new Vector3D(0, 0, g));
        Trajectory held = TrajectorySolver.of(earth.site)
                .plusForce(SpecificForce.uniform(earth.plumbGravitation(g)))
                .plusForce(reaction)
                .withTolerance(1e-12, 1e-12, 1e-13)
                .solve(PointState.stationary(Vector3D.ZERO), 0.0, 100.0);
        double drift = held.finalState().state().position().getNorm();
        System.out.printf("MEASURED held point, gravitation passed: drift after 100 s %.3e m%n", drift);
        // exact equilibrium; only rounding of the ~0.03 m/s^2 terms that cancel remains:
        // 1e-9 m over 100 s
        assertTrue(drift < 1e-9, "drift " + drift + " m");
    }

    @Test
    void passingGravityCountsCentrifugalTwice() {
        double g = 9.81;
        double lat = Math.toRadians(49.0);
        SpinningSite earth = new SpinningSite(EARTH_RATE, 49.0, RADIUS);
        Trajectory wrong = TrajectorySolver.of(earth.site)
                .plusForce(SpecificForce.uniform(new Vector3D(0, 0, -g)))   // gravity: the mistake
                .plusForce(SpecificForce.uniform(new Vector3D(0, 0, g)))    // reaction
                .withTolerance(1e-12, 1e-12, 1e-13)
                .solve(PointState.stationary(Vector3D.ZERO), 0.0, 10.0);
        // extra acceleration: centrifugal w^2 d with d = a cos(lat), away from the axis; in ENU its
        // north part is -w^2 a cos(lat) sin(lat) (toward the equator), its up part w^2 a cos^2(lat)
        double w2d = EARTH_RATE * EARTH_RATE * RADIUS * Math.cos(lat);
        double south = w2d * Math.sin(lat);
        Vector3D expected = new Vector3D(0, -0.5 * south * 100, 0.5 * w2d * Math.cos(lat) * 100);
        Vector3D got = wrong.finalState().state().position();
        Vector3D horizontalAcceleration = wrong.initialState().state().acceleration();
        System.out.printf("MEASURED gravity passed by mistake: start acceleration %s, horizontal %.5f m/s^2,"
                + " displacement after 10 s %s (expected %s)%n", horizontalAcceleration,
                -horizontalAcceleration.getY(), got, expected);
        // the start acceleration is the double-counted centrifugal term exactly (rounding only)
        assertEquals(-south, horizontalAcceleration.getY(), 1e-12);
        // after 10 s the Coriolis term on the acquired velocity (2 w v, relative size ~ w t =
        // 7e-4) bends the path slightly: 2e-3 relative
        assertEquals(expected.getY(), got.getY(), 2e-3 * Math.abs(expected.getY()));
        assertEquals(expected.getZ(), got.getZ(), 2e-3 * Math.abs(expected.getZ()));
    }
}
