package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Placement;

/**
 * The interval search agrees with the JDK's binary search (Arrays.binarySearch) on irregular time
 * stamps: a wide mix of short and long intervals, fixed seed, so the uniform first guess is often
 * far off and both galloping directions are exercised.
 */
class SampledMotionSearchTest {

    @Test
    void findsTheRightIntervalOnIrregularTimes() {
        Random random = new Random(11);
        int n = 2000;
        double[] t = new double[n];
        for (int i = 1; i < n; i++) {
            // intervals from 1e-3 s to 10 s, log-uniform: the uniform guess is often far off
            t[i] = t[i - 1] + Math.pow(10, -3 + 4 * random.nextDouble());
        }
        double[] p = new double[3 * n];
        double[] q = new double[4 * n];
        for (int i = 0; i < n; i++) {
            p[3 * i] = 2.0 * t[i] - 1.0;
            q[4 * i] = 1.0;
        }
        SampledMotion m = SampledMotion.fromArrays(t, p, q);
        for (int k = 0; k < 20000; k++) {
            double time = k % 97 == 0 ? t[random.nextInt(n)] : random.nextDouble() * t[n - 1];
            int found = Arrays.binarySearch(t, time);
            int expected = Math.min(found >= 0 ? found : -found - 2, n - 2);
            int index = m.intervalIndex(time);
            // at a sample time both neighbouring intervals contain it; otherwise exactly one does
            boolean ok = index == expected || (found >= 0 && index == expected - 1);
            assertEquals(true, ok && t[index] <= time && time <= t[index + 1], "t = " + time + ": " + index
                    + " vs " + expected);
            // collinear samples: the quartic stencils reproduce the line (to rounding, 1e-9 of |x|)
            Placement at = m.at(time);
            assertEquals(2.0 * time - 1.0, at.origin().getX(), 1e-9 * (1 + Math.abs(2 * time)), "t = " + time);
        }
        // and every sample time is found, against Arrays.binarySearch (JDK)
        for (int i = 0; i < n; i++) {
            assertEquals(i, Arrays.binarySearch(t, m.sampleTime(i)));
            assertEquals(2.0 * t[i] - 1.0, m.at(t[i]).origin().getX(), 1e-9 * (1 + 2 * t[i]));
        }
    }
}
