package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Placement;

/**
 * Bad samples and queries the record cannot answer are refused with a message naming the sample
 * and the value (project rule: nothing clamped, dropped or extrapolated).
 */
class SampledMotionRefusalTest {

    private static final double[] T = {0, 1, 2, 3, 4, 5};
    private static final double[] P = new double[18];

    private static double[] identities(int n) {
        double[] q = new double[4 * n];
        for (int i = 0; i < n; i++) {
            q[4 * i] = 1;
        }
        return q;
    }

    private static String refusal(Runnable r) {
        return assertThrows(IllegalArgumentException.class, r::run).getMessage();
    }

    @Test
    void duplicateOrDecreasingTimesAreRefusedWithTheirIndex() {
        String m = refusal(() -> SampledMotion.fromArrays(new double[] {0, 1, 1, 3, 4, 5}, P, identities(6)));
        assertTrue(m.contains("sample 2") && m.contains("increase strictly"), m);
        m = refusal(() -> SampledMotion.fromArrays(new double[] {0, 1, 2, 1.5, 4, 5}, P, identities(6)));
        assertTrue(m.contains("sample 3") && m.contains("1.5"), m);
        m = refusal(() -> SampledMotion.fromArrays(new double[] {0, 1, 2, Double.NaN, 4, 5}, P, identities(6)));
        assertTrue(m.contains("sample 3") && m.contains("NaN"), m);
    }

    @Test
    void nonFiniteValuesAndBadLengthsAreRefused() {
        double[] p = P.clone();
        p[13] = Double.POSITIVE_INFINITY;
        String m = refusal(() -> SampledMotion.fromArrays(T, p, identities(6)));
        assertTrue(m.contains("sample 4") && m.contains("position y"), m);
        m = refusal(() -> SampledMotion.fromArrays(T, new double[17], identities(6)));
        assertTrue(m.contains("positions") && m.contains("17"), m);
        double[] v = new double[18];
        v[2] = Double.NaN;
        m = refusal(() -> SampledMotion.fromArrays(T, P, identities(6)).withVelocities(v));
        assertTrue(m.contains("sample 0") && m.contains("originVelocities[2]"), m);
        m = refusal(() -> SampledMotion.fromArrays(new double[] {0}, new double[3], identities(1)));
        assertTrue(m.contains("at least 2"), m);
    }

    @Test
    void quaternionsFarFromUnitNormAreRefused() {
        double[] q = identities(6);
        // 1e-6 is the library tolerance (Orientations.UNIT_QUATERNION_TOLERANCE): 1 + 5e-7 passes
        q[8] = 1 + 5e-7;
        SampledMotion ok = SampledMotion.fromArrays(T, P, q);
        assertEquals(1.0, ok.at(2).orientation().getQ0(), 1e-15);
        q[8] = 1 + 2e-6;
        String m = refusal(() -> SampledMotion.fromArrays(T, P, q));
        assertTrue(m.contains("sample 2") && m.contains("norm"), m);
    }

    @Test
    void underSampledTurnsAreRefused() {
        double[] q = identities(6);
        // 120 degrees about z between samples 2 and 3: q = (cos 60, 0, 0, sin 60)
        for (int i = 3; i < 6; i++) {
            q[4 * i] = 0.5;
            q[4 * i + 3] = Math.sqrt(0.75);
        }
        String m = refusal(() -> SampledMotion.fromArrays(T, P, q));
        assertTrue(m.contains("sample 3") && m.contains("120 deg"), m);
    }

    @Test
    void signFlippedQuaternionsAreTheSameAttitude() {
        // q and -q are one rotation (Hipparchus Rotation docs); a log may flip freely
        double[] q = identities(6);
        q[12] = -1;
        SampledMotion m = SampledMotion.fromArrays(T, P, q);
        Placement p = m.at(2.5);
        assertEquals(0, p.angularVelocity().getNorm(), 1e-15);
        assertEquals(1.0, Math.abs(p.orientation().getQ0()), 1e-15);
    }

    @Test
    void queriesOutsideTheSpanAreRefusedNotExtrapolated() {
        SampledMotion m = SampledMotion.fromArrays(T, P, identities(6));
        String msg = refusal(() -> m.at(-0.001));
        assertTrue(msg.contains("[0.0, 5.0]") && msg.contains("-0.001"), msg);
        refusal(() -> m.at(5.0000001));
        refusal(() -> m.at(Double.NaN));
        m.at(0);
        m.at(5);
        assertFalse(m.covers(5.1));
    }

    @Test
    void queriesInsideLongGapsAreRefused() {
        double[] t = {0, 1, 2, 3, 13, 14, 15, 16, 40};
        SampledMotion m = SampledMotion.fromArrays(t, new double[27], identities(9)).withMaxGap(2.0);
        String msg = refusal(() -> m.at(8));
        assertTrue(msg.contains("gap of 10.0 s") && msg.contains("sample 3") && msg.contains("max gap 2.0"), msg);
        // samples bordering the gap still answer from their own side
        m.at(3);
        m.at(13);
        assertTrue(m.covers(3) && m.covers(13) && !m.covers(3.5));
        // the last sample is isolated between a long gap and the end of the record
        msg = refusal(() -> m.at(40));
        assertTrue(msg.contains("isolated"), msg);
        // without limit the same record interpolates everywhere
        SampledMotion.fromArrays(t, new double[27], identities(9)).at(8);
        refusal(() -> m.withMaxGap(0));
        refusal(() -> m.withMaxGap(Double.NaN));
    }

    @Test
    void runsAcrossAGapAreIndependent() {
        // positions jump across the gap; with a limit, the left run must not feel the right one
        double[] t = {0, 1, 2, 3, 4, 10, 11, 12, 13, 14};
        double[] p = new double[30];
        for (int i = 5; i < 10; i++) {
            p[3 * i] = 100;
        }
        SampledMotion m = SampledMotion.fromArrays(t, p, identities(10)).withMaxGap(2);
        // a run of constant samples interpolates to the constant exactly (quartic reproduces it)
        assertEquals(0.0, m.at(3.5).origin().getX(), 0.0);
        assertEquals(0.0, m.at(3.5).originVelocity().getX(), 0.0);
        assertEquals(100.0, m.at(10.5).origin().getX(), 1e-13);
    }

    @Test
    void toStringShowsSpanAndCount() {
        SampledMotion m = SampledMotion.fromArrays(T, P, identities(6)).withMaxGap(1.5);
        assertEquals("sampled motion: 6 samples over [0, 5] s (5 s), max gap 1.5 s, velocities from positions,"
                + " angular rates from attitudes", m.toString());
    }
}
