package dev.noninertial.spark;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.apache.spark.api.java.function.MapPartitionsFunction;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.dispersion.DispersionResult;
import dev.noninertial.frames.dispersion.DispersionStudy;

/**
 * Runs a {@link DispersionStudy} on Apache Spark: the case indices 0 .. n-1 become a Dataset
 * split into contiguous index ranges (one per partition), each executor computes its cases with
 * {@link DispersionStudy#tableRow(long)}, and the driver assembles the same
 * {@link DispersionResult} the local runner returns.
 *
 * <p>Because a case depends only on the study's master seed and its index (see
 * {@link DispersionStudy}), the table is identical bit for bit to {@link DispersionStudy#run()}
 * for any number of partitions or executors; doubles travel through Spark's rows unchanged.
 * The study and its model are shipped to the executors by Java serialization.
 *
 * <p>{@link #run(DispersionStudy, SparkSession)} collects the whole table on the driver (about
 * {@code 8 (inputs + outcomes + 1)} bytes per case). For studies too large for the driver, use
 * {@link #table(DispersionStudy, SparkSession, int)} and aggregate or write it with Spark.
 *
 * <p>Thread-safe: stateless.
 */
public final class SparkDispersion {

    /** Name of the case-index column of {@link #table(DispersionStudy, SparkSession, int)}. */
    public static final String CASE_COLUMN = "case";

    private SparkDispersion() {
    }

    /**
     * Runs every case on the session, one partition per core the session reports
     * ({@code defaultParallelism}), and collects the result.
     *
     * @param study the study (serializable, with a serializable model)
     * @param session the Spark session
     * @return the result, identical bit for bit to {@code study.run()}
     * @throws NullPointerException if an argument is null
     * @throws IllegalStateException if a case fails (Spark's error names the case)
     */
    public static DispersionResult run(DispersionStudy study, SparkSession session) {
        Arguments.nonNull("session", session);
        return run(study, session, session.sparkContext().defaultParallelism());
    }

    /**
     * Runs every case on the session in a given number of partitions and collects the result.
     *
     * @param study the study (serializable, with a serializable model)
     * @param session the Spark session
     * @param partitions number of partitions (contiguous index ranges), in [1, cases]
     * @return the result, identical bit for bit to {@code study.run()}
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if {@code partitions} is out of range
     * @throws IllegalStateException if a case fails, or Spark returns an incomplete table
     */
    public static DispersionResult run(DispersionStudy study, SparkSession session, int partitions) {
        List<Row> rows = table(study, session, partitions).collectAsList();
        int width = study.inputNames().size() + study.outcomeNames().size();
        int cases = study.cases();
        if (rows.size() != cases) {
            throw new IllegalStateException("Spark returned " + rows.size() + " rows, expected " + cases);
        }
        double[] table = new double[cases * width];
        boolean[] seen = new boolean[cases];
        for (Row row : rows) {
            long index = row.getLong(0);
            if (index < 0 || index >= cases || seen[(int) index]) {
                throw new IllegalStateException("Spark returned case " + index + " twice or out of [0, " + cases + ")");
            }
            seen[(int) index] = true;
            int base = (int) index * width;
            for (int c = 0; c < width; c++) {
                table[base + c] = row.getDouble(c + 1);
            }
        }
        return DispersionResult.ofTable(study.inputNames(), study.outcomeNames(), table);
    }

    /**
     * The study's table as a lazily computed Dataset: column {@value #CASE_COLUMN} (long) then one
     * double column per input and per outcome, named as in the study. Nothing runs until an
     * action (count, write, aggregate, collect) is called on it.
     *
     * @param study the study (serializable, with a serializable model)
     * @param session the Spark session
     * @param partitions number of partitions (contiguous index ranges), in [1, cases]
     * @return the Dataset of rows
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if {@code partitions} is out of range or the study has no input
     */
    public static Dataset<Row> table(DispersionStudy study, SparkSession session, int partitions) {
        Arguments.nonNull("study", study);
        Arguments.nonNull("session", session);
        if (partitions < 1 || partitions > study.cases()) {
            throw new IllegalArgumentException("partitions must be in [1, " + study.cases() + "], got " + partitions);
        }
        if (study.inputNames().isEmpty()) {
            throw new IllegalArgumentException("study must have at least one input, got none");
        }
        List<StructField> fields = new ArrayList<>();
        fields.add(DataTypes.createStructField(CASE_COLUMN, DataTypes.LongType, false));
        for (String name : study.inputNames()) {
            fields.add(DataTypes.createStructField(name, DataTypes.DoubleType, false));
        }
        for (String name : study.outcomeNames()) {
            fields.add(DataTypes.createStructField(name, DataTypes.DoubleType, false));
        }
        StructType schema = DataTypes.createStructType(fields);
        MapPartitionsFunction<Long, Row> cases = indices -> new CaseRows(study, indices);
        return session.range(0, study.cases(), 1, partitions).mapPartitions(cases, Encoders.row(schema));
    }

    /** Computes the rows of one partition lazily, one case per {@code next()}. */
    private static final class CaseRows implements Iterator<Row> {

        private final DispersionStudy study;
        private final Iterator<Long> indices;

        CaseRows(DispersionStudy study, Iterator<Long> indices) {
            this.study = study;
            this.indices = indices;
        }

        @Override
        public boolean hasNext() {
            return indices.hasNext();
        }

        @Override
        public Row next() {
            long index = indices.next();
            double[] values = study.tableRow(index);
            Object[] cells = new Object[values.length + 1];
            cells[0] = index;
            for (int c = 0; c < values.length; c++) {
                cells[c + 1] = values[c];
            }
            return RowFactory.create(cells);
        }
    }
}
