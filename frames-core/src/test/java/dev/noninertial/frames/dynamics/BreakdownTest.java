package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * The sampled breakdown of the acceleration against textbook values for a uniformly spinning
 * disk (Taylor, Classical Mechanics, ch. 9): a point held at radius r by a real centripetal force
 * -w^2 r stays at rest on the disk, feels a centrifugal term w^2 r outward and no Coriolis or
 * Euler term; a point moving with the disk's rim speed shows a Coriolis term 2 w v.
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class BreakdownTest {

    @Test
    void heldPointShowsCentrifugalBalancedByRealForce() {
        double w = 2.0;
        double r = 1.5;
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame disk = lab.attach("disk", Motions.spin(Vector3D.PLUS_K, 0.0, w));
        SpecificForce spoke = (t, s) -> s.position().scalarMultiply(-w * w);   // centripetal pull
        Trajectory tr = TrajectorySolver.of(disk).plusForce(spoke).withTolerance(1e-12)
                .solve(PointState.stationary(new Vector3D(r, 0, 0)), 0.0, 10.0);
        List<TrajectorySample> samples = tr.samples(2.5);
        assertEquals(5, samples.size());                  // 0, 2.5, 5, 7.5, 10
        assertEquals(10.0, samples.get(4).time(), 0.0);
        for (TrajectorySample s : samples) {
            FictitiousAccelerations f = s.fictitious();
            // w^2 r outward (Taylor ch. 9); rounding only, 1e-12 relative
            // sources: REFERENCES.md, Analytic results of mechanics
            assertEquals(w * w * r, f.centrifugal().getX(), 1e-9 * w * w * r);
            assertEquals(-w * w * r, s.realForce().getX(), 1e-9 * w * w * r);
            assertEquals(0.0, f.coriolis().getNorm(), 1e-9);
            assertEquals(0.0, f.euler().getNorm(), 0.0);
            assertEquals(0.0, f.frameAcceleration().getNorm(), 0.0);
            assertEquals(0.0, s.acceleration().getNorm(), 1e-9);
            // the state's acceleration is the breakdown's sum
            assertEquals(0.0, s.state().state().acceleration().distance(s.acceleration()), 0.0);
        }
        String table = tr.breakdownTable(5.0);
        System.out.print("MEASURED breakdown table (held point on a disk):\n" + table);
        assertEquals(4, table.split("\n").length);        // header + 0, 5, 10 s
        assertTrue(table.contains("centrifugal"));
    }

    @Test
    void samplesIncludeTheEndWhenOffTheGridAndCoriolisMatchesTextbook() {
        double w = 0.5;
        double v = 3.0;
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame disk = lab.attach("disk", Motions.spin(Vector3D.PLUS_K, 0.0, w));
        Trajectory tr = TrajectorySolver.of(disk).withTolerance(1e-12)
                .solve(PointState.of(Vector3D.ZERO, new Vector3D(v, 0, 0)), 0.0, 1.0e-3);
        List<TrajectorySample> samples = tr.samples(3e-4);   // 0, 3e-4, 6e-4, 9e-4, then 1e-3
        assertEquals(5, samples.size());
        assertEquals(1.0e-3, samples.get(4).time(), 0.0);
        // at t = 0 the point at the axis moves along x: Coriolis -2 w x v = (0, -2 w v, 0)
        // (Taylor ch. 9: magnitude 2 w v, to the right of the motion for counter-clockwise spin)
        // sources: REFERENCES.md, Analytic results of mechanics
        Vector3D coriolis = tr.fictitiousAt(0.0).coriolis();
        assertEquals(-2 * w * v, coriolis.getY(), 1e-15);
        assertEquals(0.0, coriolis.getX(), 1e-15);
    }
}
