package dev.noninertial.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import dev.noninertial.geodesy.navigation.NavigationState;

/**
 * The hand-written navigation step computes what the library's step computes (otherwise their
 * speed ratio compares different work): both navigate the same 1000 steps, with a turning body
 * so that every branch runs, to the same state within rounding.
 */
class NavigationBaselineTest {

    @Test
    void baselineAndLibraryAgree() {
        NavigationScenario sc = new NavigationScenario();
        double[] w = sc.navigator.newWork(sc.start);
        double[] b = sc.baselineState();
        double t = 0.0;
        for (int k = 0; k < 1000; k++) {
            t += NavigationScenario.STEP;
            // at-rest increments plus a slow wobble of 1e-3 rad per step about x
            double extra = 1e-3 * Math.sin(0.05 * k);
            sc.navigator.advance(w, t, sc.dv[0], sc.dv[1] + 1e-3 * Math.cos(0.03 * k), sc.dv[2], sc.da[0] + extra,
                    sc.da[1], sc.da[2]);
            NavigationBaseline.step(b, t, sc.dv[0], sc.dv[1] + 1e-3 * Math.cos(0.03 * k), sc.dv[2], sc.da[0] + extra,
                    sc.da[1], sc.da[2]);
        }
        NavigationState s = sc.navigator.stateOf(w);
        // same formulas in another order: agreement to rounding, 1e-12 relative on positions and rates
        assertEquals(s.position().latitude(), b[1], 1e-14);
        assertEquals(s.position().longitude(), b[2], 1e-14);
        assertEquals(s.position().height(), b[3], 1e-8);
        assertEquals(s.velocity().getX(), b[4], 1e-10);
        assertEquals(s.velocity().getY(), b[5], 1e-10);
        assertEquals(s.velocity().getZ(), b[6], 1e-10);
        double[] q = dev.noninertial.frames.Orientations.toQuaternion(s.attitude());
        double sign = Math.signum(q[0] * b[7]);
        for (int i = 0; i < 4; i++) {
            assertEquals(q[i], sign * b[7 + i], 1e-12);
        }
    }
}
