package dev.noninertial.frames.sensing;

import java.io.Serializable;
import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * A seeded, reproducible model of the errors of a real accelerometer triad and gyro triad, applied
 * to ideal readings or increments (from {@link IdealSensor}). Per axis: constant bias, scale-factor
 * error, misalignment (small-angle matrix), white noise, bias instability (first-order
 * Gauss-Markov or random walk), and quantization of increments.
 *
 * <h2>Definitions (IEEE Std 952-1997 for gyros, IEEE Std 1293-1998 for accelerometers)</h2>
 * For one triad with true increment {@code u} over a step {@code dt} (delta-velocity in m/s or
 * delta-angle in rad, sensor axes), the output of step {@code k} is
 * {@code y_k = (I + S + M) u + b_k dt + n_k}, then quantized:
 * <ul>
 *   <li>{@code S = diag(s)}: scale-factor errors (dimensionless; 100 ppm = 1e-4);</li>
 *   <li>{@code M}: misalignment, small angles off the diagonal (rad; {@code M[i][j]} is the
 *       sensitivity of axis i to motion along axis j), zero diagonal;</li>
 *   <li>{@code b_k = b0 + c_k}: constant bias {@code b0} plus the bias-instability state
 *       {@code c_k}, held over the step. Gauss-Markov: {@code c_{k+1} = p c_k + sigma sqrt(1 - p^2)
 *       w_k}, {@code p = exp(-dt / T)}, started in its stationary law (standard deviation sigma,
 *       correlation time T). Random walk (rate random walk K for gyros, acceleration random walk
 *       for accelerometers): {@code c_{k+1} = c_k + K sqrt(dt) w_k}, {@code c_0 = 0}; its Allan
 *       deviation is {@code K sqrt(tau / 3)};</li>
 *   <li>{@code n_k}: white noise of density N (angle random walk for gyros, data sheets give it in
 *       deg/sqrt(h); velocity random walk for accelerometers, (m/s)/sqrt(h); pass it in SI,
 *       rad/sqrt(s) and (m/s)/sqrt(s), through {@code dev.noninertial.frames.units.Units}):
 *       {@code n_k ~ N(0, N^2 dt)} per axis, so the Allan deviation of the rate is
 *       {@code N / sqrt(tau)};</li>
 *   <li>quantization with quantum q (m/s or rad): the output is a whole number of quanta, the
 *       remainder carried to the next step, as an accumulating counter does (the sum of the
 *       outputs never drifts from the sum of the unquantized values by more than q).</li>
 * </ul>
 * For readings (rates and specific forces sampled every {@code dt}) the same model applies to
 * {@code u = reading * dt} and the output is divided by {@code dt} (white noise of standard
 * deviation {@code N / sqrt(dt)}); quantization is not applied to readings.
 *
 * <p><b>Reproducibility.</b> A record is processed from its first step with a generator seeded by
 * {@link #seed()} ({@link SplittableRandom}); the same seed and the same inputs give the same bits.
 * Draws per step: gyro x, y, z noise, accelerometer x, y, z noise, then the bias-instability draws.
 *
 * <p>Immutable and thread-safe (every call makes its own generator). Results are for simulation.
 */
public final class SensorImperfections implements Serializable {

    /** The two triads of an inertial measurement unit. */
    public enum Triad {
        /** Accelerometers: increments are delta-velocities (m/s), readings specific forces (m/s^2). */
        ACCELEROMETERS,
        /** Gyros: increments are delta-angles (rad), readings angular rates (rad/s). */
        GYROS
    }

    private static final long serialVersionUID = 1L;

    /** Per triad (0 accelerometers, 1 gyros), per axis: constant bias. */
    private final double[][] bias;
    /** Per triad, per axis: scale-factor error (dimensionless). */
    private final double[][] scale;
    /** Per triad: the 3x3 small misalignment angles (rad), row-major. */
    private final double[][] misalignment;
    /** Per triad, per axis: white-noise density. */
    private final double[][] noise;
    /** Per triad, per axis: stationary standard deviation of the Gauss-Markov bias instability. */
    private final double[][] instability;
    /** Per triad: correlation time of the Gauss-Markov bias instability (s). */
    private final double[] correlationTime;
    /** Per triad: output quantum (m/s or rad), 0 for none. */
    private final double[] quantum;
    /** Seed of the noise generator. */
    private final long seed;

    private SensorImperfections(double[][] bias, double[][] scale, double[][] misalignment, double[][] noise,
                                double[][] instability, double[] correlationTime, double[] quantum, long seed) {
        this.bias = bias;
        this.scale = scale;
        this.misalignment = misalignment;
        this.noise = noise;
        this.instability = instability;
        this.correlationTime = correlationTime;
        this.quantum = quantum;
        this.seed = seed;
    }

    /**
     * A model with no error at all and a seed for the random terms added later.
     *
     * @param seed seed of the generator
     * @return the model
     */
    public static SensorImperfections seeded(long seed) {
        return new SensorImperfections(new double[2][3], new double[2][3], new double[2][9], new double[2][3],
                new double[2][3], new double[] {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY},
                new double[2], seed);
    }

    /**
     * Returns the seed.
     *
     * @return the seed
     */
    public long seed() {
        return seed;
    }

    private SensorImperfections copy() {
        return new SensorImperfections(deep(bias), deep(scale), deep(misalignment), deep(noise), deep(instability),
                correlationTime.clone(), quantum.clone(), seed);
    }

    private static double[][] deep(double[][] a) {
        return new double[][] {a[0].clone(), a[1].clone()};
    }

    private static void put(double[] target, String name, Vector3D v) {
        Arguments.finite(name, v);
        target[0] = v.getX();
        target[1] = v.getY();
        target[2] = v.getZ();
    }

    /**
     * A copy with a constant bias per axis.
     *
     * @param triad which triad
     * @param value bias (m/s^2 for accelerometers, rad/s for gyros), sensor axes
     * @return the copy
     */
    public SensorImperfections withBias(Triad triad, Vector3D value) {
        SensorImperfections c = copy();
        put(c.bias[Arguments.nonNull("triad", triad).ordinal()], "value", value);
        return c;
    }

    /**
     * A copy with scale-factor errors per axis.
     *
     * @param triad which triad
     * @param errors dimensionless errors (1e-4 = 100 ppm), each in [-0.5, 0.5]
     * @return the copy
     */
    public SensorImperfections withScaleFactor(Triad triad, Vector3D errors) {
        SensorImperfections c = copy();
        double[] s = c.scale[Arguments.nonNull("triad", triad).ordinal()];
        put(s, "errors", errors);
        for (int i = 0; i < 3; i++) {
            Arguments.inRange("errors component " + i, s[i], -0.5, 0.5);
        }
        return c;
    }

    /**
     * A copy with a misalignment matrix.
     *
     * @param triad which triad
     * @param angles 3x3 small angles (rad), {@code angles[i][j]} the sensitivity of axis i to
     *        motion along axis j; diagonal exactly 0; off-diagonal in [-0.1, 0.1] (small angles)
     * @return the copy
     */
    public SensorImperfections withMisalignment(Triad triad, double[][] angles) {
        Arguments.nonNull("angles", angles);
        if (angles.length != 3) {
            throw new IllegalArgumentException("angles must be 3x3, got " + angles.length + " rows");
        }
        SensorImperfections c = copy();
        double[] m = c.misalignment[Arguments.nonNull("triad", triad).ordinal()];
        for (int i = 0; i < 3; i++) {
            Arguments.nonNull("angles[" + i + "]", angles[i]);
            if (angles[i].length != 3) {
                throw new IllegalArgumentException("angles must be 3x3, row " + i + " has " + angles[i].length);
            }
            for (int j = 0; j < 3; j++) {
                double a = angles[i][j];
                if (i == j && a != 0.0) {
                    throw new IllegalArgumentException("angles[" + i + "][" + i + "] must be 0 (the diagonal is the "
                            + "scale factor), got " + a);
                }
                m[3 * i + j] = Arguments.inRange("angles[" + i + "][" + j + "]", a, -0.1, 0.1);
            }
        }
        return c;
    }

    /**
     * A copy with white noise: angle random walk for gyros, velocity random walk for accelerometers.
     *
     * @param triad which triad
     * @param density per axis, rad/sqrt(s) for gyros or (m/s)/sqrt(s) for accelerometers (from a data
     *        sheet: {@code Units.degreesPerRootHour}, {@code Units.metresPerSecondPerRootHour}), at least 0
     * @return the copy
     */
    public SensorImperfections withWhiteNoise(Triad triad, Vector3D density) {
        SensorImperfections c = copy();
        double[] n = c.noise[Arguments.nonNull("triad", triad).ordinal()];
        put(n, "density", density);
        for (int i = 0; i < 3; i++) {
            Arguments.inRange("density component " + i, n[i], 0.0, Double.MAX_VALUE);
        }
        return c;
    }

    /**
     * A copy with a first-order Gauss-Markov bias instability.
     *
     * @param triad which triad
     * @param sigma stationary standard deviation per axis (m/s^2 or rad/s), at least 0
     * @param correlationTime correlation time T (s), positive and finite
     * @return the copy
     */
    public SensorImperfections withBiasGaussMarkov(Triad triad, Vector3D sigma, double correlationTime) {
        Arguments.positive("correlationTime", correlationTime);
        SensorImperfections c = copy();
        int k = Arguments.nonNull("triad", triad).ordinal();
        put(c.instability[k], "sigma", sigma);
        for (int i = 0; i < 3; i++) {
            Arguments.inRange("sigma component " + i, c.instability[k][i], 0.0, Double.MAX_VALUE);
        }
        c.correlationTime[k] = correlationTime;
        return c;
    }

    /**
     * A copy with a random-walk bias (rate random walk for gyros).
     *
     * @param triad which triad
     * @param density K per axis, rad/s/sqrt(s) for gyros or (m/s^2)/sqrt(s) for accelerometers, at least 0
     * @return the copy
     */
    public SensorImperfections withBiasRandomWalk(Triad triad, Vector3D density) {
        SensorImperfections c = copy();
        int k = Arguments.nonNull("triad", triad).ordinal();
        put(c.instability[k], "density", density);
        for (int i = 0; i < 3; i++) {
            Arguments.inRange("density component " + i, c.instability[k][i], 0.0, Double.MAX_VALUE);
        }
        c.correlationTime[k] = Double.POSITIVE_INFINITY;
        return c;
    }

    /**
     * A copy with quantized increments.
     *
     * @param triad which triad
     * @param quantum the quantum (m/s or rad), positive, or 0 for none
     * @return the copy
     */
    public SensorImperfections withQuantum(Triad triad, double quantum) {
        SensorImperfections c = copy();
        c.quantum[Arguments.nonNull("triad", triad).ordinal()] = Arguments.inRange("quantum", quantum, 0.0,
                Double.MAX_VALUE);
        return c;
    }

    /**
     * Applies the model to a record of consecutive increments (layout of
     * {@link SensorIncrements#COMPONENTS}: delta-velocity x, y, z, then delta-angle x, y, z), as
     * from {@link IdealSensor#incrementsOver(double, double, int, double[], int)}. Source and target
     * may be the same range. Allocates nothing per increment.
     *
     * @param ideal the ideal increments
     * @param offset index of the first increment
     * @param interval step {@code dt} (s), positive
     * @param count number of increments
     * @param target receives the corrupted increments
     * @param targetOffset index of the first output
     * @throws IllegalArgumentException if a range does not fit or the interval is not positive
     */
    public void applyToIncrements(double[] ideal, int offset, double interval, int count, double[] target,
                                  int targetOffset) {
        apply(ideal, offset, interval, count, target, targetOffset, true);
    }

    /**
     * Applies the model to a log of increments of one interval length, as
     * {@link #applyToIncrements} does to the packed increments (the same values, bit for bit).
     *
     * @param ideal the ideal increments, for example from
     *        {@link IdealSensor#incrementsOver(double, double, int)}
     * @return the corrupted increments over the same intervals
     * @throws IllegalArgumentException if the log's intervals are not of one length
     */
    public IncrementLog applyTo(IncrementLog ideal) {
        Arguments.nonNull("ideal", ideal);
        double interval = ideal.uniformInterval();
        double[] packed = ideal.packed();
        applyToIncrements(packed, 0, interval, ideal.size(), packed, 0);
        return ideal.withPacked(packed);
    }

    /**
     * Applies the model to a record of readings sampled every {@code interval} (layout of
     * {@link InertialReading#COMPONENTS}: specific force x, y, z, then angular rate x, y, z), as from
     * {@link IdealSensor#readingsAt(double[], int, double[], int, int)}. No quantization. Source and
     * target may be the same range. Allocates nothing per reading.
     *
     * @param ideal the ideal readings
     * @param offset index of the first reading
     * @param interval sample interval {@code dt} (s), positive
     * @param count number of readings
     * @param target receives the corrupted readings
     * @param targetOffset index of the first output
     * @throws IllegalArgumentException if a range does not fit or the interval is not positive
     */
    public void applyToReadings(double[] ideal, int offset, double interval, int count, double[] target,
                                int targetOffset) {
        apply(ideal, offset, interval, count, target, targetOffset, false);
    }

    private void apply(double[] ideal, int offset, double dt, int count, double[] target, int targetOffset,
                       boolean increments) {
        Arguments.nonNull("ideal", ideal);
        Arguments.nonNull("target", target);
        Arguments.positive("interval", dt);
        Arguments.fromIndexSize("ideal", ideal, "offset", offset, "count", count, 6);
        Arguments.fromIndexSize("target", target, "targetOffset", targetOffset, "count", count, 6);
        long span = 6L * count;
        if (ideal == target && offset != targetOffset && Math.abs((long) offset - targetOffset) < span) {
            throw new IllegalArgumentException("ideal and target ranges overlap with different offsets");
        }
        SplittableRandom random = new SplittableRandom(seed);
        double rootDt = Math.sqrt(dt);
        double[] p = new double[2];
        double[] drive = new double[2];
        for (int k = 0; k < 2; k++) {
            double tc = correlationTime[k];
            p[k] = Double.isInfinite(tc) ? 1.0 : Math.exp(-dt / tc);
            drive[k] = Double.isInfinite(tc) ? rootDt : Math.sqrt(1.0 - p[k] * p[k]);
        }
        // state: bias instability per triad and axis, quantization remainders
        double[] c = new double[6];
        double[] rest = new double[6];
        for (int k = 0; k < 2; k++) {
            if (!Double.isInfinite(correlationTime[k])) {
                for (int i = 0; i < 3; i++) {
                    c[3 * k + i] = instability[k][i] * random.nextGaussian();   // stationary start
                }
            }
        }
        double unit = increments ? 1.0 : dt;
        double[] noiseDraw = new double[6];
        for (int n = 0; n < count; n++) {
            int src = offset + 6 * n;
            int dst = targetOffset + 6 * n;
            // draw order: gyro x, y, z noise, accelerometer x, y, z noise
            for (int i = 0; i < 3; i++) {
                noiseDraw[3 + i] = random.nextGaussian();
            }
            for (int i = 0; i < 3; i++) {
                noiseDraw[i] = random.nextGaussian();
            }
            for (int k = 0; k < 2; k++) {
                int base = 3 * k;
                double ux = ideal[src + base] * unit;
                double uy = ideal[src + base + 1] * unit;
                double uz = ideal[src + base + 2] * unit;
                double[] m = misalignment[k];
                double[] s = scale[k];
                for (int i = 0; i < 3; i++) {
                    double u = i == 0 ? ux : i == 1 ? uy : uz;
                    double y = u + s[i] * u + m[3 * i] * ux + m[3 * i + 1] * uy + m[3 * i + 2] * uz
                            + (bias[k][i] + c[base + i]) * dt + noise[k][i] * rootDt * noiseDraw[base + i];
                    if (increments && quantum[k] > 0) {
                        double total = y + rest[base + i];
                        double q = quantum[k] * Math.rint(total / quantum[k]);
                        rest[base + i] = total - q;
                        y = q;
                    }
                    target[dst + base + i] = increments ? y : y / dt;
                }
            }
            for (int k = 0; k < 2; k++) {
                for (int i = 0; i < 3; i++) {
                    if (instability[k][i] > 0) {
                        c[3 * k + i] = p[k] * c[3 * k + i] + instability[k][i] * drive[k] * random.nextGaussian();
                    }
                }
            }
        }
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("SensorImperfections{seed ").append(seed);
        String[] names = {"accelerometers", "gyros"};
        String[] units = {"m/s^2", "rad/s"};
        for (int k = 0; k < 2; k++) {
            b.append(", ").append(names[k]).append(": bias ")
                    .append(Formats.vector(bias[k][0], bias[k][1], bias[k][2], units[k]))
                    .append(", noise ").append(Formats.vector(noise[k][0], noise[k][1], noise[k][2], "per root s"))
                    .append(", quantum ").append(Formats.number(quantum[k]));
        }
        return b.append('}').toString();
    }
}
