package dev.noninertial.examples;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.motion.SpinProfile;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.frames.sensing.InertialReading;
import dev.noninertial.frames.units.Units;

/**
 * Scenario 4: what an ideal accelerometer triad and gyro triad read, on the crane hook of the
 * invented MV Tarrowind (scenario 2) and in the gondola of an invented centrifuge at the Kelvaro
 * Point range. Readings are specific force {@code f = a_inertial - gravitation} (at rest: minus
 * gravity, upward) and angular rate relative to inertial space, in sensor axes.
 */
final class SensorTruthScenario {

    private SensorTruthScenario() {
    }

    static List<ScenarioTable> run(DemoSetting s) {
        return List.of(craneHook(s), centrifuge(s));
    }

    private static ScenarioTable craneHook(DemoSetting s) {
        ReferenceFrame hull = ShipCraneScenario.hull(s, ShipCraneScenario.level(s));
        // sensor pod on the hook, axes parallel to the hull's, lowered with the hook
        ReferenceFrame pod = hull.attach("hook sensor pod", Motions.translation(ShipCraneScenario.HOOK.position(),
                ShipCraneScenario.HOOK.velocity()));
        IdealSensor imu = IdealSensor.of(pod, s.earth.gravitationIn(pod));
        ScenarioTable table = new ScenarioTable("sensor-hook",
                "MV Tarrowind (invented) crane hook: ideal accelerometer and gyro triads, hull axes (x fwd, y stbd, z down)")
                .column("t", "s", "%.1f")
                .column("f x", "m/s^2", "%.4f")
                .column("f y", "m/s^2", "%.4f")
                .column("f z", "m/s^2", "%.4f")
                .column("|f|", "g", "%.4f")
                .column("gyro x", "deg/s", "%.4f")
                .column("gyro y", "deg/s", "%.4f")
                .column("gyro z", "deg/s", "%.5f");
        for (double t = 0.0; t <= 10.0 + 1e-9; t += 1.0) {
            InertialReading r = imu.readingAt(t);
            Vector3D f = r.specificForce();
            Vector3D w = r.angularRate();
            table.row(t, f.getX(), f.getY(), f.getZ(), Units.toStandardGravities(f.getNorm()),
                    Units.toDegreesPerSecond(w.getX()), Units.toDegreesPerSecond(w.getY()),
                    Units.toDegreesPerSecond(w.getZ()));
        }
        table.note("at rest an accelerometer reads minus gravity: f z near -9.8 m/s^2 on a down axis; "
                + "the gyro includes the Earth's rotation");
        table.note("for analysis only: not for lift planning; defer to the vessel's approved lifting procedures");
        return table;
    }

    private static ScenarioTable centrifuge(DemoSetting s) {
        // the invented Orrin Hall centrifuge at Kelvaro Point: arm about the local vertical,
        // spin-up at 0.05 rad/s^2 to 2.2 rad/s (21 rpm), hold, spin-down
        double top = Units.rpm(21.0);
        double accel = 0.05;
        SpinProfile run = SpinProfile.startingAt(0.0, 0.0, 0.0).rampTo(top, accel).hold(30.0).rampTo(0.0, accel);
        ReferenceFrame arm = s.site.attach("centrifuge arm", Motions.turning(Vector3D.PLUS_K, run));
        // gondola 7.5 m out along the arm, 1.2 m above the site origin; axes x outward, y along
        // the motion, z up (fixed to the arm, no free swing)
        ReferenceFrame gondola = arm.attach("gondola", Motions.stationary(new Vector3D(7.5, 0, 1.2)));
        IdealSensor imu = IdealSensor.of(gondola, s.earth.gravitationIn(gondola));
        ScenarioTable table = new ScenarioTable("sensor-centrifuge",
                "Orrin Hall centrifuge (invented), gondola at 7.5 m: ideal triads, axes x outward, y along motion, z up")
                .column("t", "s", "%.1f")
                .column("arm rate", "rpm", "%.2f")
                .column("f out", "m/s^2", "%.4f")
                .column("f along", "m/s^2", "%.4f")
                .column("f up", "m/s^2", "%.4f")
                .column("|f|", "g", "%.3f")
                .column("gyro z", "deg/s", "%.3f");
        double end = run.end();
        for (double t : new double[] {0.0, 10.0, 20.0, 30.0, 44.0, 60.0, 74.0, 80.0, 90.0, end}) {
            InertialReading r = imu.readingAt(t);
            Vector3D f = r.specificForce();
            table.row(t, Units.toRpm(run.rate(t)), f.getX(), f.getY(), f.getZ(),
                    Units.toStandardGravities(f.getNorm()), Units.toDegreesPerSecond(r.angularRate().getZ()));
        }
        table.note(String.format(java.util.Locale.ROOT, "profile: %s", run));
        table.note("f out < 0: the gondola pushes its contents toward the axis (centripetal -w^2 r); "
                + "f along: the tangential acceleration al r during the ramps");
        table.note("human centrifuges: simulation only; defer to licensed practice, medical supervision "
                + "and the facility's approved procedures");
        return table;
    }
}
