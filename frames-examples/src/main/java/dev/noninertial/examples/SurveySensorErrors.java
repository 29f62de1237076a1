package dev.noninertial.examples;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.sensing.SensorImperfections;
import dev.noninertial.frames.units.Units;

/**
 * The invented error model of Corvel-3's inertial sensor for the survey scenario, with the
 * sensing package's {@link SensorImperfections}: constant biases per axis (accelerometers in
 * micro-g, gyros in degrees per hour) and white noise (angle and velocity random walk), fixed seed.
 * Demo data only.
 */
final class SurveySensorErrors {

    /** Short label of the erroneous sensor in the tables. */
    static final String LABEL = "imperfect sensor";

    /** What the erroneous sensor carries, for the table notes. */
    static final String DESCRIPTION = "SensorImperfections, seed 20261202: biases, accelerometers (50, -30, 40) "
            + "micro-g, gyros (1.0, -0.7, 0.5) deg/h; random walks 0.02 (m/s)/sqrt(h), 0.05 deg/sqrt(h) "
            + "(invented figures)";

    /** The model. */
    static final SensorImperfections MODEL = SensorImperfections.seeded(20261202L)
            .withBias(SensorImperfections.Triad.ACCELEROMETERS, new Vector3D(Units.standardGravities(50e-6),
                    Units.standardGravities(-30e-6), Units.standardGravities(40e-6)))
            .withBias(SensorImperfections.Triad.GYROS, new Vector3D(Units.degreesPerHour(1.0),
                    Units.degreesPerHour(-0.7), Units.degreesPerHour(0.5)))
            .withWhiteNoise(SensorImperfections.Triad.ACCELEROMETERS,
                    new Vector3D(1, 1, 1).scalarMultiply(Units.metresPerSecondPerRootHour(0.02)))
            .withWhiteNoise(SensorImperfections.Triad.GYROS,
                    new Vector3D(1, 1, 1).scalarMultiply(Units.degreesPerRootHour(0.05)));

    private SurveySensorErrors() {
    }

    /**
     * Ideal increments with the model applied.
     *
     * @param ideal increments, 6 per step (delta-velocity, then delta-angle, body axes)
     * @param step step length (s)
     * @param count number of steps
     * @return a new array with the erroneous increments
     */
    static double[] apply(double[] ideal, double step, int count) {
        double[] out = new double[ideal.length];
        MODEL.applyToIncrements(ideal, 0, step, count, out, 0);
        return out;
    }
}
