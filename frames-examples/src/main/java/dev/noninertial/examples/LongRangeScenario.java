package dev.noninertial.examples;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.frames.dynamics.TrajectoryEvent;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.units.Units;

/**
 * Scenario 3: a drag-free ballistic test body leaves the Kelvaro Point range at 800 m/s and 45
 * degrees elevation on four azimuths. Each flight is integrated twice in the site's
 * east-north-up frame: on the rotating Earth (force: gravitation; the solver adds Coriolis,
 * centrifugal and the site's own acceleration), and on the same Earth held still (force: normal
 * gravity, the usual non-rotating model). The difference of the impact points is the deflection
 * due to the Earth's rotation.
 */
final class LongRangeScenario {

    private LongRangeScenario() {
    }

    static ScenarioTable run(DemoSetting s) {
        double speed = 800.0;
        double elevation = Units.degrees(45.0);
        double ground = DemoSetting.KELVARO_POINT.height();
        // the non-rotating comparison: the same site geometry fixed in an inertial root
        Placement fixed = s.siteInEarth;
        ReferenceFrame still = ReferenceFrame.inertialRoot("Earth held still")
                .attach("Kelvaro Point ENU (still)", Motions.stationary(fixed.origin(), fixed.orientation()));
        SpecificForce normalGravity = (t, p) -> s.normalGravityInSite(p.position());
        TrajectoryEvent impact = TrajectoryEvent.of("impact", (t, p) -> s.heightOf(p.position()) - ground)
                .fallingOnly().stopping().withCheckInterval(1.0);
        TrajectorySolver rotating = TrajectorySolver.of(s.site).plusForce(s.gravitationInSite())
                .withTolerance(1e-6, 1e-9, 1e-12).withMaxStep(5.0).plusEvent(impact);
        TrajectorySolver held = TrajectorySolver.of(still).plusForce(normalGravity)
                .withTolerance(1e-6, 1e-9, 1e-12).withMaxStep(5.0).plusEvent(impact);

        ScenarioTable table = new ScenarioTable("long-range",
                "Drag-free test body from Kelvaro Point (invented), 800 m/s at 45 deg: Earth rotation on and off")
                .column("azimuth", "deg", "%.0f")
                .column("flight time", "s", "%.2f")
                .column("range", "km", "%.3f")
                .column("time change", "s", "%.3f")
                .column("range change", "m", "%.1f")
                .column("cross-range (right +)", "m", "%.1f")
                .column("Coriolis at apex", "m/s^2", "%.5f");
        for (double azimuthDeg = 0.0; azimuthDeg < 360.0; azimuthDeg += 90.0) {
            double az = Units.degrees(azimuthDeg);
            Vector3D along = new Vector3D(Math.sin(az), Math.cos(az), 0.0);
            Vector3D right = new Vector3D(Math.cos(az), -Math.sin(az), 0.0);
            Vector3D v0 = new Vector3D(speed * Math.cos(elevation), along,
                    speed * Math.sin(elevation), Vector3D.PLUS_K);
            PointState launch = PointState.of(Vector3D.ZERO, v0);
            Trajectory withSpin = rotating.solve(launch, 0.0, 600.0);
            Trajectory without = held.solve(launch, 0.0, 600.0);
            Vector3D a = withSpin.finalState().state().position();
            Vector3D b = without.finalState().state().position();
            Vector3D d = a.subtract(b);
            double apex = 0.5 * withSpin.endTime();
            table.row(azimuthDeg, withSpin.endTime(), a.dotProduct(along) / 1e3,
                    withSpin.endTime() - without.endTime(), d.dotProduct(along), d.dotProduct(right),
                    withSpin.fictitiousAt(apex).coriolis().getNorm());
        }
        table.note("deflection = impact with rotation minus impact without, in the launch site's horizontal axes");
        table.note("no drag, no wind, no terrain: not a firing table; not for aiming or safety-area decisions");
        return table;
    }
}
