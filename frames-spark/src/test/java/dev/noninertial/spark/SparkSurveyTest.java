package dev.noninertial.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructType;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.units.Units;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.GeodeticTrack;
import dev.noninertial.geodesy.SurveyFilter;
import dev.noninertial.geodesy.SurveyPoint;

/**
 * A gravity-survey log of two invented lines of an invented vessel, shuffled over partitions,
 * surveyed on Spark: the Eotvos correction against the gravimetry rule of thumb, normal gravity
 * against Somigliana's closed form, the heave acceleration against its analytic second derivative,
 * and every row against the one-machine survey of the same line.
 */
class SparkSurveyTest {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-01T06:00:00Z"));
    private static final List<String> POSITION = List.of("lat_deg", "lon_deg", "h_m");
    /** WGS84, REFERENCES.md, Earth models. */
    private static final double A = 6378137.0;
    private static final double E2 = 6.69437999014e-3;
    private static final double GE = 9.7803253359;
    private static final double K = 0.00193185265241;
    private static SparkSession session;

    @BeforeAll
    static void start() {
        session = LocalSpark.session();
    }

    private static StructType schema() {
        return DataTypes.createStructType(List.of(
                DataTypes.createStructField("line", DataTypes.StringType, true),
                DataTypes.createStructField("t", DataTypes.DoubleType, false),
                DataTypes.createStructField("lat_deg", DataTypes.DoubleType, false),
                DataTypes.createStructField("lon_deg", DataTypes.DoubleType, false),
                DataTypes.createStructField("h_m", DataTypes.DoubleType, false),
                DataTypes.createStructField("raw_mgal", DataTypes.DoubleType, false)));
    }

    /** Due east at 10 kn along 60 N at 1 Hz (the rule of thumb's case), optionally heaving. */
    private static List<Row> eastbound(String line, int seconds, boolean heave) {
        double v = Units.knots(10.0);
        double rn = A / Math.sqrt(1 - E2 * 0.75);     // sin^2(60 deg) = 0.75
        double lonRate = v / (rn * 0.5);              // cos(60 deg) = 0.5, h = 0
        List<Row> rows = new ArrayList<>();
        for (int k = 0; k <= seconds; k++) {
            double h = heave ? 0.8 * Math.sin(0.6 * k) : 0.0;
            rows.add(RowFactory.create(line, (double) k, 60.0, 4.0 + Math.toDegrees(lonRate * k), h, 1000.0 + k));
        }
        return rows;
    }

    private static Dataset<Row> shuffled(List<Row> rows, int partitions) {
        List<Row> copy = new ArrayList<>(rows);
        Collections.shuffle(copy, new Random(20261204L));   // fixed seed
        return session.createDataFrame(copy, schema()).repartition(partitions);
    }

    @Test
    void twoShuffledLinesGiveTheRuleOfThumbTheHeaveAndTheOneMachineSurvey() {
        List<Row> log = new ArrayList<>(eastbound("line 7", 120, false));
        log.addAll(eastbound("line 8", 60, true));
        List<Row> out = SparkSurvey.atSamples(shuffled(log, 3), "line", "t", POSITION, EARTH, 2.0, "g_")
                .collectAsList();
        assertEquals(log.size(), out.size());
        Map<String, List<SurveyPoint>> local = new HashMap<>();
        for (String line : List.of("line 7", "line 8")) {
            local.put(line, oneMachine(line.equals("line 7") ? eastbound(line, 120, false) : eastbound(line, 60, true)));
        }
        double lat = Math.toRadians(60.0);
        double rule = 7.503 * 10.0 * Math.cos(lat) + 0.004154 * 100.0;   // common practice, REFERENCES.md, Gravimetry
        // Somigliana's closed form on the ellipsoid (REFERENCES.md, Earth models; TR8350.2 Eq. 4-1)
        double somigliana = GE * (1 + K * 0.75) / Math.sqrt(1 - E2 * 0.75);
        double previous = -1;
        String previousLine = "";
        for (Row r : out) {
            String line = r.getString(0);
            double t = r.getDouble(1);
            if (line.equals(previousLine)) {
                assertTrue(t > previous, "each line in time order: " + t + " after " + previous);
            }
            previous = t;
            previousLine = line;
            assertEquals(1000.0 + t, r.getDouble(5), 0.0, "input columns carried");
            double eotvos = r.getDouble(6);
            double vertical = r.getDouble(7);
            double reading = r.getDouble(8);
            double normal = r.getDouble(9);
            // the same line surveyed on one machine: the same arithmetic, identical bit for bit
            SurveyPoint p = local.get(line).get((int) t);
            assertEquals(p.eotvosCorrection(), eotvos, 0.0);
            assertEquals(p.verticalAcceleration(), vertical, 0.0);
            assertEquals(p.gravimeterReading(), reading, 0.0);
            assertEquals(p.normalGravity(), normal, 0.0);
            // within 0.01 mGal of the rule of thumb (the rule's spherical radius; heave's vertical
            // velocity does not enter the constant-height formula)
            assertEquals(rule, Units.toMilligals(eotvos), 0.01, line + " t " + t);
            if (line.equals("line 7")) {
                // h = 0: Somigliana, 1e-10 m/s^2 (the published equatorial gravity has ten decimals,
                // +-5e-11; the model derives its constants from the defining parameters); the ideal
                // gravimeter reads normal gravity lowered by the Eotvos effect, 1e-9 m/s^2
                // (interpolated rates, rounding)
                assertEquals(somigliana, normal, 1e-10);
                assertEquals(normal - eotvos, reading, 1e-9);
                assertEquals(0.0, vertical, 1e-9);
            } else if (t >= 3 && t <= 57) {
                // the heave acceleration follows -0.8 * 0.36 sin(0.6 t): quintic Hermite on 1 s samples
                // (derivatives from the local quartic), error ~ h^3 w^5 A ~ 0.05 m/s^2 at most; 10 % of
                // the amplitude 0.288 m/s^2 (as in the one-machine track test); the ends use one-sided
                // stencils and are left to that equality above
                assertEquals(-0.288 * Math.sin(0.6 * t), vertical, 0.03, "t " + t);
                // physical invariant, first order: reading = normal - Eotvos + d2h/dt2, 1e-7 m/s^2
                assertEquals(normal - eotvos + vertical, reading, 1e-7, "t " + t);
            }
        }
    }

    @Test
    void aFilteredSurveyKeepsEveryRowWithNullsWhereTheKernelDoesNotFit() {
        List<Row> log = new ArrayList<>(eastbound("line 7", 120, false));
        log.addAll(eastbound("line 8", 60, true));
        SurveyFilter filter = SurveyFilter.ofSigma(2.0);
        int m = filter.margin(1.0);   // 10 rows at each end
        List<Row> out = SparkSurvey.atSamples(shuffled(log, 3), "line", "t", POSITION, EARTH, 2.0, filter, "f_")
                .collectAsList();
        assertEquals(log.size(), out.size());
        Map<String, List<SurveyPoint>> local = new HashMap<>();
        local.put("line 7", oneMachine(eastbound("line 7", 120, false), filter));
        local.put("line 8", oneMachine(eastbound("line 8", 60, true), filter));
        double rule = 7.503 * 10.0 * 0.5 + 0.004154 * 100.0;   // common practice, REFERENCES.md, Gravimetry
        // the heave 0.8 sin(0.6 t) through the Gaussian: scaled by its Fourier transform exp(-(0.6 sigma)^2 / 2)
        double gain = Math.exp(-0.5 * Math.pow(0.6 * 2.0, 2));
        int nulls = 0;
        for (Row r : out) {
            String line = r.getString(0);
            double t = r.getDouble(1);
            int last = line.equals("line 7") ? 120 : 60;
            if (t < m || t > last - m) {
                for (int c = 6; c < 10; c++) {
                    assertTrue(r.isNullAt(c), "no value where the kernel does not fit: " + r);
                }
                nulls++;
                continue;
            }
            SurveyPoint p = local.get(line).get((int) t - m);
            assertEquals(p.time(), t, 0.0);
            // the same filter on the same line on one machine: identical bit for bit
            assertEquals(p.eotvosCorrection(), r.getDouble(6), 0.0);
            assertEquals(p.verticalAcceleration(), r.getDouble(7), 0.0);
            assertEquals(p.gravimeterReading(), r.getDouble(8), 0.0);
            assertEquals(p.normalGravity(), r.getDouble(9), 0.0);
            assertEquals(rule, Units.toMilligals(r.getDouble(6)), 0.01);
            if (line.equals("line 8")) {
                // 0.03 m/s^2 as for the unfiltered heave (interpolation on 1 s samples), before the gain
                assertEquals(gain * -0.288 * Math.sin(0.6 * t), r.getDouble(7), 0.03, "t " + t);
            }
        }
        assertEquals(2 * 2 * m, nulls);
    }

    @Test
    void aMeasuredReadingGivesItsFreeAirAnomalyFilteredLikeTheCorrections() {
        // the invented line 8 (heaving) with a "measured" reading: the ideal gravimeter's plus 3 mGal
        List<Row> plain = eastbound("line 8", 60, true);
        List<SurveyPoint> ideal = oneMachine(plain);
        List<Row> log = new ArrayList<>();
        for (int i = 0; i < plain.size(); i++) {
            Row r = plain.get(i);
            log.add(RowFactory.create(r.get(0), r.get(1), r.get(2), r.get(3), r.get(4), r.get(5),
                    ideal.get(i).gravimeterReading() + Units.milligals(3.0)));
        }
        StructType schema = schema().add("g_obs", DataTypes.DoubleType, false);
        List<Row> copy = new ArrayList<>(log);
        Collections.shuffle(copy, new Random(20261204L));   // fixed seed
        Dataset<Row> rows = session.createDataFrame(copy, schema).repartition(2);
        SurveyFilter filter = SurveyFilter.ofSigma(2.0);
        int m = filter.margin(1.0);
        List<Row> out = SparkSurvey.anomaliesAtSamples(rows, "line", "t", POSITION, "g_obs", EARTH, 2.0, filter, "f_")
                .collectAsList();
        assertEquals(log.size(), out.size());
        int values = 0;
        for (Row r : out) {
            double t = r.getDouble(1);
            if (t < m || t > 60 - m) {
                assertTrue(r.isNullAt(11), "no anomaly where the kernel does not fit: " + r);
                continue;
            }
            values++;
            // the ideal reading's anomaly is zero to first order (0.01 mGal, as on one machine) and a
            // constant passes the filter unchanged: 3 mGal
            assertEquals(3.0, Units.toMilligals(r.getDouble(11)), 0.01, "t " + t);
        }
        assertEquals(61 - 2 * m, values);
        IllegalArgumentException missing = assertThrows(IllegalArgumentException.class,
                () -> SparkSurvey.anomaliesAtSamples(rows, "line", "t", POSITION, "g", EARTH, 2.0, filter, "f_"));
        assertTrue(missing.getMessage().contains("column 'g' must exist"), missing.getMessage());
    }

    private static List<SurveyPoint> oneMachine(List<Row> rows, SurveyFilter filter) {
        return filter.applyTo(oneMachine(rows));
    }

    private static List<SurveyPoint> oneMachine(List<Row> rows) {
        int n = rows.size();
        double[] t = new double[n];
        double[] lat = new double[n];
        double[] lon = new double[n];
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = rows.get(i).getDouble(1);
            lat[i] = Math.toRadians(rows.get(i).getDouble(2));
            lon[i] = Math.toRadians(rows.get(i).getDouble(3));
            h[i] = rows.get(i).getDouble(4);
        }
        return GeodeticTrack.fromArrays(t, lat, lon, h, 2.0).surveyAtSamples(EARTH);
    }

    @Test
    void refusesBadColumnsOnTheDriver() {
        Dataset<Row> rows = shuffled(eastbound("line 7", 10, false), 2);
        assertThrows(IllegalArgumentException.class,
                () -> SparkSurvey.atSamples(rows, "vessel", "t", POSITION, EARTH, 2.0, "g_"));
        assertThrows(IllegalArgumentException.class,
                () -> SparkSurvey.atSamples(rows, "line", "time", POSITION, EARTH, 2.0, "g_"));
        assertThrows(IllegalArgumentException.class,
                () -> SparkSurvey.atSamples(rows, "line", "t", POSITION.subList(0, 2), EARTH, 2.0, "g_"));
        IllegalArgumentException type = assertThrows(IllegalArgumentException.class,
                () -> SparkSurvey.atSamples(rows, "line", "t", List.of("lat_deg", "lon_deg", "line"), EARTH, 2.0,
                        "g_"));
        assertTrue(type.getMessage().contains("'line' must be of type double"), type.getMessage());
        IllegalArgumentException gap = assertThrows(IllegalArgumentException.class,
                () -> SparkSurvey.atSamples(rows, "line", "t", POSITION, EARTH, 0.0, "g_"));
        assertTrue(gap.getMessage().contains("maxGap"), gap.getMessage());
        Dataset<Row> once = SparkSurvey.atSamples(rows, "line", "t", POSITION, EARTH, 2.0, "g_");
        IllegalArgumentException clash = assertThrows(IllegalArgumentException.class,
                () -> SparkSurvey.atSamples(once, "line", "t", POSITION, EARTH, 2.0, "g_"));
        assertTrue(clash.getMessage().contains("'g_eotvos' is already a column"), clash.getMessage());
    }

    @Test
    void aBrokenLineIsRefusedNamingIt() {
        List<Row> log = new ArrayList<>(eastbound("line 7", 20, false));
        List<Row> broken = new ArrayList<>(eastbound("line 9", 20, false));
        broken.add(broken.get(5));   // a repeated time
        log.addAll(broken);
        String message = failure(() -> SparkSurvey.atSamples(shuffled(log, 3), "line", "t", POSITION, EARTH, 2.0,
                "g_").collectAsList());
        assertTrue(message.contains("line 'line 9' (22 rows"), message);
        List<Row> unnamed = new ArrayList<>(eastbound("line 7", 20, false));
        unnamed.add(RowFactory.create(null, 30.0, 60.0, 4.0, 0.0, 0.0));
        String missing = failure(() -> SparkSurvey.atSamples(shuffled(unnamed, 2), "line", "t", POSITION, EARTH, 2.0,
                "g_").collectAsList());
        assertTrue(missing.contains("column 'line' must name a line in every row, got null"), missing);
    }

    /** The messages of a Spark failure and its causes, joined (Spark wraps an executor's exception). */
    private static String failure(Runnable job) {
        Exception e = assertThrows(Exception.class, job::run);
        StringBuilder b = new StringBuilder();
        for (Throwable c = e; c != null; c = c.getCause()) {
            b.append(c.getMessage()).append(" | ");
        }
        return b.toString();
    }
}
