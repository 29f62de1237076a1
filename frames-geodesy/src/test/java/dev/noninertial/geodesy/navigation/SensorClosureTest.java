package dev.noninertial.geodesy.navigation;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.frames.sensing.SensorIncrements;
import dev.noninertial.geodesy.AttitudeProfile;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.GeodeticPath;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Closure with the truth (issue 13) with the increments of the library's ideal sensor
 * ({@code IdealSensor} of the sensing package, fixed in the body frame of the Earth tree): the
 * maneuvering vehicle of {@link ManeuverTrack} over 600 s at 50, 100 and 200 Hz, and a vehicle
 * standing still for one hour at 100 Hz (physical invariants: ideal data of a motion navigate back
 * to that motion; at rest the terms cancel).
 */
class SensorClosureTest {

    static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T09:00:00Z"));

    @Test
    void maneuveringVehicleClosesWithTheIdealSensor() {
        ReferenceFrame level = EARTH.carriedLevel("level", ManeuverTrack.path(), LocalAxes.NED);
        ReferenceFrame body = EARTH.body("vehicle", level, ManeuverTrack.attitude(), LocalAxes.NED);
        IdealSensor sensor = IdealSensor.of(body, EARTH.gravitationIn(body));
        LevelNavigator nav = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED);
        NavigationState start = Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), 0.0);
        int[] rates = {50, 100, 200};
        double[] pos = new double[3];
        double[] att = new double[3];
        for (int i = 0; i < 3; i++) {
            int n = (int) Math.round(ClosureTest.DURATION * rates[i]);
            double h = 1.0 / rates[i];
            double[] inc = new double[SensorIncrements.COMPONENTS * n];
            sensor.incrementsOver(0.0, h, n, inc, 0);
            NavigationState end = nav.run(start, h, n, inc, 0, null);
            NavigationState truth = Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), end.time());
            pos[i] = Truth.positionError(end, truth);
            att[i] = Truth.attitudeError(end, truth);
            System.out.printf(Locale.ROOT, "sensor closure %d Hz: position %.3e m, attitude %.3e rad%n", rates[i],
                    pos[i], att[i]);
        }
        System.out.printf(Locale.ROOT, "sensor closure order: position %.2f / %.2f, attitude %.2f / %.2f%n",
                ClosureTest.log2(pos[0] / pos[1]), ClosureTest.log2(pos[1] / pos[2]),
                ClosureTest.log2(att[0] / att[1]), ClosureTest.log2(att[1] / att[2]));
        // bar of issue 13: at most 1 cm and 1e-6 rad at 100 Hz
        assertTrue(pos[1] <= 0.01, "position error at 100 Hz " + pos[1] + " m");
        assertTrue(att[1] <= 1e-6, "attitude error at 100 Hz " + att[1] + " rad");
    }

    @Test
    void standingStillForOneHourWithTheIdealSensor() {
        GeodeticPath still = GeodeticPath.stationary(ManeuverTrack.START);
        AttitudeProfile pose = AttitudeProfile.stationary(1.1, 0.05, -0.03);
        ReferenceFrame level = EARTH.carriedLevel("level", still, LocalAxes.NED);
        ReferenceFrame body = EARTH.body("vehicle", level, pose, LocalAxes.NED);
        IdealSensor sensor = IdealSensor.of(body, EARTH.gravitationIn(body));
        int n = 360_000;
        double[] inc = new double[SensorIncrements.COMPONENTS * n];
        sensor.incrementsOver(0.0, 0.01, n, inc, 0);
        Rotation r = Orientations.fromYawPitchRoll(1.1, 0.05, -0.03);
        NavigationState start = NavigationState.of(0.0, ManeuverTrack.START, Vector3D.ZERO, LocalAxes.NED, r);
        NavigationState end = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED).run(start, 0.01, n, inc, 0, null);
        double drift = Truth.ecef(end.position()).distance(Truth.ecef(ManeuverTrack.START));
        System.out.printf(Locale.ROOT, "sensor at rest, 1 h at 100 Hz: drift %.3e m, attitude %.3e rad%n", drift,
                Rotation.distance(end.attitude(), r));
        assertTrue(drift < 1e-3, "drift " + drift + " m");   // bar of issue 13
    }
}
