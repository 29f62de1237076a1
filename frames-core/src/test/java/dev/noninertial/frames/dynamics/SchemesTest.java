package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * Every offered Hipparchus scheme solves the turntable puck (Newton's first law in the inertial
 * frame: a straight line, Taylor, Classical Mechanics, sec. 9.7) to its tolerance, and one solver
 * shared by several threads gives identical results (immutability of solver and frames).
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class SchemesTest {

    static final ReferenceFrame LAB = ReferenceFrame.inertialRoot("lab");
    static final ReferenceFrame TABLE = LAB.attach("table", Motions.spin(Vector3D.PLUS_K, 0.0, 2.0));
    static final PointState PUCK = PointState.of(new Vector3D(0.3, 0, 0), new Vector3D(0.2, 0.1, 0));

    static double offLine(Trajectory tr) {
        FramedState start = tr.initialState().in(LAB);
        double worst = 0;
        for (double t = 0; t <= 5.0; t += 0.25) {
            FramedState s = tr.at(t).in(LAB);
            worst = Math.max(worst, s.state().position().distance(
                    new Vector3D(1.0, start.state().position(), t, start.state().velocity())));
        }
        return worst;
    }

    @Test
    void everySchemeKeepsThePuckOnItsInertialLine() {
        for (IntegrationScheme scheme : IntegrationScheme.values()) {
            Trajectory tr = TrajectorySolver.of(TABLE).withScheme(scheme).withTolerance(1e-10, 1e-10, 1e-10)
                    .solve(PUCK, 0.0, 5.0);
            double worst = offLine(tr);
            System.out.printf("MEASURED scheme %s: off the line %.3e m, %d steps, %d evaluations%n",
                    tr.method(), worst, tr.stepCount(), tr.evaluations());
            // local tolerance 1e-10 (abs) + 1e-10 relative on ~3 m, over up to a few hundred
            // steps: 1e-6 m bounds the global error of every scheme
            assertTrue(worst < 1e-6, scheme + " off the line by " + worst + " m");
        }
    }

    @Test
    void sharedSolverGivesIdenticalResultsOnSeveralThreads() throws Exception {
        TrajectorySolver solver = TrajectorySolver.of(TABLE).withTolerance(1e-12);
        Vector3D reference = solver.solve(PUCK, 0.0, 5.0).finalState().state().position();
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            java.util.List<Future<Vector3D>> runs = new java.util.ArrayList<>();
            for (int i = 0; i < 4; i++) {
                runs.add(pool.submit(() -> solver.solve(PUCK, 0.0, 5.0).finalState().state().position()));
            }
            for (Future<Vector3D> f : runs) {
                // deterministic arithmetic: bit-identical
                assertEquals(reference, f.get());
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
