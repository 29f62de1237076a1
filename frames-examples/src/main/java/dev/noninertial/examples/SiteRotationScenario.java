package dev.noninertial.examples;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Scenario 1: the Earth's rotation seen from the local-level (east-north-up) frame at Kelvaro
 * Point: Earth rate in local axes, the site's own motion in inertial space, normal gravity
 * against gravitation, and what happens to a point held at rest when the wrong one is integrated.
 */
final class SiteRotationScenario {

    private SiteRotationScenario() {
    }

    static ScenarioTable run(DemoSetting s) {
        ScenarioTable table = new ScenarioTable("site-rotation",
                "Earth rotation at Kelvaro Point (invented), 57.62 N 11.31 E, 12 m, WGS84, ENU axes")
                .column("quantity", "", "%s")
                .column("east", "", "%.6e")
                .column("north", "", "%.6e")
                .column("up", "", "%.6e")
                .column("magnitude", "", "%.6e")
                .column("unit", "", "%s");
        double lat = DemoSetting.KELVARO_POINT.latitude();
        Vector3D rate = s.model.earthRateIn(lat, LocalAxes.ENU);
        row(table, "Earth rate w", rate, "rad/s");
        FramedState origin = s.site.stateAt(0.0, PointState.stationary(Vector3D.ZERO)).in(s.earth.inertial());
        Vector3D velocityInSite = s.site.placementIn(s.earth.inertial(), 0.0)
                .vectorFromBase(origin.state().velocity());
        row(table, "site velocity in inertial space", velocityInSite, "m/s");
        FictitiousAccelerations atRest = s.site.stateAt(0.0, PointState.stationary(Vector3D.ZERO)).fictitious();
        row(table, "frame acceleration at rest (circling the axis)", atRest.frameAcceleration(), "m/s^2");
        Vector3D gravity = s.normalGravityInSite(Vector3D.ZERO);
        Vector3D gravitation = s.gravitationInSite().at(0.0, PointState.stationary(Vector3D.ZERO));
        row(table, "normal gravity (plumb line)", gravity, "m/s^2");
        row(table, "gravitation (masses only)", gravitation, "m/s^2");
        row(table, "gravity - gravitation", gravity.subtract(gravitation), "m/s^2");
        double tilt = Vector3D.angle(gravity, gravitation);
        table.row("angle gravity to gravitation", Double.NaN, Double.NaN, Double.NaN, tilt * 1e3, "mrad");
        table.row("Coriolis parameter f = 2 w sin(lat)", Double.NaN, Double.NaN, Double.NaN,
                s.model.coriolisParameter(lat), "1/s");

        // a point held at rest by a reaction opposite to normal gravity, for 60 s
        SpecificForce reaction = SpecificForce.uniform(gravity.negate());
        TrajectorySolver right = TrajectorySolver.of(s.site).plusForce(s.gravitationInSite()).plusForce(reaction)
                .withTolerance(1e-9, 1e-12, 1e-13);
        TrajectorySolver wrong = TrajectorySolver.of(s.site)
                .plusForce((t, p) -> s.normalGravityInSite(p.position())).plusForce(reaction)
                .withTolerance(1e-9, 1e-12, 1e-13);
        Vector3D heldRight = right.solve(PointState.stationary(Vector3D.ZERO), 0.0, 60.0).finalState().state().position();
        Vector3D heldWrong = wrong.solve(PointState.stationary(Vector3D.ZERO), 0.0, 60.0).finalState().state().position();
        row(table, "held point after 60 s, gravitation passed", heldRight, "m");
        row(table, "held point after 60 s, gravity passed (mistake)", heldWrong, "m");
        table.note("integrate gravitation, not gravity, in an Earth-fixed frame: the engine adds the centrifugal term");
        return table;
    }

    private static void row(ScenarioTable t, String name, Vector3D v, String unit) {
        t.row(name, v.getX(), v.getY(), v.getZ(), v.getNorm(), unit);
    }
}
