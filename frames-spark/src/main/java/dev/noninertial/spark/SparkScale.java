package dev.noninertial.spark;

import java.util.Locale;

import org.apache.spark.sql.SparkSession;

import dev.noninertial.examples.AirdropStudy;
import dev.noninertial.frames.dispersion.DispersionResult;
import dev.noninertial.frames.dispersion.DispersionStudy;

/**
 * Spark local mode against the local runner on the airdrop study: after a warm-up of both (so
 * that neither pays the JIT compilation alone), each round times the local runner on
 * {@code workers} threads and Spark local mode on {@code workers} workers, one after the other,
 * and prints the ratio; the tables are compared bit for bit.
 *
 * <p>Usage (with the Spark flags of {@code frames-spark/pom.xml}): {@code SparkScale [cases]
 * [workers] [rounds]}, defaults 20000, 2, 2.
 */
public final class SparkScale {

    private SparkScale() {
    }

    /**
     * Entry point.
     *
     * @param args optional cases, workers, rounds
     */
    public static void main(String[] args) {
        int cases = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
        int workers = args.length > 1 ? Integer.parseInt(args[1]) : 2;
        int rounds = args.length > 2 ? Integer.parseInt(args[2]) : 2;
        SparkSessions.useCommandLogging();
        SparkSession session = SparkSessions.localOrSubmitted(workers);
        try {
            DispersionStudy warm = AirdropStudy.study(1000, 1L);
            warm.run(workers);
            SparkDispersion.run(warm, session, workers);
            DispersionStudy study = AirdropStudy.study(cases, 20261202L);
            for (int r = 1; r <= rounds; r++) {
                long t0 = System.nanoTime();
                DispersionResult local = study.run(workers);
                double localSeconds = (System.nanoTime() - t0) * 1e-9;
                long t1 = System.nanoTime();
                DispersionResult spark = SparkDispersion.run(study, session, workers);
                double sparkSeconds = (System.nanoTime() - t1) * 1e-9;
                System.out.printf(Locale.ROOT, "round %d, %d cases, %d workers: local runner %.2f s, Spark %s %.2f s, "
                        + "ratio %.2f, identical bit for bit: %s, load %.2f%n", r, cases, workers, localSeconds,
                        session.sparkContext().master(), sparkSeconds, sparkSeconds / localSeconds,
                        local.equals(spark) ? "yes" : "NO",
                        java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            }
        } finally {
            session.stop();
        }
    }
}
