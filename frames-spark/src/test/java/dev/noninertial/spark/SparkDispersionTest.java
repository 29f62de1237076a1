package dev.noninertial.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import dev.noninertial.examples.AirdropStudy;
import dev.noninertial.frames.dispersion.DispersionModel;
import dev.noninertial.frames.dispersion.DispersionResult;
import dev.noninertial.frames.dispersion.DispersionStudy;
import dev.noninertial.frames.dispersion.InputDistribution;

/**
 * Spark local mode with 2 workers against the local runner: identical tables bit for bit (the
 * design's invariant: a case depends only on the master seed and its index).
 */
class SparkDispersionTest {

    private static SparkSession session;

    @BeforeAll
    static void start() {
        session = LocalSpark.session();
    }

    /** A nonlinear model, so that any change in the drawn inputs shows in the outcomes. */
    static DispersionStudy study(int cases) {
        DispersionModel model = c -> {
            double v = c.value("speed");
            double angle = Math.toRadians(c.value("angle"));
            double range = v * v * Math.sin(2 * angle) / 9.80665;
            return new double[] {range * Math.sin(c.value("bearing")), range * Math.cos(c.value("bearing")),
                2 * v * Math.sin(angle) / 9.80665};
        };
        return DispersionStudy.of(model, "east_m", "north_m", "time_s")
                .withInput("speed", InputDistribution.normal(60.0, 1.5))
                .withInput("angle", InputDistribution.truncatedNormal(50.0, 2.0, 44.0, 56.0))
                .withInput("bearing", InputDistribution.normal(0.3, 0.02))
                .withCases(cases).withSeed(20261202L);
    }

    @Test
    void sparkLocalModeGivesTheLocalRunnersTableBitForBit() {
        DispersionStudy s = study(4001);
        DispersionResult oneThread = s.run(1);
        DispersionResult allCores = s.run();
        DispersionResult spark = SparkDispersion.run(s, session);
        assertEquals(oneThread, allCores);
        assertEquals(oneThread, spark);
        // other partitionings give the same table too
        assertEquals(oneThread, SparkDispersion.run(s, session, 7));
        // and the statistics are the same bits
        assertEquals(Double.doubleToRawLongBits(oneThread.cep("east_m", "north_m")),
                Double.doubleToRawLongBits(spark.cep("east_m", "north_m")));
    }

    @Test
    void theAirdropStudyWithDragAndEarthRotationIsIdenticalOnSpark() {
        // trajectories integrated on the executors: same bits as the local runner on 1 thread
        DispersionStudy s = AirdropStudy.study(600, 77L);
        DispersionResult local = s.run(1);
        DispersionResult spark = SparkDispersion.run(s, session, 3);
        assertEquals(local, spark);
        // a case re-run alone on the driver equals its Spark row
        double[] alone = s.runCase(599);
        double[] row = spark.outcome(599);
        for (int k = 0; k < row.length; k++) {
            assertEquals(Double.doubleToRawLongBits(row[k]), Double.doubleToRawLongBits(alone[k]));
        }
    }

    @Test
    void aFailingCaseIsReportedAndBadArgumentsAreRefused() {
        DispersionStudy bad = study(100).withModel(c -> new double[] {c.index() == 42 ? Double.NaN : 0, 0, 0});
        Exception e = assertThrows(Exception.class, () -> SparkDispersion.run(bad, session, 2));
        StringBuilder text = new StringBuilder();
        for (Throwable t = e; t != null; t = t.getCause()) {
            text.append(t.getMessage()).append(" | ");
        }
        assertTrue(text.toString().contains("case 42"), text.toString());
        assertThrows(IllegalArgumentException.class, () -> SparkDispersion.run(study(10), session, 11));
        assertThrows(IllegalArgumentException.class, () -> SparkDispersion.run(study(10), session, 0));
    }
}
