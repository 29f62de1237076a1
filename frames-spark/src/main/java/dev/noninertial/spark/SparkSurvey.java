package dev.noninertial.spark;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Objects;

import org.apache.spark.api.java.function.MapPartitionsFunction;
import org.apache.spark.sql.Column;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.types.StructType;

import dev.noninertial.frames.Arguments;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.GeodeticTrack;
import dev.noninertial.geodesy.SurveyFilter;
import dev.noninertial.geodesy.SurveyPoint;

/**
 * The survey quantities of a large gravity-survey log on Apache Spark: for every row of every
 * survey line, the Eotvos correction, the platform's vertical acceleration, the reading of an
 * ideal gravimeter on a level platform and normal gravity, exactly as
 * {@link GeodeticTrack#surveyAtSamples(EarthFrames)} computes them on one machine (see
 * {@link SurveyPoint} for the conventions).
 *
 * <p>Input: a line column (any type; one survey line, vessel or flight per value, never null),
 * a time column (s from the Earth frames' epoch) and three position columns: geodetic latitude
 * and longitude in <b>degrees</b> and ellipsoidal height in metres, all four of type double. Rows
 * may come in any order and partitioning. Each line is one {@link GeodeticTrack}: its rows are
 * gathered in one partition (hash partitioning on the line column), sorted by time and
 * interpolated with the track's rates, so a line's rows must fit in one executor's memory.
 *
 * <p>Output: every input column, then four double columns in SI units (m/s^2; 1 mGal = 1e-5
 * m/s^2), named {@code prefix} followed by the {@link #SURVEY_SUFFIXES}: the Eotvos correction
 * (to be added to a moving gravimeter's reading), the vertical acceleration {@code d2h/dt2}, the
 * ideal gravimeter's reading and normal gravity. Rows come out grouped by line, each line in
 * time order; the values do not depend on the partitioning (each line is computed whole). With a
 * {@link SurveyFilter} the four columns are filtered along each line and null in the rows at each
 * end where the filter's kernel does not fit.
 *
 * <p>Refusals, on the driver: a missing column, a column of the wrong type, a prefix that is empty
 * or gives an existing name. On the executors (Spark reports them as a failed task whose cause
 * carries the message): a null line, and every refusal of {@link GeodeticTrack} (fewer than two
 * rows, equal times, a gap longer than {@code maxGap}, a latitude at a pole, a non-finite value),
 * with the line named and the sample counted in the line's time order.
 *
 * <p>Results are for survey processing and analysis, not for primary navigation.
 * Thread-safe: stateless.
 */
public final class SparkSurvey {

    /** Suffix of the free-air anomaly column of {@link #anomaliesAtSamples} (m/s^2). */
    public static final String ANOMALY_SUFFIX = "free_air_anomaly";

    /**
     * Suffixes of the four output columns: Eotvos correction, vertical acceleration, ideal
     * gravimeter reading, normal gravity (m/s^2 each).
     */
    public static final List<String> SURVEY_SUFFIXES = List.of("eotvos", "vertical_acceleration", "reading",
            "normal_gravity");

    private SparkSurvey() {
    }

    /**
     * The survey quantities at every row of every line.
     *
     * @param rows the log; must hold the line column and the four double columns
     * @param lineColumn name of the column naming the survey line (any type, never null)
     * @param timeColumn name of the time column (s from {@code earth}'s epoch), double
     * @param positionColumns names of the latitude (degrees), longitude (degrees) and height (m)
     *        columns, in that order, doubles
     * @param earth the Earth frames (model and epoch), shipped to the executors
     * @param maxGap largest allowed gap between consecutive rows of a line (s), positive and finite
     * @param prefix prefix of the four output column names, non-empty, not clashing with an input column
     * @return the Dataset with the four survey columns appended, grouped by line and in time order (lazy)
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if a column is missing or not a double, there are not three
     *         position columns, {@code maxGap} is out of range or an output name clashes
     */
    public static Dataset<Row> atSamples(Dataset<Row> rows, String lineColumn, String timeColumn,
            List<String> positionColumns, EarthFrames earth, double maxGap, String prefix) {
        return survey(rows, lineColumn, timeColumn, positionColumns, earth, maxGap, null, null, prefix);
    }

    /**
     * The survey quantities at every row of every line, filtered along each line as
     * {@link GeodeticTrack#surveyAtSamples(EarthFrames, SurveyFilter)} filters them. Every row is
     * kept: the four columns are nullable and null in the {@link SurveyFilter#margin(double)} rows
     * at each end of a line, where the filter's kernel does not fit (nothing is extrapolated).
     * Each line must be sampled at a constant interval and span the kernel, else the job fails
     * naming the line.
     *
     * @param rows the log; must hold the line column and the four double columns
     * @param lineColumn name of the column naming the survey line (any type, never null)
     * @param timeColumn name of the time column (s from {@code earth}'s epoch), double
     * @param positionColumns names of the latitude (degrees), longitude (degrees) and height (m)
     *        columns, in that order, doubles
     * @param earth the Earth frames (model and epoch), shipped to the executors
     * @param maxGap largest allowed gap between consecutive rows of a line (s), positive and finite
     * @param filter the filter applied to the four quantities along each line
     * @param prefix prefix of the four output column names, non-empty, not clashing with an input column
     * @return the Dataset with the four filtered survey columns appended, grouped by line and in
     *         time order (lazy)
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException as {@link #atSamples(Dataset, String, String, List, EarthFrames, double, String)}
     */
    public static Dataset<Row> atSamples(Dataset<Row> rows, String lineColumn, String timeColumn,
            List<String> positionColumns, EarthFrames earth, double maxGap, SurveyFilter filter, String prefix) {
        Arguments.nonNull("filter", filter);
        return survey(rows, lineColumn, timeColumn, positionColumns, earth, maxGap, filter, null, prefix);
    }

    /**
     * The filtered survey quantities and the free-air anomaly of a measured gravimeter reading at
     * every row of every line: the four columns of
     * {@link #atSamples(Dataset, String, String, List, EarthFrames, double, SurveyFilter, String)},
     * then {@code prefix + "free_air_anomaly"}, {@link SurveyPoint#freeAirAnomaly(double)} of the
     * reading filtered along the line by the same filter as the corrections (m/s^2; null where the
     * kernel does not fit).
     *
     * <p>The reading must be absolute gravity in m/s^2 on a level, stabilised platform: a relative
     * meter's readings must first be scaled by its calibration and tied to a base station, which
     * this library does not do.
     *
     * @param rows the log; must hold the line column and the five double columns
     * @param lineColumn name of the column naming the survey line (any type, never null)
     * @param timeColumn name of the time column (s from {@code earth}'s epoch), double
     * @param positionColumns names of the latitude (degrees), longitude (degrees) and height (m)
     *        columns, in that order, doubles
     * @param readingColumn name of the measured gravimeter reading (m/s^2), double
     * @param earth the Earth frames (model and epoch), shipped to the executors
     * @param maxGap largest allowed gap between consecutive rows of a line (s), positive and finite
     * @param filter the filter applied to the corrections and the reading along each line
     * @param prefix prefix of the five output column names, non-empty, not clashing with an input column
     * @return the Dataset with the five columns appended, grouped by line and in time order (lazy)
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException as {@link #atSamples(Dataset, String, String, List, EarthFrames, double, String)}
     */
    public static Dataset<Row> anomaliesAtSamples(Dataset<Row> rows, String lineColumn, String timeColumn,
            List<String> positionColumns, String readingColumn, EarthFrames earth, double maxGap, SurveyFilter filter,
            String prefix) {
        Arguments.nonNull("readingColumn", readingColumn);
        Arguments.nonNull("filter", filter);
        return survey(rows, lineColumn, timeColumn, positionColumns, earth, maxGap, filter, readingColumn, prefix);
    }

    private static Dataset<Row> survey(Dataset<Row> rows, String lineColumn, String timeColumn,
            List<String> positionColumns, EarthFrames earth, double maxGap, SurveyFilter filter, String readingColumn,
            String prefix) {
        // readingColumn: the measured reading, or null for none
        Arguments.nonNull("rows", rows);
        Arguments.nonNull("lineColumn", lineColumn);
        Arguments.nonNull("timeColumn", timeColumn);
        Arguments.nonNull("positionColumns", positionColumns);
        Arguments.nonNull("earth", earth);
        Arguments.nonNull("prefix", prefix);
        if (!(maxGap > 0 && maxGap < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("maxGap must be positive and finite (s), got " + maxGap);
        }
        if (positionColumns.size() != 3) {
            throw new IllegalArgumentException("positionColumns must hold 3 names (latitude in degrees, longitude"
                    + " in degrees, height in m), got " + positionColumns.size() + ": " + positionColumns);
        }
        StructType schema = rows.schema();
        int reading = readingColumn == null ? -1 : SparkFrameConversion.doubleColumn(schema, readingColumn);
        List<String> suffixes = new ArrayList<>(SURVEY_SUFFIXES);
        if (reading >= 0) {
            suffixes.add(ANOMALY_SUFFIX);
        }
        StructType out = SparkFrameConversion.withDoubleColumns(schema, prefix, suffixes, filter != null);
        int line = columnIndex(schema, lineColumn);
        int time = SparkFrameConversion.doubleColumn(schema, timeColumn);
        int[] position = new int[3];
        for (int k = 0; k < 3; k++) {
            position[k] = SparkFrameConversion.doubleColumn(schema, positionColumns.get(k));
        }
        String lineName = lineColumn;
        MapPartitionsFunction<Row, Row> survey = input -> new SurveyedRows(input, lineName, line, time, position,
                earth, maxGap, filter, reading);
        Column lineKey = rows.col(lineColumn);
        return rows.repartition(lineKey).sortWithinPartitions(lineKey, rows.col(timeColumn))
                .mapPartitions(survey, Encoders.row(out));
    }

    private static int columnIndex(StructType schema, String name) {
        List<String> names = List.of(schema.fieldNames());
        int i = names.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("column '" + name + "' must exist, columns are " + names);
        }
        return i;
    }

    /** Reads one line's rows (consecutive after the sort), surveys them, hands them out with the results. */
    private static final class SurveyedRows implements Iterator<Row> {

        private final Iterator<Row> input;
        private final String lineColumn;
        private final int line;
        private final int time;
        private final int[] position;
        private final EarthFrames earth;
        private final double maxGap;
        /** The filter along each line, or null. */
        private final SurveyFilter filter;
        /** Index of the measured-reading column, or -1. */
        private final int reading;
        /** Columns appended per row: four, five with the anomaly. */
        private final int width;
        /** Rows without a value at each end of the current line (the filter's margin). */
        private int margin;
        /** The first row of the next line, read ahead, or null. */
        private Row pending;
        private final List<Row> block = new ArrayList<>();
        private double[] values = new double[0];
        private int next;

        SurveyedRows(Iterator<Row> input, String lineColumn, int line, int time, int[] position, EarthFrames earth,
                     double maxGap, SurveyFilter filter, int reading) {
            this.input = input;
            this.lineColumn = lineColumn;
            this.line = line;
            this.time = time;
            this.position = position;
            this.earth = earth;
            this.maxGap = maxGap;
            this.filter = filter;
            this.reading = reading;
            this.width = SURVEY_SUFFIXES.size() + (reading >= 0 ? 1 : 0);
        }

        @Override
        public boolean hasNext() {
            if (next < block.size()) {
                return true;
            }
            block.clear();
            next = 0;
            Row first = pending != null ? pending : input.hasNext() ? input.next() : null;
            pending = null;
            if (first == null) {
                return false;
            }
            Object key = keyOf(first);
            block.add(first);
            while (input.hasNext()) {
                Row row = input.next();
                if (!Objects.equals(key, keyOf(row))) {
                    pending = row;
                    break;
                }
                block.add(row);
            }
            survey(key);
            return true;
        }

        private Object keyOf(Row row) {
            Object key = row.get(line);
            if (key == null) {
                throw new IllegalArgumentException("column '" + lineColumn + "' must name a line in every row, got"
                        + " null in " + row);
            }
            return key;
        }

        private void survey(Object key) {
            int n = block.size();
            double[] t = new double[n];
            double[] lat = new double[n];
            double[] lon = new double[n];
            double[] h = new double[n];
            for (int i = 0; i < n; i++) {
                Row row = block.get(i);
                t[i] = row.getDouble(time);
                lat[i] = Math.toRadians(row.getDouble(position[0]));
                lon[i] = Math.toRadians(row.getDouble(position[1]));
                h[i] = row.getDouble(position[2]);
            }
            List<SurveyPoint> points;
            try {
                GeodeticTrack track = GeodeticTrack.fromArrays(t, lat, lon, h, maxGap);
                points = filter == null ? track.surveyAtSamples(earth) : track.surveyAtSamples(earth, filter);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(lineColumn + " '" + key + "' (" + n + " rows, samples counted in"
                        + " time order): " + e.getMessage(), e);
            }
            if (values.length < n * width) {
                values = new double[n * width];
            }
            margin = (n - points.size()) / 2;
            double[] measured = null;
            if (reading >= 0) {
                double[] r = new double[n];
                for (int i = 0; i < n; i++) {
                    r[i] = block.get(i).getDouble(reading);
                }
                try {
                    measured = filter.applyTo(t, r);
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException(lineColumn + " '" + key + "' (" + n + " rows, samples counted"
                            + " in time order), readings: " + e.getMessage(), e);
                }
            }
            for (int i = 0; i < points.size(); i++) {
                SurveyPoint p = points.get(i);
                values[i * width] = p.eotvosCorrection();
                values[i * width + 1] = p.verticalAcceleration();
                values[i * width + 2] = p.gravimeterReading();
                values[i * width + 3] = p.normalGravity();
                if (measured != null) {
                    values[i * width + 4] = p.freeAirAnomaly(measured[i]);
                }
            }
        }

        @Override
        public Row next() {
            if (!hasNext()) {
                throw new NoSuchElementException("no more rows");
            }
            int k = next - margin;
            boolean inside = k >= 0 && k < block.size() - 2 * margin;
            Row row = SparkFrameConversion.appended(block.get(next), inside ? values : null, k * width, width);
            block.set(next, null);
            next++;
            return row;
        }
    }
}
