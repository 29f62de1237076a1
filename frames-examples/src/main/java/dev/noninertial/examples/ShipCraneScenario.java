package dev.noninertial.examples;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.units.Units;
import dev.noninertial.geodesy.AttitudeSample;
import dev.noninertial.geodesy.GeodeticPath;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Scenario 2: the invented crane vessel MV Tarrowind steams at 9 kn on course 060 across the
 * invented Quessany Sound, heaving, rolling and pitching, while lowering a load from its crane
 * tip. The table gives, at the hook, the four inertial (fictitious) accelerations measured against
 * the Earth-centred inertial frame, and the apparent gravity a load line would follow there.
 */
final class ShipCraneScenario {

    private ShipCraneScenario() {
    }

    /** Crane tip: 22 m forward, 9 m to port, 31 m above the hull origin; hook lowered at 0.4 m/s. */
    static final PointState HOOK = PointState.of(new Vector3D(22.0, -9.0, -31.0), new Vector3D(0.0, 0.0, 0.4));

    /** The carried level frame (NED) of MV Tarrowind, 9 kn on course 060. */
    static ReferenceFrame level(DemoSetting s) {
        double speed = Units.knots(9.0);
        double course = Units.degrees(60.0);
        LatLonHeight start = LatLonHeight.ofDegrees(57.60, 11.20, 0.0);
        return s.earth.carriedLevel("Tarrowind level (NED)",
                GeodeticPath.steadyCourse(s.model.ellipsoid(), start,
                        new Vector3D(speed * Math.cos(course), speed * Math.sin(course), 0), LocalAxes.NED),
                LocalAxes.NED);
    }

    /** The heaving, rolling, pitching hull (x fwd, y stbd, z down) on a level frame made by {@link #level}. */
    static ReferenceFrame hull(DemoSetting s, ReferenceFrame level) {
        double course = Units.degrees(60.0);
        // heave: 1.1 m amplitude, 9 s period, along NED down
        ReferenceFrame heaving = level.attach("Tarrowind heave", Motions.heave(Vector3D.PLUS_K, 1.1,
                2 * Math.PI / 9.0, 0.0));
        double rollAmp = Units.degrees(5.0);
        double rollW = 2 * Math.PI / 10.0;
        double pitchAmp = Units.degrees(1.5);
        double pitchW = 2 * Math.PI / 7.0;
        return s.earth.body("Tarrowind hull (x fwd, y stbd, z down)", heaving, t -> {
            double sr = Math.sin(rollW * t);
            double sp = Math.sin(pitchW * t + 0.7);
            return new AttitudeSample(course, pitchAmp * sp, rollAmp * sr,
                    0.0, pitchAmp * pitchW * Math.cos(pitchW * t + 0.7), rollAmp * rollW * Math.cos(rollW * t),
                    0.0, -pitchW * pitchW * pitchAmp * sp, -rollW * rollW * rollAmp * sr);
        }, LocalAxes.NED);
    }

    static ScenarioTable run(DemoSetting s) {
        ReferenceFrame level = level(s);
        ReferenceFrame hull = hull(s, level);
        PointState hook = HOOK;
        ReferenceFrame inertial = s.earth.inertial();
        ScenarioTable table = new ScenarioTable("ship-crane",
                "MV Tarrowind (invented) crane hook: inertial terms against ECI, hull axes, 9 kn on 060")
                .column("t", "s", "%.1f")
                .column("roll", "deg", "%.2f")
                .column("pitch", "deg", "%.2f")
                .column("frame acc", "m/s^2", "%.4f")
                .column("Euler", "m/s^2", "%.4f")
                .column("Coriolis", "m/s^2", "%.5f")
                .column("centrifugal", "m/s^2", "%.5f")
                .column("apparent g", "m/s^2", "%.4f")
                .column("line tilt", "deg", "%.2f")
                .column("largest term", "", "%s");
        for (double t = 0.0; t <= 20.0 + 1e-9; t += 1.0) {
            FramedState here = hull.stateAt(t, hook);
            FictitiousAccelerations f = here.fictitious();
            Placement hullInEarth = hull.placementIn(s.earth.earthFixed(), t);
            Vector3D positionInEarth = hullInEarth.positionToBase(hook.position());
            Vector3D gravitation = hullInEarth.vectorFromBase(s.model.gravitation(positionInEarth));
            // what a plumb line or load line at the hook follows: real gravitation plus the inertial terms
            Vector3D apparent = gravitation.add(f.total());
            double tilt = Vector3D.angle(apparent, Vector3D.PLUS_K);
            double[] m = {f.frameAcceleration().getNorm(), f.euler().getNorm(), f.coriolis().getNorm(),
                f.centrifugal().getNorm()};
            String[] names = {"frame acceleration", "Euler", "Coriolis", "centrifugal"};
            int big = 0;
            for (int i = 1; i < 4; i++) {
                if (m[i] > m[big]) {
                    big = i;
                }
            }
            double[] ypr = Orientations.toYawPitchRoll(
                    hull.placementIn(level, t).orientation());
            table.row(t, Units.toDegrees(ypr[2]), Units.toDegrees(ypr[1]), m[0], m[1], m[2], m[3],
                    apparent.getNorm(), Units.toDegrees(tilt), names[big]);
        }
        table.note("roll 5 deg / 10 s, pitch 1.5 deg / 7 s, heave 1.1 m / 9 s; "
                + "hook 22 m fwd, 9 m port, 31 m up, lowered at 0.4 m/s");
        table.note("frame acceleration holds the hull origin's heave, turn and Earth-circling accelerations; "
                + "line tilt is from the hull's down axis");
        table.note("for analysis only: not for lift planning; defer to the vessel's approved lifting procedures");
        return table;
    }
}
