package dev.noninertial.spark;

import org.apache.spark.SparkConf;
import org.apache.spark.sql.SparkSession;

/**
 * Starts the Spark session the library's commands and tests use: embedded local mode with a
 * given number of worker threads, unless a master was already given (by {@code spark-submit
 * --master ...} or the system property {@code spark.master}), which then wins.
 *
 * <p>Thread-safe: stateless.
 */
public final class SparkSessions {

    private SparkSessions() {
    }

    /**
     * A session on the submitted master, or embedded local mode with {@code workers} threads
     * ({@code local[workers]}) when no master was given. The web UI is off in local mode.
     *
     * @param workers worker threads for local mode, in [1, 1024]
     * @return the session (call {@code stop()} when done)
     * @throws IllegalArgumentException if {@code workers} is out of range
     */
    public static SparkSession localOrSubmitted(int workers) {
        if (workers < 1 || workers > 1024) {
            throw new IllegalArgumentException("workers must be in [1, 1024], got " + workers);
        }
        SparkConf conf = new SparkConf();
        SparkSession.Builder builder = SparkSession.builder().appName("noninertial-frames");
        if (!conf.contains("spark.master")) {
            builder.master("local[" + workers + "]")
                    .config("spark.ui.enabled", "false")
                    .config("spark.sql.shuffle.partitions", String.valueOf(workers));
        }
        return builder.getOrCreate();
    }

    /**
     * For the module's command-line mains, before the first session: Spark's log configured by the
     * module's quiet command configuration, unless the user named one
     * ({@code -Dlog4j2.configurationFile}).
     */
    static void useCommandLogging() {
        if (System.getProperty("log4j2.configurationFile") == null) {
            System.setProperty("log4j2.configurationFile", "dev/noninertial/spark/command-log4j2.properties");
        }
    }
}
