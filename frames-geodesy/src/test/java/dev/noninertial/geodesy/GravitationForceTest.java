package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.dynamics.TrajectorySolver;

/**
 * {@link EarthFrames#gravitationIn(ReferenceFrame)}: the force to integrate in any frame of the
 * Earth tree. Checks: (1) physical invariant - the same shot integrated in the inertial root and in
 * a local-level frame on the spinning Earth, then converted, lands at the same point; (2) a point
 * held at rest by a reaction equal and opposite to normal gravity stays at rest in the local
 * frame (DESIGN.md pitfall: gravitation plus the engine's centrifugal term is normal gravity).
 */
class GravitationForceTest {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T00:00:00Z"));
    // invented test range
    private static final LatLonHeight SITE = LatLonHeight.ofDegrees(-33.4, 151.1, 150.0);

    @Test
    void sameShotInInertialAndLocalFramesAgrees() {
        ReferenceFrame enu = EARTH.localLevel(SITE, LocalAxes.ENU);
        ReferenceFrame eci = EARTH.inertial();
        PointState launch = PointState.of(Vector3D.ZERO, new Vector3D(150, 250, 300));
        double end = 60.0;
        FramedState local = TrajectorySolver.of(enu).plusForce(EARTH.gravitationIn(enu)).withTolerance(1e-12)
                .solve(launch, 0.0, end).finalState();
        FramedState start = enu.stateAt(0.0, launch).in(eci);
        FramedState inertial = TrajectorySolver.of(eci).plusForce(EARTH.gravitationIn(eci)).withTolerance(1e-12)
                .solve(start, end).finalState();
        // a ~20 km shot: both runs integrate to ~1e-8 m; 1e-6 m leaves room for the conversion
        // of ~6.4e6 m coordinates (ulp ~1e-9 m) and the two integrators' different step sequences
        double miss = inertial.in(enu).state().position().distance(local.state().position());
        assertTrue(miss < 1e-6, () -> "miss " + miss + " m");
    }

    @Test
    void pointHeldAgainstNormalGravityStaysAtRest() {
        ReferenceFrame ned = EARTH.localLevel(SITE, LocalAxes.NED);
        Vector3D g = EarthModel.WGS84.normalGravityIn(SITE, LocalAxes.NED);
        SpecificForce reaction = SpecificForce.uniform(g.negate());
        PointState end = TrajectorySolver.of(ned).plusForce(EARTH.gravitationIn(ned)).plusForce(reaction)
                .withTolerance(1e-12).solve(PointState.stationary(Vector3D.ZERO), 0.0, 100.0).finalState().state();
        // residual acceleration ~1e-15 m/s^2 (round-off) would move it ~5e-12 m in 100 s
        assertTrue(end.position().getNorm() < 1e-9, () -> "drift " + end.position());
    }

    @Test
    void inEarthFixedAxesItIsTheModelsGravitation() {
        Vector3D r = EarthModel.WGS84.ellipsoid().toCartesian(SITE);
        Vector3D viaForce = EARTH.gravitationIn(EARTH.earthFixed()).at(12.0, PointState.stationary(r));
        assertEquals(0.0, viaForce.distance(EarthModel.WGS84.gravitation(r)), 0.0);
    }

    @Test
    void framesOfAnotherTreeAreRefused() {
        ReferenceFrame stranger = ReferenceFrame.inertialRoot("elsewhere");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> EARTH.gravitationIn(stranger));
        assertTrue(e.getMessage().contains("elsewhere"));
    }
}
