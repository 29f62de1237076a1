package dev.noninertial.frames.motion;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.units.Units;

/**
 * Reader of the motion log text format (documented on the site page "Sampled motion"): lines
 * starting with {@code #} are comments, blank lines are skipped, the first other line is the
 * header naming every column as {@code name[unit]}, each further line is one sample with
 * comma-separated decimal numbers. Parses straight into primitive arrays; every refusal names the
 * source and the line.
 */
final class MotionLogFile {

    /** Columns in groups; a group is either complete in the header or absent. */
    private enum Column {
        T("t", Kind.TIME), X("x", Kind.LENGTH), Y("y", Kind.LENGTH), Z("z", Kind.LENGTH),
        VX("vx", Kind.SPEED), VY("vy", Kind.SPEED), VZ("vz", Kind.SPEED),
        Q0("q0", Kind.UNIT), Q1("q1", Kind.UNIT), Q2("q2", Kind.UNIT), Q3("q3", Kind.UNIT),
        YAW("yaw", Kind.ANGLE), PITCH("pitch", Kind.ANGLE), ROLL("roll", Kind.ANGLE),
        WX("wx", Kind.RATE), WY("wy", Kind.RATE), WZ("wz", Kind.RATE);

        final String label;
        final Kind kind;

        Column(String label, Kind kind) {
            this.label = label;
            this.kind = kind;
        }
    }

    /** Allowed units per kind of column, with the factor to SI. */
    private enum Kind {
        TIME(new String[] {"s", "ms"}, new double[] {1.0, 1e-3}),
        LENGTH(new String[] {"m", "km"}, new double[] {1.0, 1e3}),
        SPEED(new String[] {"m/s", "km/h", "kn"}, new double[] {1.0, 1.0 / 3.6, Units.KNOT}),
        UNIT(new String[] {"1"}, new double[] {1.0}),
        ANGLE(new String[] {"rad", "deg"}, new double[] {1.0, Units.degrees(1.0)}),
        RATE(new String[] {"rad/s", "deg/s"}, new double[] {1.0, Units.degreesPerSecond(1.0)});

        private final String[] units;
        private final double[] factors;

        Kind(String[] units, double[] factors) {
            this.units = units;
            this.factors = factors;
        }
    }

    private final String source;
    private final int count;
    private final double[] times;
    private final double[] positions;
    private final double[] quaternions;
    private final double[] velocities;
    private final double[] rates;
    private final int[] lines;

    private MotionLogFile(String source, int count, double[] times, double[] positions, double[] quaternions,
                          double[] velocities, double[] rates, int[] lines) {
        this.source = source;
        this.count = count;
        this.times = times;
        this.positions = positions;
        this.quaternions = quaternions;
        this.velocities = velocities;
        this.rates = rates;
        this.lines = lines;
    }

    static MotionLogFile read(Path file) throws IOException {
        // two passes: count the rows first, then parse into arrays of their final size, so the
        // peak memory stays near the result (no growth copies, no final trimming copy)
        int rows = LogTable.countRows(file);
        try (BufferedReader in = LogText.open(file)) {
            return parse(in, file.toString(), Math.max(rows, 2));
        }
    }

    static MotionLogFile read(Reader source, String name) throws IOException {
        BufferedReader in = source instanceof BufferedReader ? (BufferedReader) source : new BufferedReader(source);
        return parse(in, name, 1024);
    }

    SampledMotion toMotion() {
        int[] rowLines = lines;
        String name = source;
        return SampledMotion.fromParsed(times, positions, quaternions, velocities, rates,
                i -> name + " line " + rowLines[i]);
    }

    int count() {
        return count;
    }

    // ------------------------------------------------------------------ parsing

    /** The columns of the motion log for {@link LogTable}, with the units of their kind. */
    private static final List<LogTable.Column> KNOWN = known();

    private static List<LogTable.Column> known() {
        List<LogTable.Column> list = new ArrayList<>();
        for (Column c : Column.values()) {
            list.add(LogTable.Column.of(c.label, c.kind.units, c.kind.factors));
        }
        return List.copyOf(list);
    }

    private static MotionLogFile parse(BufferedReader in, String source, int expectedRows) throws IOException {
        Filler filler = new Filler(source, expectedRows);
        LogTable.parse(in, source, KNOWN, "t[s], x[m], y[m], z[m], yaw[deg], pitch[deg], roll[deg]", filler);
        return filler.finish();
    }

    /**
     * Fills the packed arrays of a motion straight from the rows ({@link LogTable}'s parser), so
     * that the peak memory stays near the result: the header's groups are checked as it arrives.
     */
    private static final class Filler implements LogTable.Rows {

        private final String source;
        private int capacity;
        private int headerLine;
        /** The motion-log column of each header field. */
        private Column[] columns;
        private boolean ypr;
        private int n;
        private double[] t;
        private double[] pos;
        private double[] quat;
        private double[] vel;
        private double[] rate;
        private int[] lines;
        private final double[] row = new double[Column.values().length];

        Filler(String source, int capacity) {
            this.source = source;
            this.capacity = capacity;
        }

        @Override
        public void header(LogTable.Column[] present, int line) {
            headerLine = line;
            requireGroup(present, true, "time", Column.T);
            requireGroup(present, true, "position", Column.X, Column.Y, Column.Z);
            requireGroup(present, false, "velocity", Column.VX, Column.VY, Column.VZ);
            requireGroup(present, false, "quaternion", Column.Q0, Column.Q1, Column.Q2, Column.Q3);
            requireGroup(present, false, "yaw-pitch-roll", Column.YAW, Column.PITCH, Column.ROLL);
            requireGroup(present, false, "angular rate", Column.WX, Column.WY, Column.WZ);
            boolean quaternion = LogTable.indexOf(present, Column.Q0.label) >= 0;
            ypr = LogTable.indexOf(present, Column.YAW.label) >= 0;
            if (quaternion == ypr) {
                throw new IllegalArgumentException(source + " line " + line + " (header): the attitude needs "
                        + "exactly one of the groups q0, q1, q2, q3 or yaw, pitch, roll, got "
                        + (quaternion ? "both" : "neither"));
            }
            columns = new Column[present.length];
            for (int k = 0; k < present.length; k++) {
                for (Column c : Column.values()) {
                    if (c.label.equals(present[k].name())) {
                        columns[k] = c;
                    }
                }
            }
            t = new double[capacity];
            pos = new double[3 * capacity];
            quat = new double[4 * capacity];
            lines = new int[capacity];
            if (LogTable.indexOf(present, Column.VX.label) >= 0) {
                vel = new double[3 * capacity];
            }
            if (LogTable.indexOf(present, Column.WX.label) >= 0) {
                rate = new double[3 * capacity];
            }
        }

        private void requireGroup(LogTable.Column[] present, boolean required, String what, Column... group) {
            String[] names = new String[group.length];
            for (int k = 0; k < group.length; k++) {
                names[k] = group[k].label;
            }
            LogTable.requireGroup(source, headerLine, present, what, required, names);
        }

        @Override
        public void row(double[] fields, int lineNumber) {
            for (int c = 0; c < columns.length; c++) {
                row[columns[c].ordinal()] = fields[c];
            }
            if (n == capacity) {
                capacity = capacity + (capacity >> 1) + 1;
                t = Arrays.copyOf(t, capacity);
                pos = Arrays.copyOf(pos, 3 * capacity);
                quat = Arrays.copyOf(quat, 4 * capacity);
                lines = Arrays.copyOf(lines, capacity);
                if (vel != null) {
                    vel = Arrays.copyOf(vel, 3 * capacity);
                }
                if (rate != null) {
                    rate = Arrays.copyOf(rate, 3 * capacity);
                }
            }
            t[n] = row[Column.T.ordinal()];
            pos[3 * n] = row[Column.X.ordinal()];
            pos[3 * n + 1] = row[Column.Y.ordinal()];
            pos[3 * n + 2] = row[Column.Z.ordinal()];
            if (ypr) {
                Rotation r = Orientations.fromYawPitchRoll(row[Column.YAW.ordinal()], row[Column.PITCH.ordinal()],
                        row[Column.ROLL.ordinal()]);
                quat[4 * n] = r.getQ0();
                quat[4 * n + 1] = r.getQ1();
                quat[4 * n + 2] = r.getQ2();
                quat[4 * n + 3] = r.getQ3();
            } else {
                quat[4 * n] = row[Column.Q0.ordinal()];
                quat[4 * n + 1] = row[Column.Q1.ordinal()];
                quat[4 * n + 2] = row[Column.Q2.ordinal()];
                quat[4 * n + 3] = row[Column.Q3.ordinal()];
            }
            if (vel != null) {
                vel[3 * n] = row[Column.VX.ordinal()];
                vel[3 * n + 1] = row[Column.VY.ordinal()];
                vel[3 * n + 2] = row[Column.VZ.ordinal()];
            }
            if (rate != null) {
                rate[3 * n] = row[Column.WX.ordinal()];
                rate[3 * n + 1] = row[Column.WY.ordinal()];
                rate[3 * n + 2] = row[Column.WZ.ordinal()];
            }
            lines[n] = lineNumber;
            n++;
        }

        MotionLogFile finish() {
            if (n < 2) {
                throw new IllegalArgumentException(source + ": needs at least 2 sample rows after the header on line "
                        + headerLine + ", got " + n);
            }
            if (n == capacity) {
                // the counted size: the arrays are already exact, no trimming copy
                return new MotionLogFile(source, n, t, pos, quat, vel, rate, lines);
            }
            return new MotionLogFile(source, n, Arrays.copyOf(t, n), Arrays.copyOf(pos, 3 * n),
                    Arrays.copyOf(quat, 4 * n), vel == null ? null : Arrays.copyOf(vel, 3 * n),
                    rate == null ? null : Arrays.copyOf(rate, 3 * n), lines);
        }
    }

    /** Exact powers of ten up to 1e22, the largest exactly representable in a double. */
    private static final double[] TENS = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    /**
     * Parses {@code text[from, to)}, surrounding spaces and tabs allowed, as a plain decimal number:
     * optional sign, digits with at most one decimal point (at least one digit), optional exponent
     * {@code e} or {@code E} with optional sign and digits. Returns NaN if the text is anything
     * else. The result is the correctly rounded double, the same as {@link Double#parseDouble}:
     * with at most 15 significant digits and a decimal exponent within 22 it is one exact integer
     * times or divided by one exact power of ten, a single correctly rounded operation (Clinger's
     * fast path, "How to read floating point numbers accurately", PLDI 1990); other inputs go to
     * {@link Double#parseDouble}. Avoids allocating per field for the usual short numbers.
     */
    static double decimal(String text, int from, int to) {
        int a = from;
        int b = to;
        while (a < b && (text.charAt(a) == ' ' || text.charAt(a) == '\t')) {
            a++;
        }
        while (b > a && (text.charAt(b - 1) == ' ' || text.charAt(b - 1) == '\t')) {
            b--;
        }
        int c = a;
        boolean negative = false;
        if (c < b && (text.charAt(c) == '-' || text.charAt(c) == '+')) {
            negative = text.charAt(c) == '-';
            c++;
        }
        long mantissa = 0;
        int significant = 0;
        int digits = 0;
        int scale = 0;
        boolean point = false;
        for (; c < b; c++) {
            char ch = text.charAt(c);
            if (ch >= '0' && ch <= '9') {
                digits++;
                if (point) {
                    scale--;
                }
                if (significant > 0 || ch != '0') {
                    significant++;
                    if (significant <= 18) {
                        mantissa = 10 * mantissa + (ch - '0');
                    } else {
                        scale++; // digit dropped from the mantissa; only used to decide the path
                    }
                }
            } else if (ch == '.' && !point) {
                point = true;
            } else {
                break;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        int exponent = 0;
        if (c < b) {
            char ch = text.charAt(c);
            if (ch != 'e' && ch != 'E') {
                return Double.NaN;
            }
            c++;
            boolean negativeExponent = false;
            if (c < b && (text.charAt(c) == '-' || text.charAt(c) == '+')) {
                negativeExponent = text.charAt(c) == '-';
                c++;
            }
            if (c == b) {
                return Double.NaN;
            }
            for (; c < b; c++) {
                ch = text.charAt(c);
                if (ch < '0' || ch > '9') {
                    return Double.NaN;
                }
                if (exponent < 100000) {
                    exponent = 10 * exponent + (ch - '0');
                }
            }
            if (negativeExponent) {
                exponent = -exponent;
            }
        }
        int power = exponent + scale;
        if (significant <= 15 && power >= -22 && power <= 22) {
            double m = mantissa;
            double value = power >= 0 ? m * TENS[power] : m / TENS[-power];
            return negative ? -value : value;
        }
        return Double.parseDouble(text.substring(a, b));
    }
}
