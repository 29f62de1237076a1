package dev.noninertial.geodesy.air;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.analysis.interpolation.HermiteInterpolator;
import org.junit.jupiter.api.Test;

/**
 * {@link DragCurve}: Fritsch and Carlson's monotone cubic (SIAM J. Numer. Anal. 17(2), 1980).
 * Checks: the published property (monotone on every interval, never outside the interval's two
 * data values) on random tables with a fixed seed; the cubic Hermite form evaluated independently
 * by Hipparchus {@code HermiteInterpolator} from the same values and slopes; exact reproduction
 * of linear data (a textbook property of cubic Hermite interpolation with exact slopes); C1
 * continuity by finite differences.
 */
class DragCurveTest {

    @Test
    void staysWithinEachIntervalsDataRangeAndIsMonotone() {
        Random random = new Random(20261202L);
        for (int table = 0; table < 200; table++) {
            int n = 2 + random.nextInt(12);
            double[] m = new double[n];
            double[] c = new double[n];
            double x = random.nextDouble();
            for (int i = 0; i < n; i++) {
                x += 0.01 + random.nextDouble() * (random.nextBoolean() ? 0.05 : 1.0);
                m[i] = x;
                // steps, plateaus and spikes: the shapes that make an ordinary spline overshoot
                c[i] = random.nextInt(4) == 0 && i > 0 ? c[i - 1] : random.nextDouble() * (random.nextBoolean() ? 0.1 : 1.0);
            }
            DragCurve curve = DragCurve.of(m, c);
            for (int k = 0; k < n - 1; k++) {
                double lo = Math.min(c[k], c[k + 1]);
                double hi = Math.max(c[k], c[k + 1]);
                double sign = Math.signum(c[k + 1] - c[k]);
                double previous = c[k];
                for (int j = 0; j <= 200; j++) {
                    double mach = m[k] + (m[k + 1] - m[k]) * j / 200.0;
                    double v = curve.at(Math.min(mach, m[k + 1]));
                    // the theorem is exact; 4 ulp of the data (~1e-16) is the round-off of the cubic
                    double eps = 4 * Math.ulp(hi);
                    assertTrue(v >= lo - eps && v <= hi + eps, "table " + table + " interval " + k + ": " + v
                            + " outside [" + lo + ", " + hi + "]");
                    assertTrue(sign * (v - previous) >= -eps, "not monotone in table " + table + " interval " + k);
                    previous = v;
                }
            }
        }
    }

    @Test
    void passesThroughTheTableAndAgreesWithHipparchusHermite() {
        double[] m = {0.0, 0.6, 0.85, 0.95, 1.05, 1.2, 2.0, 3.5};
        double[] c = {0.28, 0.28, 0.31, 0.42, 0.58, 0.56, 0.44, 0.36};   // invented transonic rise
        DragCurve curve = DragCurve.of(m, c);
        for (int i = 0; i < m.length; i++) {
            assertEquals(c[i], curve.at(m[i]), 0.0);
        }
        for (int k = 0; k < m.length - 1; k++) {
            HermiteInterpolator h = new HermiteInterpolator();
            h.addSamplePoint(m[k], new double[] {c[k]}, new double[] {curve.slopeAt(k)});
            h.addSamplePoint(m[k + 1], new double[] {c[k + 1]}, new double[] {curve.slopeAt(k + 1)});
            for (int j = 1; j < 10; j++) {
                double x = m[k] + (m[k + 1] - m[k]) * j / 10.0;
                // two evaluations of the same cubic in different forms: round-off ~1e-16
                assertEquals(h.value(x)[0], curve.at(x), 1e-14, "interval " + k);
            }
        }
    }

    @Test
    void reproducesLinearDataAndIsContinuouslyDifferentiable() {
        double[] m = {0.2, 0.5, 1.1, 1.3, 2.9};
        double[] c = new double[m.length];
        for (int i = 0; i < m.length; i++) {
            c[i] = 0.3 + 0.07 * m[i];
        }
        DragCurve line = DragCurve.of(m, c);
        for (double x = 0.2; x <= 2.9; x += 0.013) {
            // cubic Hermite with the exact slope reproduces a line (textbook): round-off only
            assertEquals(0.3 + 0.07 * x, line.at(x), 1e-15);
        }
        double[] mm = {0.0, 0.8, 1.0, 1.2, 3.0};
        double[] cc = {0.30, 0.32, 0.55, 0.60, 0.45};
        DragCurve curve = DragCurve.of(mm, cc);
        double d = 1e-7;
        for (int i = 1; i < mm.length - 1; i++) {
            double left = (curve.at(mm[i]) - curve.at(mm[i] - d)) / d;
            double right = (curve.at(mm[i] + d) - curve.at(mm[i])) / d;
            // one-sided differences err by d |p''| / 2: |p''| <= 6 |dCd| / h^2 ~ 35 on the steepest
            // interval gives 1.7e-6, plus round-off 1e-16 / d = 1e-9; 5e-6 bounds both
            assertEquals(curve.slopeAt(i), left, 5e-6, "left slope at " + mm[i]);
            assertEquals(curve.slopeAt(i), right, 5e-6, "right slope at " + mm[i]);
        }
    }

    @Test
    void constantCurveAndRefusals() {
        DragCurve flat = DragCurve.constant(0.47);
        assertEquals(0.47, flat.at(0.0), 0.0);
        assertEquals(0.47, flat.at(12.3), 0.0);
        DragCurve curve = DragCurve.of(new double[] {0.5, 1.0}, new double[] {0.3, 0.4});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> curve.at(0.4));
        assertTrue(e.getMessage().contains("machNumber must be in [0.5, 1.0] (the drag table), got 0.4"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> curve.at(1.0000001));
        assertThrows(IllegalArgumentException.class, () -> curve.at(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> DragCurve.of(new double[] {0.5}, new double[] {0.3}));
        assertThrows(IllegalArgumentException.class, () -> DragCurve.of(new double[] {0.5, 0.5}, new double[] {0.3, 0.3}));
        assertThrows(IllegalArgumentException.class, () -> DragCurve.of(new double[] {-0.1, 0.5}, new double[] {0.3, 0.3}));
        assertThrows(IllegalArgumentException.class, () -> DragCurve.of(new double[] {0.1, 0.5}, new double[] {0.3, -0.3}));
        assertThrows(IllegalArgumentException.class, () -> DragCurve.of(new double[] {0.1, 0.5}, new double[] {0.3}));
        assertThrows(IllegalArgumentException.class, () -> DragCurve.constant(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> WindProfile.layered(new double[] {0, 0},
                new double[] {1, 1}, new double[] {0, 0}));
        WindProfile layered = WindProfile.layered(new double[] {0, 1000}, new double[] {2, 4}, new double[] {0, -2});
        assertEquals(3.0, layered.velocityAt(500.0, 0.0).getX(), 1e-15);   // linear between heights
        assertThrows(IllegalArgumentException.class, () -> layered.velocityAt(1000.5, 0.0));
    }
}
