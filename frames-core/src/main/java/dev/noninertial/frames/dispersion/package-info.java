/**
 * Dispersion studies: a user model run over many cases whose inputs are drawn from stated
 * distributions, and the statistics of the outcomes (mean, covariance, confidence ellipse,
 * circular error probable, percentiles, CSV table).
 *
 * <h2>Reproducibility</h2>
 * Case {@code i} of a study with master seed {@code s} draws its inputs from its own generator,
 * seeded with output number {@code i} of the SplitMix64 sequence started at {@code s}
 * (Steele, Lea and Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014;
 * see {@link dev.noninertial.frames.dispersion.SplitMix64}). A case therefore depends only on
 * the master seed and its own index: any case can be re-run alone, and any split of the cases
 * between threads, processes or machines gives the same outcomes bit for bit.
 *
 * <h2>Units</h2>
 * The library imposes none: inputs and outcomes carry whatever units the user's model uses. Name
 * them with the unit (for example {@code east_m}) so the CSV table says what it holds.
 *
 * <p>Results are for simulation and analysis. They are not for planning safety or hazard areas,
 * aiming, or any decision on which safety depends; defer to local codes, standards and licensed
 * practice.
 */
package dev.noninertial.frames.dispersion;
