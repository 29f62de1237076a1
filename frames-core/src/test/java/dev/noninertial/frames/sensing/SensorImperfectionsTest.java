package dev.noninertial.frames.sensing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.sensing.SensorImperfections.Triad;
import dev.noninertial.frames.units.Units;

/**
 * The error model against its definitions: deterministic terms exactly, and the white-noise and
 * random-walk levels recovered from a long simulated record by an overlapping Allan deviation
 * computed here (IEEE Std 952-1997, Annex C; REFERENCES.md, Inertial sensors and navigation:
 * white rate noise N gives N / sqrt(tau), rate random walk K gives K sqrt(tau / 3)).
 */
class SensorImperfectionsTest {

    @Test
    void deterministicTermsFollowTheirDefinition() {
        double[][] m = {{0, 1e-3, -2e-3}, {5e-4, 0, 0}, {0, -1e-3, 0}};
        SensorImperfections e = SensorImperfections.seeded(7L)
                .withBias(Triad.GYROS, new Vector3D(1e-5, -2e-5, 3e-5))
                .withScaleFactor(Triad.ACCELEROMETERS, new Vector3D(1e-4, 0, -3e-4))
                .withMisalignment(Triad.ACCELEROMETERS, m);
        double dt = 0.01;
        double[] ideal = {0.02, -0.01, -0.098, 1e-3, 2e-3, -1e-3};
        double[] out = new double[6];
        e.applyToIncrements(ideal, 0, dt, 1, out, 0);
        // y = (I + S + M) u + b dt, written out by hand
        assertEquals(0.02 * (1 + 1e-4) + 1e-3 * -0.01 - 2e-3 * -0.098, out[0], 1e-17);
        assertEquals(-0.01 + 5e-4 * 0.02, out[1], 1e-17);
        assertEquals(-0.098 * (1 - 3e-4) - 1e-3 * -0.01, out[2], 1e-17);
        assertEquals(1e-3 + 1e-5 * dt, out[3], 1e-18);
        assertEquals(2e-3 - 2e-5 * dt, out[4], 1e-18);
        assertEquals(-1e-3 + 3e-5 * dt, out[5], 1e-18);
        // readings: the same model on rates
        double[] r = new double[6];
        e.applyToReadings(new double[] {0, 0, 0, 0.1, 0, 0}, 0, dt, 1, r, 0);
        assertEquals(0.1 + 1e-5, r[3], 1e-16);
    }

    @Test
    void quantizedIncrementsCarryTheirRemainder() {
        double q = 1e-4;
        SensorImperfections e = SensorImperfections.seeded(3L).withQuantum(Triad.GYROS, q);
        int n = 1000;
        double[] ideal = new double[6 * n];
        for (int k = 0; k < n; k++) {
            ideal[6 * k + 3] = 3.7e-5 * (1 + Math.sin(0.01 * k));
        }
        double[] out = new double[6 * n];
        e.applyToIncrements(ideal, 0, 0.01, n, out, 0);
        double sumIdeal = 0;
        double sumOut = 0;
        for (int k = 0; k < n; k++) {
            sumIdeal += ideal[6 * k + 3];
            sumOut += out[6 * k + 3];
            // each output a whole number of quanta (1e-9 of a quantum: rounding of q * rint)
            assertEquals(Math.rint(out[6 * k + 3] / q), out[6 * k + 3] / q, 1e-9);
            // the running sums never part by more than half a quantum (plus rounding)
            assertTrue(Math.abs(sumOut - sumIdeal) <= 0.5 * q + 1e-15, "step " + k);
        }
    }

    @Test
    void allanDeviationRecoversAngleRandomWalkAndRateRandomWalk() {
        double arw = Units.degreesPerRootHour(0.15);           // a data-sheet value, deg/sqrt(h)
        double rrw = 8e-6;                                      // rad/s/sqrt(s), crossover near 10 s
        double vrw = Units.metresPerSecondPerRootHour(0.05);    // (m/s)/sqrt(h)
        SensorImperfections e = SensorImperfections.seeded(20261202L)
                .withWhiteNoise(Triad.GYROS, new Vector3D(arw, arw, arw))
                .withBiasRandomWalk(Triad.GYROS, new Vector3D(rrw, rrw, rrw))
                .withWhiteNoise(Triad.ACCELEROMETERS, new Vector3D(vrw, vrw, vrw));
        double dt = 0.01;
        int n = 1 << 21;                                        // 20,972 s of a sensor at rest
        double[] data = new double[6 * n];                      // ideal increments all zero
        e.applyToIncrements(data, 0, dt, n, data, 0);
        double[] velocity = cumulative(data, 0, n);
        double t1 = 0.1;
        double t2 = 300.0;
        // the three gyro axes are independent: average their Allan variances (3x the data)
        double s1 = 0;
        double s2 = 0;
        for (int axis = 3; axis < 6; axis++) {
            double[] angle = cumulative(data, axis, n);
            s1 += allanVariance(angle, dt, (int) Math.round(t1 / dt)) / 3;
            s2 += allanVariance(angle, dt, (int) Math.round(t2 / dt)) / 3;
        }
        // sigma^2(tau) = N^2 / tau + K^2 tau / 3 at two averaging times: a 2x2 linear system
        double det = (1 / t1) * (t2 / 3) - (t1 / 3) * (1 / t2);
        double n2 = (s1 * (t2 / 3) - (t1 / 3) * s2) / det;
        double k2 = ((1 / t1) * s2 - (1 / t2) * s1) / det;
        double nFit = Math.sqrt(n2);
        double kFit = Math.sqrt(k2);
        double vFit = Math.sqrt(allanVariance(velocity, dt, 10) * 0.1);
        System.out.printf(Locale.ROOT, "MEASURED Allan fit, 2^21 steps of 10 ms: ARW %.4f deg/sqrt(h) (set 0.15), "
                + "RRW %.3e rad/s/sqrt(s) (set 8e-6), VRW %.4f (m/s)/sqrt(h) (set 0.05)%n",
                Units.toDegreesPerRootHour(nFit), kFit, Units.toMetresPerSecondPerRootHour(vFit));
        // tolerances from the spread of the estimate: at tau = 0.1 s about 2e5 independent clusters
        // per axis (relative spread ~0.2 %), so 2 %; at tau = 300 s about 3 x 70 clusters of a
        // strongly correlated (random-walk) signal, whose Allan estimate spreads by roughly 10 %
        // in the deviation: 30 % (3 sigma)
        assertEquals(arw, nFit, 0.02 * arw);
        assertEquals(rrw, kFit, 0.30 * rrw);
        assertEquals(vrw, vFit, 0.02 * vrw);
    }

    @Test
    void gaussMarkovBiasHasItsStationarySpreadAndCorrelation() {
        double sigma = Units.degreesPerHour(1.0);
        double tau = 50.0;
        SensorImperfections e = SensorImperfections.seeded(11L)
                .withBiasGaussMarkov(Triad.GYROS, new Vector3D(sigma, sigma, sigma), tau);
        double dt = 1.0;
        int n = 200_000;                                         // 4000 correlation times
        double[] data = new double[6 * n];
        e.applyToIncrements(data, 0, dt, n, data, 0);
        double var = 0;
        double lag = 0;
        int l = (int) tau;
        for (int k = 0; k < n; k++) {
            var += data[6 * k + 3] * data[6 * k + 3];
            if (k + l < n) {
                lag += data[6 * k + 3] * data[6 * (k + l) + 3];
            }
        }
        var /= n;
        lag /= (n - l);
        // first-order Gauss-Markov: variance sigma^2, autocorrelation exp(-1) at lag T; ~2000
        // independent stretches: spread ~2 % on the variance, ~3 % on the ratio: 10 % tolerances
        assertEquals(sigma * sigma, var, 0.10 * sigma * sigma);
        assertEquals(Math.exp(-1), lag / var, 0.10 * Math.exp(-1));
    }

    @Test
    void sameSeedSameBitsAndRefusals() {
        SensorImperfections e = SensorImperfections.seeded(5L).withWhiteNoise(Triad.GYROS, new Vector3D(1e-4, 1e-4, 1e-4));
        double[] a = new double[60];
        double[] b = new double[60];
        e.applyToIncrements(new double[60], 0, 0.01, 10, a, 0);
        e.applyToIncrements(new double[60], 0, 0.01, 10, b, 0);
        assertArrayEquals(a, b);
        assertThrows(IllegalArgumentException.class, () -> e.withMisalignment(Triad.GYROS,
                new double[][] {{0.01, 0, 0}, {0, 0, 0}, {0, 0, 0}}));
        assertThrows(IllegalArgumentException.class, () -> e.withQuantum(Triad.GYROS, -1));
        assertThrows(IllegalArgumentException.class, () -> e.applyToIncrements(a, 0, 0.0, 10, b, 0));
        assertThrows(IllegalArgumentException.class, () -> e.applyToIncrements(a, 6, 0.01, 10, b, 0));
    }

    private static double[] cumulative(double[] data, int component, int n) {
        double[] c = new double[n + 1];
        for (int k = 0; k < n; k++) {
            c[k + 1] = c[k] + data[6 * k + component];
        }
        return c;
    }

    /** Overlapping Allan variance of the rate from the integrated signal, cluster of m steps. */
    private static double allanVariance(double[] theta, double dt, int m) {
        int n = theta.length - 1;
        double sum = 0;
        for (int k = 0; k + 2 * m <= n; k++) {
            double d = theta[k + 2 * m] - 2 * theta[k + m] + theta[k];
            sum += d * d;
        }
        double tau = m * dt;
        return sum / (2 * tau * tau * (n - 2 * m + 1));
    }
}
