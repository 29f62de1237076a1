package dev.noninertial.spark;

import org.apache.spark.sql.SparkSession;

/**
 * One embedded local-mode session with 2 worker threads shared by every test class of the module
 * (starting Spark costs seconds); Spark's own shutdown hook stops it when the test JVM exits.
 */
final class LocalSpark {

    private static SparkSession session;

    private LocalSpark() {
    }

    static synchronized SparkSession session() {
        if (session == null) {
            session = SparkSessions.localOrSubmitted(2);
        }
        return session;
    }
}
