package dev.noninertial.frames.sensing;

import java.io.IOException;
import java.io.Reader;
import java.io.Serializable;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.motion.LogTable;

/**
 * A log of inertial sensor increments over contiguous intervals: for each interval its start and
 * end, the delta-velocity and the delta-angle in sensor axes ({@link SensorIncrements}). It is
 * what an integrating IMU records and what a strapdown navigator consumes; the library writes it
 * from {@link IdealSensor} and {@link SensorImperfections} and reads it back, or reads a log
 * recorded elsewhere.
 *
 * <h2>File format</h2>
 * The library's log style ({@link LogTable}): comment lines start with {@code #}, the header names
 * every column as {@code name[unit]}, then one interval per line. Columns, all required:
 * {@code start}, {@code end} (s, ms), {@code dvx}, {@code dvy}, {@code dvz} (m/s, ft/s),
 * {@code dax}, {@code day}, {@code daz} (rad, deg). Each interval must start where the previous
 * one ended (the same number) and end after it starts.
 *
 * <pre>
 * # ideal increments, 100 Hz
 * start[s],end[s],dvx[m/s],dvy[m/s],dvz[m/s],dax[rad],day[rad],daz[rad]
 * 0.0,0.01,0.0,0.0,0.0980665,7.3e-7,0.0,0.0
 * </pre>
 *
 * <p>Immutable, thread-safe and serializable. Results are for simulation and analysis, not for
 * primary navigation.
 */
public final class IncrementLog implements Serializable {

    /** The header line written by {@link #writeCsv(Writer)}. */
    public static final String HEADER = "start[s],end[s],dvx[m/s],dvy[m/s],dvz[m/s],dax[rad],day[rad],daz[rad]";

    private static final long serialVersionUID = 1L;

    /** Columns of the file and their units (foot: 0.3048 m exactly, the international foot). */
    private static final List<LogTable.Column> COLUMNS = List.of(
            LogTable.Column.of("start", new String[] {"s", "ms"}, new double[] {1, 1e-3}),
            LogTable.Column.of("end", new String[] {"s", "ms"}, new double[] {1, 1e-3}),
            LogTable.Column.of("dvx", new String[] {"m/s", "ft/s"}, new double[] {1, 0.3048}),
            LogTable.Column.of("dvy", new String[] {"m/s", "ft/s"}, new double[] {1, 0.3048}),
            LogTable.Column.of("dvz", new String[] {"m/s", "ft/s"}, new double[] {1, 0.3048}),
            LogTable.Column.of("dax", new String[] {"rad", "deg"}, new double[] {1, Math.PI / 180}),
            LogTable.Column.of("day", new String[] {"rad", "deg"}, new double[] {1, Math.PI / 180}),
            LogTable.Column.of("daz", new String[] {"rad", "deg"}, new double[] {1, Math.PI / 180}));

    /** Start of the first interval (s). */
    private final double start;
    /** End of each interval (s), strictly increasing from {@code start}. */
    private final double[] ends;
    /** Delta-velocities, x, y, z per interval (m/s). */
    private final double[] deltaVelocities;
    /** Delta-angles, x, y, z per interval (rad). */
    private final double[] deltaAngles;

    private IncrementLog(double start, double[] ends, double[] deltaVelocities, double[] deltaAngles) {
        this.start = start;
        this.ends = ends;
        this.deltaVelocities = deltaVelocities;
        this.deltaAngles = deltaAngles;
    }

    /**
     * A log from arrays, in the layout {@code LevelNavigator.run} takes.
     *
     * @param start start of the first interval (s), finite
     * @param ends end of each interval (s), at least one, strictly increasing from {@code start}
     * @param deltaVelocities delta-velocity of each interval, x, y, z packed (m/s, sensor axes), 3 per interval
     * @param deltaAngles delta-angle of each interval, packed (rad, sensor axes), 3 per interval
     * @return the log (the arrays are copied)
     * @throws IllegalArgumentException if a length is wrong, a value is not finite or the ends do
     *         not increase (the message names the interval)
     */
    public static IncrementLog of(double start, double[] ends, double[] deltaVelocities, double[] deltaAngles) {
        Arguments.nonNull("ends", ends);
        Arguments.nonNull("deltaVelocities", deltaVelocities);
        Arguments.nonNull("deltaAngles", deltaAngles);
        return build(start, ends.clone(), deltaVelocities.clone(), deltaAngles.clone(), i -> "interval " + i);
    }

    /**
     * A log of intervals of one length, from the packed layout of
     * {@link IdealSensor#incrementsOver(double, double, int, double[], int)} and
     * {@link SensorImperfections#applyToIncrements} (delta-velocity x, y, z then delta-angle x, y,
     * z per interval, {@link SensorIncrements#COMPONENTS} doubles).
     *
     * @param start start of the first interval (s), finite
     * @param interval length of each interval (s), positive and finite
     * @param increments the packed increments, a positive multiple of 6 doubles
     * @return the log; interval {@code i} ends at {@code start + (i + 1) interval}
     * @throws IllegalArgumentException if a value is not finite or the length is not a positive multiple of 6
     */
    public static IncrementLog ofUniform(double start, double interval, double[] increments) {
        Arguments.finite("start", start);
        Arguments.positive("interval", interval);
        Arguments.nonNull("increments", increments);
        if (increments.length == 0 || increments.length % SensorIncrements.COMPONENTS != 0) {
            throw new IllegalArgumentException("increments must hold a positive multiple of "
                    + SensorIncrements.COMPONENTS + " doubles, got " + increments.length);
        }
        for (int i = 0; i < increments.length; i++) {
            if (!Double.isFinite(increments[i])) {
                throw new IllegalArgumentException("increments[" + i + "] (interval " + i / SensorIncrements.COMPONENTS
                        + ") must be finite, got " + increments[i]);
            }
        }
        int n = increments.length / SensorIncrements.COMPONENTS;
        double[] ends = new double[n];
        for (int i = 0; i < n; i++) {
            ends[i] = start + (i + 1) * interval;
        }
        return unpacked(start, ends, increments);
    }

    /** A log over these intervals of the increments packed as {@link #packed()} returns them. */
    private static IncrementLog unpacked(double start, double[] ends, double[] packed) {
        int n = ends.length;
        double[] dv = new double[3 * n];
        double[] da = new double[3 * n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(packed, SensorIncrements.COMPONENTS * i, dv, 3 * i, 3);
            System.arraycopy(packed, SensorIncrements.COMPONENTS * i + 3, da, 3 * i, 3);
        }
        return build(start, ends, dv, da, i -> "interval " + i);
    }

    /**
     * Reads a log file (format in the class comment), UTF-8.
     *
     * @param file the file
     * @return the log
     * @throws IOException if the file cannot be read
     * @throws IllegalArgumentException if the header or a row is refused; the message names the file and the line
     */
    public static IncrementLog readCsv(Path file) throws IOException {
        return fromTable(LogTable.readCsv(file, COLUMNS, HEADER));
    }

    /**
     * Reads a log in the file format from a character stream.
     *
     * @param source the text
     * @param sourceName name used in messages (a file name, for example)
     * @return the log
     * @throws IOException if the stream fails
     * @throws IllegalArgumentException if the header or a row is refused; the message names the source and the line
     */
    public static IncrementLog readCsv(Reader source, String sourceName) throws IOException {
        return fromTable(LogTable.readCsv(source, sourceName, COLUMNS, HEADER));
    }

    private static IncrementLog fromTable(LogTable table) {
        table.requireGroup("increment", true, "start", "end", "dvx", "dvy", "dvz", "dax", "day", "daz");
        int n = table.size();
        String name = table.source();
        if (n < 1) {
            throw new IllegalArgumentException(name + ": needs at least 1 interval after the header on line "
                    + table.headerLine() + ", got none");
        }
        double[] starts = table.values("start");
        double[] ends = table.values("end");
        for (int i = 1; i < n; i++) {
            if (starts[i] != ends[i - 1]) {
                throw new IllegalArgumentException(name + " line " + table.line(i) + ": start " + starts[i]
                        + " s must be the previous interval's end " + ends[i - 1] + " s (intervals are contiguous)");
            }
        }
        double[] dv = pack(table.values("dvx"), table.values("dvy"), table.values("dvz"));
        double[] da = pack(table.values("dax"), table.values("day"), table.values("daz"));
        return build(starts[0], ends, dv, da, i -> name + " line " + table.line(i));
    }

    private static double[] pack(double[] x, double[] y, double[] z) {
        double[] out = new double[3 * x.length];
        for (int i = 0; i < x.length; i++) {
            out[3 * i] = x[i];
            out[3 * i + 1] = y[i];
            out[3 * i + 2] = z[i];
        }
        return out;
    }

    /** Checks and takes over the arrays; {@code label} names interval {@code i} in refusals. */
    private static IncrementLog build(double start, double[] ends, double[] dv, double[] da,
                                      java.util.function.IntFunction<String> label) {
        Arguments.finite("start", start);
        int n = ends.length;
        if (n < 1) {
            throw new IllegalArgumentException("ends must hold at least 1 interval, got 0");
        }
        if (dv.length != 3 * n || da.length != 3 * n) {
            throw new IllegalArgumentException("deltaVelocities and deltaAngles must hold 3 doubles per interval (" + 3 * n
                    + "), got " + dv.length + " and " + da.length);
        }
        double previous = start;
        for (int i = 0; i < n; i++) {
            if (!(ends[i] > previous) || Double.isInfinite(ends[i])) {
                throw new IllegalArgumentException(label.apply(i) + ": end " + ends[i] + " s must be finite and after"
                        + " the interval's start " + previous + " s");
            }
            previous = ends[i];
            for (int k = 0; k < 3; k++) {
                if (!Double.isFinite(dv[3 * i + k])) {
                    throw new IllegalArgumentException(label.apply(i) + ": deltaVelocities[" + (3 * i + k) + "] (axis "
                            + "xyz".charAt(k) + ") must be finite, got " + dv[3 * i + k]);
                }
                if (!Double.isFinite(da[3 * i + k])) {
                    throw new IllegalArgumentException(label.apply(i) + ": deltaAngles[" + (3 * i + k) + "] (axis "
                            + "xyz".charAt(k) + ") must be finite, got " + da[3 * i + k]);
                }
            }
        }
        return new IncrementLog(start, ends, dv, da);
    }

    /**
     * Writes the log as CSV: two comment lines (the log and the caution), the header
     * {@value #HEADER}, then one interval per line, numbers with {@link Double#toString(double)}
     * (they read back to the same doubles).
     *
     * @param out the destination (flushed, not closed)
     * @throws IOException if writing fails
     */
    public void writeCsv(Writer out) throws IOException {
        Arguments.nonNull("out", out);
        StringBuilder b = new StringBuilder();
        b.append("# ").append(this).append('\n');
        b.append("# for simulation and analysis, not for primary navigation\n");
        b.append(HEADER).append('\n');
        out.write(b.toString());
        double previous = start;
        for (int i = 0; i < ends.length; i++) {
            b.setLength(0);
            b.append(previous).append(',').append(ends[i]);
            for (int k = 0; k < 3; k++) {
                b.append(',').append(deltaVelocities[3 * i + k]);
            }
            for (int k = 0; k < 3; k++) {
                b.append(',').append(deltaAngles[3 * i + k]);
            }
            out.write(b.append('\n').toString());
            previous = ends[i];
        }
        out.flush();
    }

    /**
     * Writes the log as a CSV file (see {@link #writeCsv(Writer)}), UTF-8, replacing the file.
     *
     * @param file the file; its directory must exist
     * @throws IOException if writing fails
     */
    public void writeCsv(Path file) throws IOException {
        Arguments.nonNull("file", file);
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            writeCsv(out);
        }
    }

    /**
     * Returns the number of intervals.
     *
     * @return the number of intervals
     */
    public int size() {
        return ends.length;
    }

    /**
     * Returns the start of the first interval (s).
     *
     * @return the start of the first interval (s)
     */
    public double start() {
        return start;
    }

    /**
     * Returns the end of the last interval (s).
     *
     * @return the end of the last interval (s)
     */
    public double end() {
        return ends[ends.length - 1];
    }

    /**
     * One interval's increments.
     *
     * @param index interval index in [0, size() - 1]
     * @return its increments
     * @throws IndexOutOfBoundsException if {@code index} is out of range
     */
    public SensorIncrements increment(int index) {
        if (index < 0 || index >= ends.length) {
            throw new IndexOutOfBoundsException("index must be in [0, " + (ends.length - 1) + "], got " + index);
        }
        return new SensorIncrements(index == 0 ? start : ends[index - 1], ends[index],
                new Vector3D(deltaVelocities[3 * index], deltaVelocities[3 * index + 1], deltaVelocities[3 * index + 2]),
                new Vector3D(deltaAngles[3 * index], deltaAngles[3 * index + 1], deltaAngles[3 * index + 2]));
    }

    /**
     * Returns the end of each interval (s), a copy.
     *
     * @return the end of each interval (s), a copy
     */
    public double[] ends() {
        return ends.clone();
    }

    /**
     * Returns the delta-velocities, x, y, z packed per interval (m/s, sensor axes), a copy.
     *
     * @return the delta-velocities, x, y, z packed per interval (m/s, sensor axes), a copy
     */
    public double[] deltaVelocities() {
        return deltaVelocities.clone();
    }

    /**
     * Returns the delta-angles, x, y, z packed per interval (rad, sensor axes), a copy.
     *
     * @return the delta-angles, x, y, z packed per interval (rad, sensor axes), a copy
     */
    public double[] deltaAngles() {
        return deltaAngles.clone();
    }

    /**
     * The increments packed as {@link SensorIncrements#COMPONENTS} doubles per interval
     * (delta-velocity x, y, z, then delta-angle x, y, z), a new array.
     */
    double[] packed() {
        double[] out = new double[SensorIncrements.COMPONENTS * ends.length];
        for (int i = 0; i < ends.length; i++) {
            System.arraycopy(deltaVelocities, 3 * i, out, SensorIncrements.COMPONENTS * i, 3);
            System.arraycopy(deltaAngles, 3 * i, out, SensorIncrements.COMPONENTS * i + 3, 3);
        }
        return out;
    }

    /** A log over the same intervals with other increments, packed as {@link #packed()} returns them. */
    IncrementLog withPacked(double[] packed) {
        return unpacked(start, ends, packed);
    }

    /**
     * The length of every interval, refused unless they are all one length to within 1e-9 of it
     * (the rounding of {@code start + k interval}), naming the first that is not.
     */
    double uniformInterval() {
        double interval = (ends[ends.length - 1] - start) / ends.length;
        double previous = start;
        for (int i = 0; i < ends.length; i++) {
            double length = ends[i] - previous;
            if (!(Math.abs(length - interval) <= 1e-9 * interval)) {
                throw new IllegalArgumentException("log must have intervals of one length (mean " + interval
                        + " s) for a sensor error model, interval " + i + " is " + length + " s");
            }
            previous = ends[i];
        }
        return interval;
    }

    /**
     * A stream is untrusted input: the arrays are checked again.
     *
     * @param in the stream
     * @throws IOException if the stream cannot be read or holds invalid values
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(java.io.ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.nonNull("ends", ends);
            Arguments.nonNull("deltaVelocities", deltaVelocities);
            Arguments.nonNull("deltaAngles", deltaAngles);
            build(start, ends, deltaVelocities, deltaAngles, i -> "interval " + i);
        } catch (RuntimeException e) {
            throw Arguments.refusedStream(IncrementLog.class, e);
        }
    }

    @Override
    public String toString() {
        return "IncrementLog{" + ends.length + " intervals, [" + Formats.number(start) + ", "
                + Formats.number(ends[ends.length - 1]) + "] s}";
    }
}
