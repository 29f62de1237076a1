package dev.noninertial.frames.dispersion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;

import org.hipparchus.distribution.continuous.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Issue 15: the dispersion types refuse what they cannot honour, naming the argument, the value
 * and the allowed range. Each check failed before the fix (the record took NaN, boundary ran out
 * of memory, the inversion gave -infinity, messages named other arguments).
 */
class DispersionRefusalTest {

    private static String refusal(Class<? extends RuntimeException> type, Executable call) {
        return assertThrows(type, call).getMessage();
    }

    @Test
    void ellipseRecordRefusesNonFiniteComponents() {
        String m = refusal(IllegalArgumentException.class,
                () -> new ConfidenceEllipse("x", "y", Double.NaN, 0, 1, 1, 0, 0.5, 1, 0, 1));
        assertTrue(m.startsWith("centreX must be finite, got NaN"), m);
        m = refusal(IllegalArgumentException.class,
                () -> new ConfidenceEllipse("x", "y", 0, 0, Double.POSITIVE_INFINITY, 1, 0, 0.5, 1, 0, 1));
        assertTrue(m.startsWith("semiMajor must be in [0.0, "), m);
        m = refusal(IllegalArgumentException.class,
                () -> new ConfidenceEllipse("x", "y", 0, 0, 1, 1, 0, 1.0, 1, 0, 1));
        assertTrue(m.startsWith("probability must be in (0, 1), got 1.0"), m);
        m = refusal(IllegalArgumentException.class,
                () -> new ConfidenceEllipse("x", "y", 0, 0, 1, 1, 0, 0.5, -1, 0, 1));
        assertTrue(m.startsWith("covXX must be in [0.0, "), m);
        m = refusal(NullPointerException.class, () -> new ConfidenceEllipse(null, "y", 0, 0, 1, 1, 0, 0.5, 1, 0, 1));
        assertTrue(m.startsWith("xName must not be null"), m);
    }

    @Test
    void ellipseRecordRefusesACorruptStream() throws IOException {
        // a record is read through its canonical constructor (Java Object Serialization
        // Specification, records), so the checks run on reading too
        ConfidenceEllipse e = ConfidenceEllipse.of("x", "y", 1, 2, 4, 0, 1, 0.95);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(e);
        }
        byte[] data = bytes.toByteArray();
        // centreX = 1.0 is stored as the big-endian bits of 1.0: replace them by NaN's
        byte[] one = longBytes(Double.doubleToRawLongBits(1.0));
        byte[] nan = longBytes(Double.doubleToRawLongBits(Double.NaN));
        int at = indexOf(data, one);
        assertTrue(at > 0, "1.0 found in the stream");
        System.arraycopy(nan, 0, data, at, 8);
        assertThrows(InvalidObjectException.class, () -> {
            try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(data))) {
                in.readObject();
            }
        });
    }

    private static byte[] longBytes(long v) {
        byte[] b = new byte[8];
        for (int i = 0; i < 8; i++) {
            b[i] = (byte) (v >>> (56 - 8 * i));
        }
        return b;
    }

    private static int indexOf(byte[] data, byte[] part) {
        outer:
        for (int i = 0; i + part.length <= data.length; i++) {
            for (int k = 0; k < part.length; k++) {
                if (data[i + k] != part[k]) {
                    continue outer;
                }
            }
            return i;
        }
        return -1;
    }

    @Test
    void boundaryRefusesACountAboveItsCap() {
        ConfidenceEllipse e = ConfidenceEllipse.of("x", "y", 0, 0, 4, 1, 2, 0.95);
        String m = refusal(IllegalArgumentException.class, () -> e.boundary(Integer.MAX_VALUE));
        assertEquals("count must be in [3, " + ConfidenceEllipse.MAX_BOUNDARY_POINTS + "], got "
                + Integer.MAX_VALUE, m);
        assertEquals(ConfidenceEllipse.MAX_BOUNDARY_POINTS, e.boundary(ConfidenceEllipse.MAX_BOUNDARY_POINTS).length);
    }

    @Test
    void atProbabilityRefusesOutsideTheGeneratorsRangeAndStaysFiniteInside() {
        InputDistribution normal = InputDistribution.normal(2.0, 3.0);
        String m = refusal(IllegalArgumentException.class, () -> normal.atProbability(Double.MIN_VALUE));
        assertTrue(m.startsWith("u must be in [1.1102230246251565E-16, 0.9999999999999999]"), m);
        assertTrue(m.endsWith("got 4.9E-324"), m);
        // the generator's extremes, 2^-53 and 1 - 2^-53, are inside and give finite values,
        // symmetric about the mean (the normal law is symmetric)
        double low = normal.atProbability(InputDistribution.MIN_PROBABILITY);
        double high = normal.atProbability(1.0 - InputDistribution.MIN_PROBABILITY);
        assertTrue(Double.isFinite(low) && Double.isFinite(high), low + " " + high);
        // 1 - 2^-53 is exact, so 2u - 1 is exact on both sides: tolerance a few ulps of 25
        assertEquals(2.0 - low, high - 2.0, 1e-13);
    }

    @Test
    void truncatedNormalInTheFarTailStaysFiniteAndInsideItsInterval() {
        // interval [-20, -5.9] sigma holds about 1.8e-9 (> MIN_TRUNCATED_MASS); before, u below
        // about 3e-8 mapped to a probability under 1e-17 and the draw was -infinity
        InputDistribution d = InputDistribution.truncatedNormal(0.0, 1.0, -20.0, -5.9);
        NormalDistribution phi = new NormalDistribution(0.0, 1.0);   // Hipparchus, the forward function
        double pLow = phi.cumulativeProbability(-20.0);
        double pHigh = phi.cumulativeProbability(-5.9);
        for (double u : new double[] {InputDistribution.MIN_PROBABILITY, 1e-12, 1e-8, 0.3, 0.999}) {
            double x = d.atProbability(u);
            assertTrue(x >= -20.0 && x <= -5.9, u + " -> " + x);
            // definition of the truncated inverse: Phi(x) = pLow + u (pHigh - pLow); relative
            // tolerance 1e-9 (Phi's relative accuracy in the tail is about 1e-14, times |x|^2
            // for the sensitivity of the draw)
            double target = pLow + u * (pHigh - pLow);
            assertEquals(target, phi.cumulativeProbability(x), 1e-9 * target, "u = " + u);
        }
    }

    @Test
    void truncationRefusalNamesMeanAndSigma() {
        String m = refusal(IllegalArgumentException.class,
                () -> InputDistribution.truncatedNormal(1e300, 0.5, 0.5, 1.0));
        assertTrue(m.contains("mean 1.0E300") && m.contains("sigma 0.5"), m);
        assertTrue(m.startsWith("[low, high] = [0.5, 1.0] must hold at least 1.0E-9"), m);
    }

    @Test
    void covarianceNamesTheArgumentAtFault() {
        DispersionResult r = DispersionStudy.of(c -> new double[] {2.0 * c.value(0)}, "y")
                .withInput("x", InputDistribution.normal(0.0, 1.0)).withCases(8).run();
        assertEquals("a must not be null", refusal(NullPointerException.class, () -> r.covariance(null, "x")));
        assertEquals("b must not be null", refusal(NullPointerException.class, () -> r.covariance("x", null)));
        String m = refusal(IllegalArgumentException.class, () -> r.covariance("x", "z"));
        assertTrue(m.startsWith("b must be one of [x] or [y], got 'z'"), m);
        m = refusal(IllegalArgumentException.class, () -> r.footprint("x", "x"));
        assertTrue(m.startsWith("y must differ from x"), m);
    }
}
