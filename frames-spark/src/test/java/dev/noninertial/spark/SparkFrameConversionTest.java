package dev.noninertial.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * A survey vessel's logged track (invented, in the local-level frame of an invented harbour)
 * converted to the Earth-centred inertial frame on Spark, row by row against the object API and
 * against the textbook velocity of a point carried by the Earth's rotation.
 */
class SparkFrameConversionTest {

    private static final List<String> STATE = List.of("e", "n", "u", "ve", "vn", "vu", "ae", "an", "au");
    private static SparkSession session;

    @BeforeAll
    static void start() {
        session = LocalSpark.session();
    }

    private static Dataset<Row> track(int rows, double speedEast, double wobble) {
        List<StructField> fields = new ArrayList<>();
        fields.add(DataTypes.createStructField("t", DataTypes.DoubleType, false));
        for (String name : STATE) {
            fields.add(DataTypes.createStructField(name, DataTypes.DoubleType, false));
        }
        fields.add(DataTypes.createStructField("vessel", DataTypes.StringType, false));
        List<Row> data = new ArrayList<>();
        for (int i = 0; i < rows; i++) {
            double t = 0.5 * i;
            data.add(RowFactory.create(t, speedEast * t, wobble * Math.sin(0.01 * t), 0.0, speedEast,
                    0.01 * wobble * Math.cos(0.01 * t), 0.0, 0.0, -1e-4 * wobble * Math.sin(0.01 * t), 0.0,
                    "RV Quillan Sound"));
        }
        return session.createDataFrame(data, DataTypes.createStructType(fields)).repartition(3);
    }

    @Test
    void trackRowsMatchTheObjectConversionAndTheEarthRotationInvariant() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T00:00:00Z"));
        LatLonHeight harbour = LatLonHeight.ofDegrees(61.25, -4.75, 0.0);   // invented harbour
        ReferenceFrame enu = earth.localLevel(harbour, LocalAxes.ENU);
        ReferenceFrame eci = earth.inertial();
        int n = 5000;   // several bulk blocks per partition
        List<Row> out = SparkFrameConversion.convert(track(n, 4.0, 3.0), "t", STATE, enu, eci, "i_").collectAsList();
        assertEquals(n, out.size());
        for (Row row : out) {
            double t = row.getDouble(0);
            PointState local = PointState.of(new Vector3D(row.getDouble(1), row.getDouble(2), row.getDouble(3)),
                    new Vector3D(row.getDouble(4), row.getDouble(5), row.getDouble(6)),
                    new Vector3D(row.getDouble(7), row.getDouble(8), row.getDouble(9)));
            PointState expected = enu.stateAt(t, local).in(eci).state();
            assertEquals("RV Quillan Sound", row.getString(10));
            // Object path (itself checked by finite differences in frames-core): 1e-6 m on
            // positions of 6.4e6 m (about 1e-13 relative, rounding of a different operation order),
            // 1e-9 m/s, 1e-9 m/s^2.
            assertEquals(expected.position().getX(), row.getDouble(11), 1e-6);
            assertEquals(expected.position().getY(), row.getDouble(12), 1e-6);
            assertEquals(expected.position().getZ(), row.getDouble(13), 1e-6);
            assertEquals(expected.velocity().getX(), row.getDouble(14), 1e-9);
            assertEquals(expected.velocity().getY(), row.getDouble(15), 1e-9);
            assertEquals(expected.velocity().getZ(), row.getDouble(16), 1e-9);
            assertEquals(expected.acceleration().getX(), row.getDouble(17), 1e-9);
            assertEquals(expected.acceleration().getY(), row.getDouble(18), 1e-9);
            assertEquals(expected.acceleration().getZ(), row.getDouble(19), 1e-9);
        }
        // A vessel at rest at the harbour: inertial speed = w * (distance from the spin axis),
        // inertial acceleration = w^2 * that distance toward the axis (uniform rotation,
        // REFERENCES.md, Analytic results of mechanics). Tolerance 1e-9 relative (rounding).
        List<Row> still = SparkFrameConversion.convert(track(40, 0.0, 0.0), "t", STATE, enu, eci, "i_")
                .collectAsList();
        double w = EarthModel.WGS84.rotationRate();
        for (Row r : still) {
            double axisDistance = Math.hypot(r.getDouble(11), r.getDouble(12));
            double speed = Math.sqrt(r.getDouble(14) * r.getDouble(14) + r.getDouble(15) * r.getDouble(15)
                    + r.getDouble(16) * r.getDouble(16));
            double acceleration = Math.sqrt(r.getDouble(17) * r.getDouble(17) + r.getDouble(18) * r.getDouble(18)
                    + r.getDouble(19) * r.getDouble(19));
            assertEquals(w * axisDistance, speed, 1e-9 * w * axisDistance);
            assertEquals(w * w * axisDistance, acceleration, 1e-9 * w * w * axisDistance);
            assertEquals(0.0, r.getDouble(16), 1e-9);   // no velocity along the spin axis
        }
    }

    @Test
    void refusesMissingOrWrongColumns() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T00:00:00Z"));
        ReferenceFrame enu = earth.localLevel(LatLonHeight.ofDegrees(61.25, -4.75, 0.0), LocalAxes.ENU);
        Dataset<Row> rows = track(10, 1.0, 3.0);
        assertThrows(IllegalArgumentException.class,
                () -> SparkFrameConversion.convert(rows, "time", STATE, enu, earth.inertial(), "i_"));
        assertThrows(IllegalArgumentException.class,
                () -> SparkFrameConversion.convert(rows, "t", STATE.subList(0, 6), enu, earth.inertial(), "i_"));
        assertThrows(IllegalArgumentException.class,
                () -> SparkFrameConversion.convert(rows, "t", List.of("e", "n", "u", "ve", "vn", "vu", "ae", "an", "vessel"),
                        enu, earth.inertial(), "i_"));
        Dataset<Row> once = SparkFrameConversion.convert(rows, "t", STATE, enu, earth.inertial(), "i_");
        assertThrows(IllegalArgumentException.class,
                () -> SparkFrameConversion.convert(once, "t", STATE, enu, earth.inertial(), "i_"));   // i_x exists
        assertThrows(IllegalArgumentException.class, () -> SparkFrameConversion.convert(rows, "t", STATE, enu,
                ReferenceFrame.inertialRoot("other"), "i_"));
    }
}
