package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicReference;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.frames.motion.Motions;

/**
 * Issue 15, class 2: a chain of 100,000 links works everywhere the tree is walked, on a thread
 * with a small stack (256 KiB), so nothing may recurse once per link. Check values: a chain of
 * fixed offsets of 1 mm along x places the leaf n mm from the root (exact sum of the offsets,
 * translation composition, DEVELOPERS.md conventions), and the free particle stays on a straight
 * line in the inertial root (Newton's first law).
 */
class DeepChainTest {

    private static final int LINKS = 100_000;

    private static void onSmallStack(Runnable body) throws InterruptedException {
        AtomicReference<Throwable> failure = new AtomicReference<>();
        Thread t = new Thread(null, () -> {
            try {
                body.run();
            } catch (Throwable e) {
                failure.set(e);
            }
        }, "small-stack", 256 * 1024);
        t.start();
        t.join();
        if (failure.get() != null) {
            throw new AssertionError(failure.get());
        }
    }

    private static ReferenceFrame[] chain() {
        ReferenceFrame[] f = new ReferenceFrame[LINKS + 1];
        f[0] = ReferenceFrame.inertialRoot("r");
        Motion step = Motions.stationary(new Vector3D(1e-3, 0, 0));
        for (int i = 1; i <= LINKS; i++) {
            f[i] = f[i - 1].attach("f" + i, step);
        }
        return f;
    }

    @Test
    void placementPathStateAndSolverWorkAtAnyDepth() throws InterruptedException {
        ReferenceFrame[] f = chain();
        ReferenceFrame leaf = f[LINKS];
        onSmallStack(() -> {
            // offsets of 1e-3 m summed 1e5 times: the rounding of each sum is at most half an ulp of
            // 100 m (7e-15 m), so the total error stays below 1e5 * 7e-15 = 7e-10 m
            assertEquals(100.0, leaf.placementIn(f[0], 0.0).origin().getX(), 1e-9);
            assertEquals(-50.0, f[LINKS / 2].placementIn(leaf, 0.0).origin().getX(), 1e-9);
            String path = leaf.path();
            assertTrue(path.startsWith("r/f1/f2/") && path.endsWith("/f99999/f100000"), path.substring(0, 20));
            FramedState s = leaf.stateAt(0.0, PointState.stationary(Vector3D.ZERO));
            assertEquals(100.0, s.in(f[0]).state().position().getX(), 1e-9);
            assertEquals(0.0, s.fictitious().total().getNorm(), 0.0);
        });
    }

    @Test
    void pathIsLinearInTime() {
        ReferenceFrame leaf = chain()[LINKS];
        // 100,000 names of about 6 characters: quadratic concatenation would copy about 3e10 chars
        long start = System.nanoTime();
        for (int i = 0; i < 20; i++) {
            // "r" + "/f" + i for i = 1..100000: 1 + 2 * 100000 + (9 + 180 + 2700 + 36000 + 450000 + 6) digits
            assertEquals(1 + 200_000 + 488_895, leaf.path().length());
        }
        double seconds = (System.nanoTime() - start) * 1e-9;
        // common practice: a generous bound (20 paths of 0.7 MB each take milliseconds when linear)
        assertTrue(seconds < 5.0, "20 paths took " + seconds + " s");
    }

    @Test
    void theSolverIntegratesInADeepFrame() throws InterruptedException {
        ReferenceFrame[] f = new ReferenceFrame[10_001];
        f[0] = ReferenceFrame.inertialRoot("r");
        for (int i = 1; i < f.length; i++) {
            f[i] = f[i - 1].attach("f" + i, Motions.stationary(new Vector3D(0, 1e-3, 0)));
        }
        onSmallStack(() -> {
            Trajectory tr = TrajectorySolver.of(f[f.length - 1]).solve(
                    PointState.of(Vector3D.ZERO, new Vector3D(1, 0, 0)), 0.0, 2.0);
            // free particle, no force, fixed frames: x = v t exactly up to the integrator tolerance
            assertEquals(2.0, tr.finalState().state().position().getX(), 1e-6);
            assertEquals(10.0 + 0.0, tr.finalState().in(f[0]).state().position().getY(), 1e-9);
        });
    }

    @Test
    void aChainIsSerializedWithoutRecursion() throws InterruptedException {
        ReferenceFrame[] f = chain();
        onSmallStack(() -> {
            try {
                FramedState s = f[LINKS].stateAt(1.0, PointState.stationary(Vector3D.ZERO));
                FramedState back = (FramedState) StreamPatch.roundTrip(s);
                assertEquals(LINKS, back.frame().depth());
                assertEquals(f[LINKS].path(), back.frame().path());
                assertEquals(s.in(f[0]).state(), back.in(back.frame().root()).state());
            } catch (Exception e) {
                throw new AssertionError(e);
            }
        });
    }
}
