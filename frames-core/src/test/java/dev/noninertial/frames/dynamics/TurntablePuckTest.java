package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * A puck sliding without friction on a turntable that spins up, integrated in the turntable
 * frame (where Coriolis, centrifugal and Euler terms curl its path), moves on a straight line at
 * constant velocity in the inertial frame (Newton's first law; Taylor, Classical Mechanics,
 * sec. 9.7, the puck on a merry-go-round).
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class TurntablePuckTest {

    @Test
    void frictionlessPuckOnSpinningTableFollowsStraightInertialLine() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame table = lab.attach("table", Motions.spinUp(Vector3D.PLUS_K, 0.3, 3.0, 0.2));
        PointState onTable = PointState.of(new Vector3D(0.2, 0.0, 0.0), new Vector3D(0.5, 0.3, 0.0));
        // tolerances: the puck reaches ~10 m from the axis where the table turns at 5 rad/s, so
        // table-frame speeds reach ~50 m/s; 1e-13 relative keeps the local error below 1e-11 m
        Trajectory tr = TrajectorySolver.of(table)
                .withTolerance(1e-12, 1e-12, 1e-13)
                .solve(onTable, 0.0, 10.0);
        FramedState start = tr.initialState().in(lab);
        Vector3D r0 = start.state().position();
        Vector3D v0 = start.state().velocity();
        double worst = 0;
        double worstAccel = 0;
        for (double t = 0; t <= 10.0 + 1e-9; t += 0.05) {
            FramedState s = tr.at(Math.min(t, 10.0)).in(lab);
            worst = Math.max(worst, s.state().position().distance(new Vector3D(1.0, r0, s.time(), v0)));
            worstAccel = Math.max(worstAccel, s.state().acceleration().getNorm());
        }
        double tableRadius = tr.finalState().state().position().getNorm();
        System.out.printf("MEASURED puck: largest distance from the straight line %.3e m over %.2f m travelled"
                + " (table-frame radius at end %.2f m), largest inertial acceleration %.3e m/s^2, steps %d%n",
                worst, v0.getNorm() * 10, tableRadius, worstAccel, tr.stepCount());
        // 1e-9 m: local error bound of the tolerances times a few hundred steps
        assertTrue(worst < 1e-9, "off the line by " + worst + " m");
        // zero force: the inertial acceleration is the rounding of the table-frame terms (~250 m/s^2
        // centrifugal at the end), 1e-11 m/s^2
        assertTrue(worstAccel < 1e-11, "inertial acceleration " + worstAccel + " m/s^2");
    }
}
