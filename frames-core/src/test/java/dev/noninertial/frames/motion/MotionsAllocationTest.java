package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import java.util.LinkedHashMap;
import java.util.Map;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;

/**
 * Enforces the claim of {@link Motion#at(double, double[], int)}'s Javadoc: every motion made by a
 * factory of {@link Motions}, and every stack of them made by {@link Motion#then(Motion)}, writes
 * its placement on primitives without allocating. Measured as
 * frames-bench's gate does: the per-thread allocation counter
 * ({@code com.sun.management.ThreadMXBean#getCurrentThreadAllocatedBytes}) around a loop of calls,
 * after a warm-up, minimum over repetitions, minus the counter's own overhead. The counter is
 * exact, so the expected figure is 0 bytes; one allocated object per call would show as at least
 * 16 bytes times {@link #CALLS}.
 */
class MotionsAllocationTest {

    private static final int CALLS = 1000;

    private static Map<String, Motion> factories() {
        Map<String, Motion> m = new LinkedHashMap<>();
        m.put("stationary(offset)", Motions.stationary(new Vector3D(1, 2, 3)));
        m.put("stationary(offset, orientation)", Motions.stationary(new Vector3D(1, 2, 3),
                Orientations.fromYawPitchRoll(0.3, -0.2, 0.1)));
        m.put("spin", Motions.spin(new Vector3D(0.2, 0.1, 1.0), 0.4, 1.5));
        m.put("spinUp", Motions.spinUp(Vector3D.PLUS_K, 0.1, 0.5, 0.02));
        m.put("translation", Motions.translation(new Vector3D(1, 0, 0), new Vector3D(0, 2, 0),
                new Vector3D(0, 0, 0.3), new Vector3D(0.01, 0, 0)));
        m.put("oscillation", Motions.oscillation(Vector3D.PLUS_I, 0.1, 0.7, 0.2));
        m.put("heave", Motions.heave(Vector3D.PLUS_K, 1.5, 0.6, 0.0));
        // stacks made by Motion.then: two links, and a deeper stack whose outer link is a stack
        m.put("spin then heave", Motions.spin(new Vector3D(0.2, 0.1, 1.0), 0.4, 1.5)
                .then(Motions.heave(Vector3D.PLUS_K, 1.5, 0.6, 0.0)));
        m.put("translation then spinUp then oscillation", Motions.translation(new Vector3D(1, 0, 0),
                new Vector3D(0, 2, 0), new Vector3D(0, 0, 0.3), new Vector3D(0.01, 0, 0))
                .then(Motions.spinUp(Vector3D.PLUS_K, 0.1, 0.5, 0.02))
                .then(Motions.oscillation(Vector3D.PLUS_I, 0.1, 0.7, 0.2)));
        return m;
    }

    @Test
    void everyFactoryWritesPrimitivesWithoutAllocating() {
        com.sun.management.ThreadMXBean mx = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        assertTrue(mx.isThreadAllocatedMemorySupported(), "this JVM does not count allocated bytes per thread");
        mx.setThreadAllocatedMemoryEnabled(true);
        double[] target = new double[2 * Placement.COMPONENTS];
        StringBuilder report = new StringBuilder();
        for (Map.Entry<String, Motion> e : factories().entrySet()) {
            Motion motion = e.getValue();
            for (int i = 0; i < 20_000; i++) {   // warm-up: let the JIT compile the path
                motion.at(0.001 * i, target, i & 1);
            }
            long overhead = Long.MAX_VALUE;
            long best = Long.MAX_VALUE;
            for (int rep = 0; rep < 8; rep++) {
                long b0 = mx.getCurrentThreadAllocatedBytes();
                long b1 = mx.getCurrentThreadAllocatedBytes();
                overhead = Math.min(overhead, b1 - b0);
                long c0 = mx.getCurrentThreadAllocatedBytes();
                for (int i = 0; i < CALLS; i++) {
                    motion.at(0.37 * i, target, Placement.COMPONENTS * (i & 1));
                }
                long c1 = mx.getCurrentThreadAllocatedBytes();
                best = Math.min(best, c1 - c0);
            }
            long bytes = Math.max(0, best - overhead);
            report.append(String.format("%s: %d bytes for %d calls%n", e.getKey(), bytes, CALLS));
            assertEquals(0, bytes, e.getKey() + " allocates through at(t, double[], int)");
        }
        System.out.print(report);
    }

    @Test
    void thePrimitivePathWritesWhatTheObjectPathReturns() {
        // same-bits check: the Javadoc asks for exactly the values at(t) returns
        double[] viaArray = new double[Placement.COMPONENTS];
        double[] viaObject = new double[Placement.COMPONENTS];
        for (Map.Entry<String, Motion> e : factories().entrySet()) {
            for (double t : new double[] {0.0, 1.25, 40.0}) {
                e.getValue().at(t, viaArray, 0);
                e.getValue().at(t).toArray(viaObject, 0);
                for (int k = 0; k < Placement.COMPONENTS; k++) {
                    assertEquals(viaObject[k], viaArray[k], 0.0, e.getKey() + " component " + k + " at t = " + t);
                }
            }
        }
    }
}
