package dev.noninertial.frames.motion;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

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

    private static MotionLogFile parse(BufferedReader in, String source, int expectedRows) throws IOException {
        String line;
        int lineNumber = 0;
        Column[] columns = null;
        double[] factors = null;
        int headerLine = 0;
        int capacity = expectedRows;
        int n = 0;
        double[] t = new double[capacity];
        double[] pos = new double[3 * capacity];
        double[] quat = new double[4 * capacity];
        double[] vel = null;
        double[] rate = null;
        int[] lines = new int[capacity];
        int[] slot = new int[Column.values().length];
        boolean ypr = false;
        double[] row = new double[Column.values().length];
        String[] names = null;
        double[] fields = null;
        while ((line = in.readLine()) != null) {
            lineNumber++;
            String trimmed = LogTable.content(line, source, lineNumber);
            if (trimmed == null) {
                continue;
            }
            if (columns == null) {
                headerLine = lineNumber;
                LogText.checkSeparator(trimmed, source, lineNumber);
                columns = header(trimmed, source, lineNumber);
                Arrays.fill(slot, -1);
                for (int c = 0; c < columns.length; c++) {
                    slot[columns[c].ordinal()] = c;
                }
                factors = unitFactors(trimmed, columns, source, lineNumber);
                names = new String[columns.length];
                fields = new double[columns.length];
                for (int c = 0; c < columns.length; c++) {
                    names[c] = columns[c].label;
                }
                ypr = slot[Column.YAW.ordinal()] >= 0;
                if (slot[Column.VX.ordinal()] >= 0) {
                    vel = new double[3 * capacity];
                }
                if (slot[Column.WX.ordinal()] >= 0) {
                    rate = new double[3 * capacity];
                }
                continue;
            }
            // LogTable's row rule, then each field to its column's slot
            LogTable.parseFields(trimmed, names, factors, fields, source, lineNumber);
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
        if (columns == null) {
            throw new IllegalArgumentException(source + ": no header row (expected a line such as "
                    + "'t[s], x[m], y[m], z[m], yaw[deg], pitch[deg], roll[deg]' after the comments)");
        }
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

    private static Column[] header(String text, String source, int lineNumber) {
        String[] fields = text.split(",", -1);
        Map<String, Column> byLabel = new LinkedHashMap<>();
        for (Column c : Column.values()) {
            byLabel.put(c.label, c);
        }
        Column[] columns = new Column[fields.length];
        boolean[] seen = new boolean[Column.values().length];
        for (int k = 0; k < fields.length; k++) {
            String field = fields[k].trim();
            int open = field.indexOf('[');
            if (open <= 0 || !field.endsWith("]")) {
                throw new IllegalArgumentException(source + " line " + lineNumber + " (header), field " + (k + 1)
                        + ": " + LogText.quoted(field) + " must read name[unit], for example t[s] or yaw[deg]");
            }
            String name = field.substring(0, open).trim();
            Column c = byLabel.get(name);
            if (c == null) {
                throw new IllegalArgumentException(source + " line " + lineNumber + " (header), field " + (k + 1)
                        + ": unknown column " + LogText.quoted(name) + "; known columns: "
                        + String.join(", ", byLabel.keySet()));
            }
            if (seen[c.ordinal()]) {
                throw new IllegalArgumentException(source + " line " + lineNumber + " (header): column '" + name
                        + "' appears twice");
            }
            seen[c.ordinal()] = true;
            columns[k] = c;
        }
        requireGroup(seen, source, lineNumber, true, "time", Column.T);
        requireGroup(seen, source, lineNumber, true, "position", Column.X, Column.Y, Column.Z);
        requireGroup(seen, source, lineNumber, false, "velocity", Column.VX, Column.VY, Column.VZ);
        requireGroup(seen, source, lineNumber, false, "quaternion", Column.Q0, Column.Q1, Column.Q2, Column.Q3);
        requireGroup(seen, source, lineNumber, false, "yaw-pitch-roll", Column.YAW, Column.PITCH, Column.ROLL);
        requireGroup(seen, source, lineNumber, false, "angular rate", Column.WX, Column.WY, Column.WZ);
        boolean quaternion = seen[Column.Q0.ordinal()];
        boolean angles = seen[Column.YAW.ordinal()];
        if (quaternion == angles) {
            throw new IllegalArgumentException(source + " line " + lineNumber + " (header): the attitude needs "
                    + "exactly one of the groups q0, q1, q2, q3 or yaw, pitch, roll, got "
                    + (quaternion ? "both" : "neither"));
        }
        return columns;
    }

    private static void requireGroup(boolean[] seen, String source, int lineNumber, boolean required,
                                     String what, Column... group) {
        List<String> missing = new ArrayList<>();
        for (Column c : group) {
            if (!seen[c.ordinal()]) {
                missing.add(c.label);
            }
        }
        if (missing.isEmpty() || (!required && missing.size() == group.length)) {
            return;
        }
        List<String> all = new ArrayList<>();
        for (Column c : group) {
            all.add(c.label);
        }
        throw new IllegalArgumentException(source + " line " + lineNumber + " (header): missing " + what
                + " column(s) " + String.join(", ", missing) + "; the " + what + " needs all of "
                + String.join(", ", all) + (required ? "" : " or none"));
    }

    private static double[] unitFactors(String text, Column[] columns, String source, int lineNumber) {
        String[] fields = text.split(",", -1);
        double[] factors = new double[columns.length];
        for (int k = 0; k < columns.length; k++) {
            String field = fields[k].trim();
            String unit = field.substring(field.indexOf('[') + 1, field.length() - 1).trim();
            Kind kind = columns[k].kind;
            int u = Arrays.asList(kind.units).indexOf(unit);
            if (u < 0) {
                throw new IllegalArgumentException(source + " line " + lineNumber + " (header), field " + (k + 1)
                        + ": unit " + LogText.quoted(unit) + " not allowed for column " + columns[k].label + "; allowed: "
                        + String.join(", ", kind.units));
            }
            factors[k] = kind.factors[u];
        }
        return factors;
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
