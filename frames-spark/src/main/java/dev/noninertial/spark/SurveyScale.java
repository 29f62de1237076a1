package dev.noninertial.spark;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.apache.spark.api.java.function.MapFunction;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.functions;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructType;

import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.GeodeticTrack;
import dev.noninertial.geodesy.SurveyPoint;

/**
 * {@link SparkSurvey} in Spark local mode against the one-machine survey
 * ({@link GeodeticTrack#surveyAtSamples(EarthFrames)}, the lines shared out over a pool of
 * {@code workers} threads) on an invented 10 Hz gravity-survey log (the vessel Harrowmere Tide
 * steaming lines around 58.4 N with heave): after a warm-up of both, each round times the two one
 * after the other, prints the rows per second and the ratio, and compares the sums of every output
 * column bit for bit (the rows come out in another order; a line's values do not depend on it).
 *
 * <p>Usage (with the Spark flags of {@code frames-spark/pom.xml}): {@code SurveyScale [rows]
 * [rowsPerLine] [workers] [rounds]}, defaults 400000, 36000 (one hour at 10 Hz), 2, 2.
 */
public final class SurveyScale {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-11-20T00:00:00Z"));
    private static final List<String> POSITION = List.of("lat", "lon", "h");

    private SurveyScale() {
    }

    /**
     * Entry point.
     *
     * @param args optional rows, rows per line, workers, rounds
     * @throws Exception if a local worker fails
     */
    public static void main(String[] args) throws Exception {
        long rows = args.length > 0 ? Long.parseLong(args[0]) : 400_000L;
        int perLine = args.length > 1 ? Integer.parseInt(args[1]) : 36_000;
        int workers = args.length > 2 ? Integer.parseInt(args[2]) : 2;
        int rounds = args.length > 3 ? Integer.parseInt(args[3]) : 2;
        SparkSessions.useCommandLogging();
        SparkSession session = SparkSessions.localOrSubmitted(workers);
        ExecutorService pool = Executors.newFixedThreadPool(workers);
        try {
            oneMachine(20_000, 5000, pool);
            spark(session, 20_000, 5000, workers);
            for (int r = 1; r <= rounds; r++) {
                long t0 = System.nanoTime();
                double[] local = oneMachine(rows, perLine, pool);
                double localSeconds = (System.nanoTime() - t0) * 1e-9;
                long t1 = System.nanoTime();
                double[] spark = spark(session, rows, perLine, workers);
                double sparkSeconds = (System.nanoTime() - t1) * 1e-9;
                long t2 = System.nanoTime();
                plumbing(session, rows, perLine, workers);
                double plumbingSeconds = (System.nanoTime() - t2) * 1e-9;
                System.out.printf(Locale.ROOT, "round %d, %d rows in lines of %d, %d workers: one machine %.2f s"
                        + " (%.0f rows/s), Spark %s %.2f s (%.0f rows/s), ratio %.2f, of which the same job without"
                        + " the survey %.2f s, column sums identical: %s, load %.2f%n", r, rows, perLine, workers,
                        localSeconds, rows / localSeconds, session.sparkContext().master(), sparkSeconds,
                        rows / sparkSeconds, sparkSeconds / localSeconds, plumbingSeconds,
                        java.util.Arrays.equals(local, spark) ? "yes" : "NO " + java.util.Arrays.toString(local)
                                + " vs " + java.util.Arrays.toString(spark),
                        java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            }
        } finally {
            pool.shutdown();
            session.stop();
        }
    }

    /** Latitude (deg), longitude (deg), height (m) of row {@code k} of line {@code line}, at 10 Hz. */
    static double[] sample(long line, long k) {
        double t = 0.1 * k;
        // 10 kn on a heading that alternates between lines, heave 0.6 m at 0.7 rad/s
        double sign = line % 2 == 0 ? 1 : -1;
        double lat = 58.4 + 0.002 * line + sign * 2.5e-5 * t;
        double lon = -3.1 + sign * 7.0e-5 * t;
        double h = 0.6 * Math.sin(0.7 * t + line);
        return new double[] {lat, lon, h};
    }

    private static long lines(long rows, int perLine) {
        return (rows + perLine - 1) / perLine;
    }

    private static double[] oneMachine(long rows, int perLine, ExecutorService pool) throws Exception {
        List<Future<double[]>> parts = new ArrayList<>();
        for (long line = 0; line < lines(rows, perLine); line++) {
            long l = line;
            int n = (int) Math.min(perLine, rows - line * perLine);
            parts.add(pool.submit(() -> {
                double[] t = new double[n];
                double[] lat = new double[n];
                double[] lon = new double[n];
                double[] h = new double[n];
                for (int k = 0; k < n; k++) {
                    double[] s = sample(l, k);
                    t[k] = 3600.0 * l + 0.1 * k;
                    lat[k] = Math.toRadians(s[0]);
                    lon[k] = Math.toRadians(s[1]);
                    h[k] = s[2];
                }
                double[] sums = new double[4];
                for (SurveyPoint p : GeodeticTrack.fromArrays(t, lat, lon, h, 1.0).surveyAtSamples(EARTH)) {
                    sums[0] += p.eotvosCorrection();
                    sums[1] += p.verticalAcceleration();
                    sums[2] += p.gravimeterReading();
                    sums[3] += p.normalGravity();
                }
                return sums;
            }));
        }
        // sums per line, added in line order: the same order on both paths
        double[] total = new double[4];
        for (Future<double[]> part : parts) {
            double[] s = part.get();
            for (int c = 0; c < 4; c++) {
                total[c] += s[c];
            }
        }
        return total;
    }

    private static Dataset<Row> log(SparkSession session, long rows, int perLine, int workers) {
        StructType schema = DataTypes.createStructType(List.of(
                DataTypes.createStructField("line", DataTypes.LongType, false),
                DataTypes.createStructField("t", DataTypes.DoubleType, false),
                DataTypes.createStructField("lat", DataTypes.DoubleType, false),
                DataTypes.createStructField("lon", DataTypes.DoubleType, false),
                DataTypes.createStructField("h", DataTypes.DoubleType, false)));
        MapFunction<Long, Row> row = id -> {
            long line = id / perLine;
            long k = id % perLine;
            double[] s = sample(line, k);
            return RowFactory.create(line, 3600.0 * line + 0.1 * k, s[0], s[1], s[2]);
        };
        return session.range(0, rows, 1, workers).map(row, Encoders.row(schema));
    }

    private static double[] spark(SparkSession session, long rows, int perLine, int workers) {
        Dataset<Row> surveyed = SparkSurvey.atSamples(log(session, rows, perLine, workers), "line", "t", POSITION,
                EARTH, 1.0, "g_");
        return sums(surveyed, "g_eotvos", "g_vertical_acceleration", "g_reading", "g_normal_gravity");
    }

    /** The same job without the survey: generation, the shuffle by line, the sort by time, the sums. */
    private static double[] plumbing(SparkSession session, long rows, int perLine, int workers) {
        Dataset<Row> log = log(session, rows, perLine, workers);
        Dataset<Row> sorted = log.repartition(log.col("line")).sortWithinPartitions(log.col("line"), log.col("t"));
        return sums(sorted, "t", "lat", "lon", "h");
    }

    private static double[] sums(Dataset<Row> rows, String c1, String c2, String c3, String c4) {
        // per-line sums in Spark, then added in line order on the driver, as on one machine
        List<Row> perLineSums = rows.groupBy("line").agg(functions.sum(c1), functions.sum(c2), functions.sum(c3),
                functions.sum(c4)).orderBy("line").collectAsList();
        double[] total = new double[4];
        for (Row r : perLineSums) {
            for (int c = 0; c < 4; c++) {
                total[c] += r.getDouble(c + 1);
            }
        }
        return total;
    }
}
