package dev.noninertial.examples;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * Runs the built-in worked scenarios and prints readable tables with units.
 *
 * <p>Scenario, places and vessels are invented for demonstration.
 */
public final class ScenarioRunner {

    private ScenarioRunner() {
    }

    /**
     * Entry point.
     *
     * @param args ignored for now
     */
    public static void main(String[] args) {
        System.out.println("Turntable at the (invented) Harrowmere test hall: 0.5 rad/s spin-up to 3 rad/s");
        ReferenceFrame hall = ReferenceFrame.inertialRoot("hall");
        ReferenceFrame table = hall.attach("turntable", Motions.spinUp(Vector3D.PLUS_K, 0.0, 0.5, 0.25));
        PointState cup = PointState.of(new Vector3D(1.2, 0.0, 0.0), new Vector3D(0.0, 0.3, 0.0));
        System.out.printf("%8s %14s %14s %14s %14s%n", "t [s]", "Euler [m/s^2]", "Coriolis", "centrifugal",
                "|total|");
        for (double t = 0.0; t <= 10.0; t += 2.5) {
            FramedState s = table.state(t, cup);
            FictitiousAccelerations f = s.fictitious();
            System.out.printf("%8.2f %14.5f %14.5f %14.5f %14.5f%n", t, f.euler().getNorm(),
                    f.coriolis().getNorm(), f.centrifugal().getNorm(), f.total().getNorm());
        }
    }
}
