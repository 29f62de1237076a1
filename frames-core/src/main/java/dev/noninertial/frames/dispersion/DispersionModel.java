package dev.noninertial.frames.dispersion;

import java.io.Serializable;

/**
 * The user's model of a {@link DispersionStudy}: from the drawn inputs of one case to its outcome
 * vector (for example the impact point's east and north offsets and the flight time).
 *
 * <p>Contract: a pure function of the case (its inputs and, if wanted, its index); called from
 * several threads at once by the local runner and on cluster executors by the Spark runner, so
 * it must be thread-safe and {@link Serializable} with everything it captures. It returns a new
 * array of the study's outcome count with finite values; the runner refuses anything else and
 * names the case.
 */
@FunctionalInterface
public interface DispersionModel extends Serializable {

    /**
     * The outcome vector of one case.
     *
     * @param inputs the case's drawn inputs, by name or position
     * @return the outcomes, in the order of the study's outcome names
     */
    double[] outcome(DispersionCase inputs);
}
