/**
 * The library on Apache Spark: dispersion studies run as a Dataset of case indices
 * ({@link dev.noninertial.spark.SparkDispersion}) and large track logs converted through a frame
 * tree partition by partition with the allocation-free bulk API
 * ({@link dev.noninertial.spark.SparkFrameConversion}), and the survey quantities of large
 * gravity-survey logs, line by line ({@link dev.noninertial.spark.SparkSurvey}).
 *
 * <h2>Running</h2>
 * Spark is a {@code provided} dependency: a cluster supplies it, and on one machine the module's
 * compile and test class paths carry it, so {@link dev.noninertial.spark.SparkSessions#localOrSubmitted(int)}
 * starts an embedded local-mode session with nothing installed. Under {@code spark-submit} the
 * master given with {@code --master} is used instead. On Java 17 the JVM needs the
 * {@code --add-opens} flags listed in the module's {@code pom.xml} (property
 * {@code spark.jvm.flags}); {@code spark-submit} adds them itself.
 *
 * <p>Results are for simulation and analysis, not for safety-area or hazard decisions; defer to
 * local codes and licensed practice.
 */
package dev.noninertial.spark;
