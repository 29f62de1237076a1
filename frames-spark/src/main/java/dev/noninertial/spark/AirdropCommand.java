package dev.noninertial.spark;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import org.apache.spark.sql.SparkSession;

import dev.noninertial.examples.AirdropStudy;
import dev.noninertial.frames.dispersion.DispersionResult;
import dev.noninertial.frames.dispersion.DispersionStudy;

/**
 * The README's dispersion command: the invented airdrop study of
 * {@code dev.noninertial.examples.AirdropStudy} with the local runner, or with {@code --spark}
 * on Apache Spark (embedded local mode unless {@code spark-submit --master ...} gave a master),
 * printing the footprint and, with {@code --out DIR}, writing {@code DIR/airdrop-cases.csv}.
 *
 * <p>Usage: {@code AirdropCommand [--spark] [--workers W] [--partitions P] [--check] [--cases N]
 * [--seed S] [--out DIR]}. {@code --workers} sets the local threads (default: all cores) or the
 * local-mode Spark workers (default 2); {@code --check} also runs the local runner and reports
 * whether the Spark table is identical to it bit for bit (exit status 1 if not). Needs the {@code frames-examples}
 * module on the class path (an optional dependency of this module).
 *
 * <p>Invented place and numbers, for demonstration only: not for planning drops or safety areas;
 * defer to local codes, standards and licensed practice.
 */
public final class AirdropCommand {

    private static final String USAGE = "usage: AirdropCommand [--spark] [--workers W] [--partitions P] [--check] "
            + "[--cases N] [--seed S] [--out DIR]";

    private AirdropCommand() {
    }

    /**
     * Entry point.
     *
     * @param args see the class comment
     * @throws IOException if the CSV file cannot be written
     */
    public static void main(String[] args) throws IOException {
        boolean spark = false;
        boolean check = false;
        int workers = 0;
        int partitions = 0;
        int cases = 2000;
        long seed = 20261202L;
        Path out = null;
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            boolean hasValue = i + 1 < args.length;
            if ("--spark".equals(a)) {
                spark = true;
            } else if ("--check".equals(a)) {
                check = true;
            } else if ("--workers".equals(a) && hasValue) {
                workers = Integer.parseInt(args[++i]);
            } else if ("--partitions".equals(a) && hasValue) {
                partitions = Integer.parseInt(args[++i]);
            } else if ("--cases".equals(a) && hasValue) {
                cases = Integer.parseInt(args[++i]);
            } else if ("--seed".equals(a) && hasValue) {
                seed = Long.parseLong(args[++i]);
            } else if ("--out".equals(a) && hasValue) {
                out = Path.of(args[++i]);
            } else {
                System.err.println("unknown or incomplete argument '" + a + "'; " + USAGE);
                System.exit(2);
                return;
            }
        }
        DispersionStudy study = AirdropStudy.study(cases, seed);
        if (!spark) {
            int threads = workers > 0 ? workers : Runtime.getRuntime().availableProcessors();
            long t0 = System.nanoTime();
            DispersionResult result = study.run(threads);
            double seconds = (System.nanoTime() - t0) * 1e-9;
            AirdropStudy.print(System.out, study, result, "local runner, " + threads + " threads", seconds, out);
            return;
        }
        SparkSessions.useCommandLogging();
        SparkSession session = SparkSessions.localOrSubmitted(workers > 0 ? workers : 2);
        boolean identical = true;
        try {
            int parts = partitions > 0 ? partitions : session.sparkContext().defaultParallelism();
            long t0 = System.nanoTime();
            DispersionResult result = SparkDispersion.run(study, session, parts);
            double seconds = (System.nanoTime() - t0) * 1e-9;
            String runner = String.format(Locale.ROOT, "Spark %s, master %s, %d partitions", session.version(),
                    session.sparkContext().master(), parts);
            AirdropStudy.print(System.out, study, result, runner, seconds, out);
            if (check) {
                long t1 = System.nanoTime();
                DispersionResult local = study.run();
                double localSeconds = (System.nanoTime() - t1) * 1e-9;
                identical = local.equals(result);
                System.out.printf(Locale.ROOT, "local runner (%d threads): %.2f s; Spark table identical bit for bit: %s%n",
                        Runtime.getRuntime().availableProcessors(), localSeconds, identical ? "yes" : "NO");
            }
        } finally {
            session.stop();
        }
        if (!identical) {
            System.exit(1);
        }
    }
}
