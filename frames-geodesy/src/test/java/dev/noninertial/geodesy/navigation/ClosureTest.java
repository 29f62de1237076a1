package dev.noninertial.geodesy.navigation;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Locale;

import org.junit.jupiter.api.Test;

import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Closure with the truth (issue 13): the invented maneuvering vehicle of {@link ManeuverTrack},
 * 600 s, ideal increments at 50, 100 and 200 Hz, navigated from the true initial state; the end
 * state is compared with the truth of the library's frames (a physical invariant: ideal sensor
 * data of a motion navigate back to that motion).
 */
class ClosureTest {

    static final double DURATION = 600.0;

    @Test
    void maneuveringVehicleClosesOnTheTruth() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T09:00:00Z"));
        ReferenceFrame level = earth.carriedLevel("level", ManeuverTrack.path(), LocalAxes.NED);
        ReferenceFrame body = earth.body("vehicle", level, ManeuverTrack.attitude(), LocalAxes.NED);
        int fine = (int) Math.round(DURATION * 200);
        FrameIncrements at200 = FrameIncrements.of(earth, body, 0.0, 1.0 / 200, fine);
        LevelNavigator nav = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED);
        NavigationState start = Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), 0.0);
        int[] rates = {50, 100, 200};
        double[] pos = new double[3];
        double[] att = new double[3];
        for (int i = 0; i < 3; i++) {
            FrameIncrements inc = rates[i] == 200 ? at200 : at200.coarsen(200 / rates[i]);
            NavigationState end = nav.run(start, inc.ends, inc.deltaVelocity, inc.deltaAngle);
            NavigationState truth = Truth.at(ManeuverTrack.path(), ManeuverTrack.attitude(), end.time());
            pos[i] = Truth.positionError(end, truth);
            att[i] = Truth.attitudeError(end, truth);
            System.out.printf(Locale.ROOT, "closure %d Hz: position %.3e m, attitude %.3e rad, velocity %.3e m/s%n",
                    rates[i], pos[i], att[i], end.velocity().distance(truth.velocity()));
        }
        System.out.printf(Locale.ROOT, "order position %.2f / %.2f, attitude %.2f / %.2f%n",
                log2(pos[0] / pos[1]), log2(pos[1] / pos[2]), log2(att[0] / att[1]), log2(att[1] / att[2]));
        // bar of issue 13: at most 1 cm and 1e-6 rad at 100 Hz
        assertTrue(pos[1] <= 0.01, "position error at 100 Hz " + pos[1] + " m");
        assertTrue(att[1] <= 1e-6, "attitude error at 100 Hz " + att[1] + " rad");
    }

    static double log2(double x) {
        return Math.log(x) / Math.log(2.0);
    }
}
