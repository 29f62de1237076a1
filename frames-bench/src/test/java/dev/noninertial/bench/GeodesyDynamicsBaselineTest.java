package dev.noninertial.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.geodesy.EarthRotationAngle;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.LatLonHeight;

/** The geodesy and dynamics baselines compute what the library computes, so the ratios are fair. */
class GeodesyDynamicsBaselineTest {

    @Test
    void geodesyBaselinesAgreeWithTheLibrary() {
        LatLonHeight site = GeodesyBaselines.SITE;
        Vector3D lib = Ellipsoid.WGS84.toCartesian(site);
        Vector3D a = GeodesyBaselines.toCartesian(site.latitude(), site.longitude(), site.height());
        double[] b = new double[3];
        GeodesyBaselines.toCartesian(site.latitude(), site.longitude(), site.height(), b);
        // same formula, WGS84 constants of NIMA TR8350.2: a few ulps of 6.4e6 m
        // sources: REFERENCES.md, Earth models
        assertEquals(0.0, lib.distance(a), 1e-8);
        assertEquals(0.0, lib.distance(new Vector3D(b[0], b[1], b[2])), 1e-8);

        double[] it = GeodesyBaselines.toGeodeticIterative(lib);
        GeodesyBaselines.toGeodeticBowring(lib.getX(), lib.getY(), lib.getZ(), b);
        // both hand methods converge to the exact result near the surface: 1e-12 rad is 6 um,
        // 1e-6 m on the height is far below anything the ratios depend on
        for (double[] c : new double[][] {it, b}) {
            assertEquals(site.latitude(), c[0], 1e-12);
            assertEquals(site.longitude(), c[1], 1e-15);
            assertEquals(site.height(), c[2], 1e-6);
        }
    }

    @Test
    void eraBaselineAgreesWithTheLibrary() {
        // IERS Conventions (2010) eq. 5.15, same formula: agreement to rounding (1e-12 rad)
        // sources: REFERENCES.md, Earth rotation
        assertEquals(EarthRotationAngle.atJulianDate(GeodesyBaselines.JD_WHOLE, GeodesyBaselines.JD_FRACTION),
                GeodesyBaselines.era(GeodesyBaselines.JD_WHOLE, GeodesyBaselines.JD_FRACTION), 1e-12);
    }

    @Test
    void dynamicsBaselinesIntegrateTheSameMotionInTheSameSteps() {
        Trajectory one = DynamicsBaselines.solver().solve(DynamicsBaselines.start(), 0.0, DynamicsBaselines.ONE_STEP);
        assertEquals(1, one.stepCount(), "the one-step benchmark must be one step");
        assertEquals(1, DynamicsBaselines.steps(true, DynamicsBaselines.ONE_STEP));
        assertEquals(1, DynamicsBaselines.steps(false, DynamicsBaselines.ONE_STEP));

        Trajectory whole = DynamicsBaselines.solver().solve(DynamicsBaselines.start(), 0.0, DynamicsBaselines.SPAN);
        double[] a = DynamicsBaselines.integrate(false, DynamicsBaselines.SPAN);
        double[] b = DynamicsBaselines.integrate(true, DynamicsBaselines.SPAN);
        Vector3D end = whole.finalState().state().position();
        // same integrator, tolerances and equations: the end points agree far inside the
        // integration error (position tolerance 1e-6 m per step; 1e-3 m over the whole run)
        assertEquals(end.getX(), a[0], 1e-3);
        assertEquals(end.getY(), a[1], 1e-3);
        assertEquals(end.getZ(), a[2], 1e-3);
        assertEquals(end.getX(), b[0], 1e-3);
        assertEquals(end.getZ(), b[2], 1e-3);
        assertEquals(whole.stepCount(), DynamicsBaselines.steps(true, DynamicsBaselines.SPAN), 2,
                "library and baseline take (nearly) the same steps");
    }
}
