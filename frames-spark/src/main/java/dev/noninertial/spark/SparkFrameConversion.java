package dev.noninertial.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;

import org.apache.spark.api.java.function.MapPartitionsFunction;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * Converts a large motion or track log, a Dataset with one state per row, from one frame of a
 * tree to another, partition by partition with the library's allocation-free bulk API
 * ({@link Motion#toBase(double[], int, double[], int, double[], int, int)} and
 * {@link Motion#fromBase(double[], int, double[], int, double[], int, int)}, one link at a time
 * along the path through the frames' common ancestor, on blocks of {@value #BLOCK} rows).
 *
 * <p>Input: a time column (s from the tree's epoch) and nine state columns, x, y, z (m),
 * vx, vy, vz (m/s), ax, ay, az (m/s^2), seen in and resolved in the source frame, all of type
 * double. Output: every input column, then nine double columns named {@code prefix + "x"},
 * {@code prefix + "y"}, ..., {@code prefix + "az"} with the same state seen in and resolved in
 * the target frame, with every kinematic term of the conversion (see
 * {@link dev.noninertial.frames.Placement} for the conventions). Row order is kept.
 *
 * <p>The frames (and their motions) travel to the executors by Java serialization. Conversion
 * allocates nothing per state when the motions' {@link Motion#at(double, double[], int)}
 * allocates nothing (true for the library's ready-made motions except composition); Spark itself
 * allocates its rows.
 *
 * <p>Thread-safe: stateless.
 */
public final class SparkFrameConversion {

    /** Rows converted together per bulk call. */
    public static final int BLOCK = 1024;

    /** Suffixes of the nine state columns, in the order of {@link PointState#toArray(double[], int)}. */
    public static final List<String> STATE_SUFFIXES = List.of("x", "y", "z", "vx", "vy", "vz", "ax", "ay", "az");

    private SparkFrameConversion() {
    }

    /**
     * Converts every row's state from one frame to another.
     *
     * @param rows the log; must hold {@code timeColumn} and the nine {@code stateColumns}, doubles
     * @param timeColumn name of the time column (s from the tree's epoch)
     * @param stateColumns names of the nine state columns in the order x, y, z, vx, vy, vz, ax, ay, az
     * @param from frame the states are seen in
     * @param to frame to convert them to (same tree)
     * @param prefix prefix of the nine output column names, non-empty, not clashing with an input column
     * @return the Dataset with the nine converted columns appended (lazy)
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if a column is missing or not a double, there are not nine
     *         state columns, an output name clashes, or the frames share no root
     */
    public static Dataset<Row> convert(Dataset<Row> rows, String timeColumn, List<String> stateColumns,
            ReferenceFrame from, ReferenceFrame to, String prefix) {
        Arguments.nonNull("rows", rows);
        Arguments.nonNull("timeColumn", timeColumn);
        Arguments.nonNull("stateColumns", stateColumns);
        Arguments.nonNull("from", from);
        Arguments.nonNull("to", to);
        Arguments.nonNull("prefix", prefix);
        if (stateColumns.size() != PointState.COMPONENTS) {
            throw new IllegalArgumentException("stateColumns must hold " + PointState.COMPONENTS
                    + " names (x, y, z, vx, vy, vz, ax, ay, az), got " + stateColumns.size());
        }
        StructType schema = rows.schema();
        StructType out = withDoubleColumns(schema, prefix, STATE_SUFFIXES, false);
        int time = doubleColumn(schema, timeColumn);
        int[] state = new int[PointState.COMPONENTS];
        for (int k = 0; k < state.length; k++) {
            state[k] = doubleColumn(schema, stateColumns.get(k));
        }
        FramePath path = FramePath.between(from, to);
        MapPartitionsFunction<Row, Row> convert = input -> new ConvertedRows(input, time, state, path);
        return rows.mapPartitions(convert, Encoders.row(out));
    }

    /**
     * The schema with double columns {@code prefix + suffix} appended, refused unless the prefix is
     * non-empty and every new name is new.
     */
    static StructType withDoubleColumns(StructType schema, String prefix, List<String> suffixes, boolean nullable) {
        if (prefix.isEmpty()) {
            throw new IllegalArgumentException("prefix must be non-empty, got ''");
        }
        List<StructField> fields = new ArrayList<>(Arrays.asList(schema.fields()));
        for (String suffix : suffixes) {
            String name = prefix + suffix;
            if (Arrays.asList(schema.fieldNames()).contains(name)) {
                throw new IllegalArgumentException("prefix must give new column names, '" + name
                        + "' is already a column of " + Arrays.toString(schema.fieldNames()));
            }
            fields.add(DataTypes.createStructField(name, DataTypes.DoubleType, nullable));
        }
        return DataTypes.createStructType(fields);
    }

    /** The index of a column of type double, refused naming the column if missing or of another type. */
    static int doubleColumn(StructType schema, String name) {
        List<String> names = Arrays.asList(schema.fieldNames());
        int i = names.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("column '" + name + "' must exist, columns are " + names);
        }
        if (!DataTypes.DoubleType.equals(schema.fields()[i].dataType())) {
            throw new IllegalArgumentException("column '" + name + "' must be of type double, got "
                    + schema.fields()[i].dataType().simpleString());
        }
        return i;
    }

    /** The links from a frame up to the common ancestor, then down to the target. */
    static final class FramePath implements Serializable {

        private static final long serialVersionUID = 1L;

        /** Motions of the frames from {@code from} up to (not including) the common ancestor. */
        @SuppressWarnings("serial") // shipped to the executors: the library's motions are serializable, a user's must be too
        private final List<Motion> up;
        /** Motions of the frames from just below the common ancestor down to {@code to}. */
        @SuppressWarnings("serial") // as up
        private final List<Motion> down;

        private FramePath(List<Motion> up, List<Motion> down) {
            this.up = up;
            this.down = down;
        }

        static FramePath between(ReferenceFrame from, ReferenceFrame to) {
            if (!from.root().equals(to.root())) {
                throw new IllegalArgumentException("to must share a root with from = " + from.path()
                        + ", got " + to.path());
            }
            List<ReferenceFrame> fromChain = chain(from);
            List<ReferenceFrame> toChain = chain(to);
            int common = 0;
            while (common < fromChain.size() && common < toChain.size()
                    && fromChain.get(common).equals(toChain.get(common))) {
                common++;
            }
            List<Motion> up = new ArrayList<>();
            for (int i = fromChain.size() - 1; i >= common; i--) {
                up.add(fromChain.get(i).motion().orElseThrow());
            }
            List<Motion> down = new ArrayList<>();
            for (int i = common; i < toChain.size(); i++) {
                down.add(toChain.get(i).motion().orElseThrow());
            }
            return new FramePath(List.copyOf(up), List.copyOf(down));
        }

        /** Root first, the frame itself last. */
        private static List<ReferenceFrame> chain(ReferenceFrame frame) {
            List<ReferenceFrame> chain = new ArrayList<>();
            for (ReferenceFrame f = frame; f != null; f = f.parent().orElse(null)) {
                chain.add(0, f);
            }
            return chain;
        }

        /** Converts {@code count} states in place, each at its own time. */
        void convert(double[] times, double[] states, int count) {
            for (Motion link : up) {
                link.toBase(times, 0, states, 0, states, 0, count);
            }
            for (Motion link : down) {
                link.fromBase(times, 0, states, 0, states, 0, count);
            }
        }
    }

    /** Reads a block of rows, converts it with one bulk call per link, hands the rows out. */
    private static final class ConvertedRows implements Iterator<Row> {

        private final Iterator<Row> input;
        private final int time;
        private final int[] state;
        private final FramePath path;
        private final Row[] block = new Row[BLOCK];
        private final double[] times = new double[BLOCK];
        private final double[] states = new double[BLOCK * PointState.COMPONENTS];
        private int filled;
        private int next;

        ConvertedRows(Iterator<Row> input, int time, int[] state, FramePath path) {
            this.input = input;
            this.time = time;
            this.state = state;
            this.path = path;
        }

        @Override
        public boolean hasNext() {
            if (next < filled) {
                return true;
            }
            filled = 0;
            next = 0;
            while (filled < BLOCK && input.hasNext()) {
                Row row = input.next();
                block[filled] = row;
                times[filled] = row.getDouble(time);
                int base = filled * PointState.COMPONENTS;
                for (int k = 0; k < PointState.COMPONENTS; k++) {
                    states[base + k] = row.getDouble(state[k]);
                }
                filled++;
            }
            if (filled > 0) {
                path.convert(times, states, filled);
            }
            return filled > 0;
        }

        @Override
        public Row next() {
            if (!hasNext()) {
                throw new NoSuchElementException("no more rows");
            }
            Row row = appended(block[next], states, next * PointState.COMPONENTS, PointState.COMPONENTS);
            block[next] = null;
            next++;
            return row;
        }
    }

    /** A new row: every cell of {@code row}, then {@code values[from, from + n)}, or {@code n} nulls if {@code values} is null. */
    static Row appended(Row row, double[] values, int from, int n) {
        int width = row.length();
        Object[] cells = new Object[width + n];
        for (int c = 0; c < width; c++) {
            cells[c] = row.get(c);
        }
        for (int k = 0; k < n; k++) {
            cells[width + k] = values == null ? null : values[from + k];
        }
        return RowFactory.create(cells);
    }
}
