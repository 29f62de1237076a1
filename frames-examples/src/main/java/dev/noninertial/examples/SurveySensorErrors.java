package dev.noninertial.examples;

import dev.noninertial.frames.units.Units;

/**
 * The invented error figures of Corvel-3's inertial sensor for the survey scenario: constant
 * biases per axis (accelerometers in micro-g, gyros in degrees per hour), added to ideal
 * increments. Demo data only.
 */
final class SurveySensorErrors {

    /** Short label of the erroneous sensor in the tables. */
    static final String LABEL = "biased sensor";

    /** Accelerometer biases, x, y, z (m/s^2): 50, -30, 40 micro-g. */
    static final double[] ACCELEROMETER_BIAS = {Units.standardGravities(50e-6), Units.standardGravities(-30e-6),
        Units.standardGravities(40e-6)};

    /** Gyro biases, x, y, z (rad/s): 1.0, -0.7, 0.5 deg/h. */
    static final double[] GYRO_BIAS = {Units.degreesPerHour(1.0), Units.degreesPerHour(-0.7),
        Units.degreesPerHour(0.5)};

    /** What the erroneous sensor carries, for the table notes. */
    static final String DESCRIPTION = "constant biases, accelerometers (50, -30, 40) micro-g, gyros "
            + "(1.0, -0.7, 0.5) deg/h (invented figures)";

    private SurveySensorErrors() {
    }

    /**
     * Ideal increments plus the biases integrated over each step.
     *
     * @param ideal increments, 6 per step (delta-velocity, then delta-angle, body axes)
     * @param step step length (s)
     * @param count number of steps
     * @return a new array with the erroneous increments
     */
    static double[] apply(double[] ideal, double step, int count) {
        double[] out = ideal.clone();
        for (int k = 0; k < count; k++) {
            for (int c = 0; c < 3; c++) {
                out[6 * k + c] += ACCELEROMETER_BIAS[c] * step;
                out[6 * k + 3 + c] += GYRO_BIAS[c] * step;
            }
        }
        return out;
    }
}
