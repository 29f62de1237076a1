package dev.noninertial.frames.motion;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import dev.noninertial.frames.Arguments;

/**
 * A comma-separated log of numbers with units in its header, read into columns in SI units; its
 * parser is the one behind every log file of the library (the motion log, the geodetic track log,
 * the sensor increment log). Lines starting with {@code #} are comments and blank lines are skipped;
 * the first other line is the header naming every column as {@code name[unit]}; each further line
 * is one row of decimal numbers. The text rules are those of {@link LogText}: UTF-8, commas,
 * malformed bytes and NUL refused with their position, numbers that overflow or underflow refused.
 *
 * <p>The caller states the columns a log may hold ({@link Column}: a name and the units it
 * accepts, each with its factor to SI) and, after reading, which groups of columns it needs
 * ({@link #requireGroup}). Every refusal names the source and the line, and for a field its
 * column.
 *
 * <p>Immutable and thread-safe once read.
 */
public final class LogTable {

    /**
     * A column a log may hold: its name and the units it accepts, each with the factor that turns
     * a value in that unit into SI.
     */
    public static final class Column {

        private final String name;
        private final String[] units;
        private final double[] factors;

        private Column(String name, String[] units, double[] factors) {
            this.name = name;
            this.units = units;
            this.factors = factors;
        }

        /**
         * A column and its units.
         *
         * @param name the name as written in the header, non-empty, without {@code [}, {@code ]} or {@code ,}
         * @param units the accepted units as written in the header, at least one, distinct
         * @param factors the factor to SI of each unit, positive and finite
         * @return the column
         * @throws IllegalArgumentException if a name or unit is empty or holds a reserved character,
         *         the units repeat, the lengths differ or a factor is not positive and finite
         */
        public static Column of(String name, String[] units, double[] factors) {
            checkName("name", name);
            Arguments.nonNull("units", units);
            Arguments.nonNull("factors", factors);
            if (units.length == 0 || units.length != factors.length) {
                throw new IllegalArgumentException("units and factors must be non-empty and of one length, got "
                        + units.length + " and " + factors.length);
            }
            for (int i = 0; i < units.length; i++) {
                checkName("units[" + i + "]", units[i]);
                Arguments.positive("factors[" + i + "]", factors[i]);
                for (int j = 0; j < i; j++) {
                    if (units[j].equals(units[i])) {
                        throw new IllegalArgumentException("units must be distinct, got '" + units[i] + "' twice");
                    }
                }
            }
            return new Column(name, units.clone(), factors.clone());
        }

        private static void checkName(String what, String text) {
            Arguments.nonNull(what, text);
            if (text.isBlank() || !text.equals(text.trim()) || text.indexOf('[') >= 0 || text.indexOf(']') >= 0
                    || text.indexOf(',') >= 0) {
                throw new IllegalArgumentException(what + " must be non-empty, without surrounding spaces, '[', ']'"
                        + " or ',', got " + LogText.quoted(text));
            }
        }

        /**
         * Returns the name.
         *
         * @return the name
         */
        public String name() {
            return name;
        }

        @Override
        public String toString() {
            return name + "[" + String.join("|", units) + "]";
        }
    }

    private final String source;
    private final int headerLine;
    private final int size;
    /** The columns present, in header order. */
    private final Column[] present;
    /** Values in SI, one array per present column, {@code size} used. */
    private final double[][] values;
    private final int[] lines;

    private LogTable(String source, int headerLine, int size, Column[] present, double[][] values, int[] lines) {
        this.source = source;
        this.headerLine = headerLine;
        this.size = size;
        this.present = present;
        this.values = values;
        this.lines = lines;
    }

    /**
     * Reads a log file (UTF-8). The file is read twice, to count its rows and then to fill columns
     * of their final size.
     *
     * @param file the file
     * @param known the columns the log may hold
     * @param example a header line to show when none is found, for example {@code t[s], x[m]}
     * @return the table
     * @throws IOException if the file cannot be read
     * @throws IllegalArgumentException naming the file and the line, if the header or a row is refused
     */
    public static LogTable readCsv(Path file, List<Column> known, String example) throws IOException {
        Arguments.nonNull("file", file);
        int rows = countRows(file);
        try (BufferedReader in = LogText.open(file)) {
            return parse(in, file.toString(), known, example, Math.max(rows, 1));
        }
    }

    /**
     * The line rule of every log reader: the line's content, trimmed, or null for a blank line or
     * a comment; a byte-order mark on line 1 is dropped, and a malformed byte or a NUL refused
     * ({@link LogText#checkLine}).
     */
    static String content(String line, String source, int lineNumber) {
        String text = lineNumber == 1 && !line.isEmpty() && line.charAt(0) == '\uFEFF' ? line.substring(1) : line;
        LogText.checkLine(text, source, lineNumber);
        String trimmed = text.trim();
        return trimmed.isEmpty() || trimmed.charAt(0) == '#' ? null : trimmed;
    }

    /**
     * The first pass of every file reader: the number of data rows after the header (lines that
     * are neither blank nor comments, less the first), so that the second pass fills arrays of
     * their final size (no growth copies, no trimming copy).
     */
    static int countRows(Path file) throws IOException {
        int rows = 0;
        try (BufferedReader in = LogText.open(file)) {
            String line;
            boolean header = false;
            while ((line = in.readLine()) != null) {
                String trimmed = line.trim();
                if (trimmed.isEmpty() || trimmed.charAt(0) == '#') {
                    continue;
                }
                if (header) {
                    rows++;
                } else {
                    header = true;
                }
            }
        }
        return rows;
    }

    /**
     * Reads a log from a character stream.
     *
     * @param source the text
     * @param sourceName name used in messages (a file name, for example)
     * @param known the columns the log may hold
     * @param example a header line to show when none is found, for example {@code t[s], x[m]}
     * @return the table
     * @throws IOException if the stream fails
     * @throws IllegalArgumentException naming the source and the line, if the header or a row is refused
     */
    public static LogTable readCsv(Reader source, String sourceName, List<Column> known, String example)
            throws IOException {
        Arguments.nonNull("source", source);
        Arguments.nonNull("sourceName", sourceName);
        BufferedReader in = source instanceof BufferedReader ? (BufferedReader) source : new BufferedReader(source);
        return parse(in, sourceName, known, example, 1024);
    }

    /**
     * What a reader does with a log while it is parsed: the header once (the columns present, in
     * header order; the place to refuse a missing group), then every row (its SI values in header
     * order, in an array reused from row to row).
     */
    interface Rows {

        /**
         * Takes the header.
         *
         * @param present the columns in header order
         * @param headerLine the header's 1-based line number
         */
        void header(Column[] present, int headerLine);

        /**
         * Takes one row.
         *
         * @param values the row's values in SI, in header order (reused: copy what is kept)
         * @param lineNumber the row's 1-based line number
         */
        void row(double[] values, int lineNumber);
    }

    private static LogTable parse(BufferedReader in, String source, List<Column> known, String example,
                                  int expectedRows) throws IOException {
        Collector table = new Collector(expectedRows);
        parse(in, source, known, example, table);
        return table.finish(source);
    }

    /** The columns of a table, filled row by row. */
    private static final class Collector implements Rows {

        private Column[] present;
        private int headerLine;
        private int capacity;
        private double[][] values;
        private int[] lines;
        private int n;

        Collector(int capacity) {
            this.capacity = capacity;
            this.lines = new int[capacity];
        }

        @Override
        public void header(Column[] columns, int line) {
            present = columns;
            headerLine = line;
            values = new double[columns.length][capacity];
        }

        @Override
        public void row(double[] fields, int lineNumber) {
            if (n == capacity) {
                capacity = capacity + (capacity >> 1) + 1;
                for (int k = 0; k < values.length; k++) {
                    values[k] = Arrays.copyOf(values[k], capacity);
                }
                lines = Arrays.copyOf(lines, capacity);
            }
            for (int k = 0; k < fields.length; k++) {
                values[k][n] = fields[k];
            }
            lines[n] = lineNumber;
            n++;
        }

        LogTable finish(String source) {
            if (n < capacity) {
                for (int k = 0; k < values.length; k++) {
                    values[k] = Arrays.copyOf(values[k], n);
                }
                lines = Arrays.copyOf(lines, n);
            }
            return new LogTable(source, headerLine, n, present, values, lines);
        }
    }

    /**
     * The parser of every log reader: the line rule ({@link #content}), the header (each field
     * {@code name[unit]} of a known column, each column once, a known unit), then every row by
     * the row rule ({@link #parseFields}), handed to {@code rows}.
     */
    static void parse(BufferedReader in, String source, List<Column> known, String example, Rows rows)
            throws IOException {
        Arguments.nonNull("known", known);
        Arguments.nonNull("example", example);
        Map<String, Column> byName = new LinkedHashMap<>();
        for (Column c : known) {
            Arguments.nonNull("known column", c);
            if (byName.put(c.name, c) != null) {
                throw new IllegalArgumentException("known must name each column once, got '" + c.name + "' twice");
            }
        }
        String line;
        int lineNumber = 0;
        Column[] present = null;
        double[] factors = null;
        String[] names = null;
        double[] fields = null;
        while ((line = in.readLine()) != null) {
            lineNumber++;
            String trimmed = content(line, source, lineNumber);
            if (trimmed == null) {
                continue;
            }
            if (present == null) {
                LogText.checkSeparator(trimmed, source, lineNumber);
                String[] headerFields = trimmed.split(",", -1);
                present = new Column[headerFields.length];
                factors = new double[headerFields.length];
                for (int k = 0; k < headerFields.length; k++) {
                    String field = headerFields[k].trim();
                    int open = field.indexOf('[');
                    if (open <= 0 || !field.endsWith("]")) {
                        throw new IllegalArgumentException(source + " line " + lineNumber + " (header), field " + (k + 1)
                                + ": " + LogText.quoted(field) + " must read name[unit], as in '" + example + "'");
                    }
                    String name = field.substring(0, open).trim();
                    Column c = byName.get(name);
                    if (c == null) {
                        throw new IllegalArgumentException(source + " line " + lineNumber + " (header), field " + (k + 1)
                                + ": unknown column " + LogText.quoted(name) + "; known columns: "
                                + String.join(", ", byName.keySet()));
                    }
                    for (int j = 0; j < k; j++) {
                        if (present[j] == c) {
                            throw new IllegalArgumentException(source + " line " + lineNumber + " (header): column '"
                                    + name + "' appears twice");
                        }
                    }
                    String unit = field.substring(open + 1, field.length() - 1).trim();
                    int u = Arrays.asList(c.units).indexOf(unit);
                    if (u < 0) {
                        throw new IllegalArgumentException(source + " line " + lineNumber + " (header), field " + (k + 1)
                                + ": unit " + LogText.quoted(unit) + " not allowed for column " + name + "; allowed: "
                                + String.join(", ", c.units));
                    }
                    present[k] = c;
                    factors[k] = c.factors[u];
                }
                names = new String[present.length];
                fields = new double[present.length];
                for (int k = 0; k < present.length; k++) {
                    names[k] = present[k].name;
                }
                rows.header(present.clone(), lineNumber);
                continue;
            }
            parseFields(trimmed, names, factors, fields, source, lineNumber);
            rows.row(fields, lineNumber);
        }
        if (present == null) {
            throw new IllegalArgumentException(source + ": no header row (expected a line such as '" + example
                    + "' after the comments)");
        }
    }

    /**
     * The row rule of every log reader: {@code text} holds exactly {@code names.length}
     * comma-separated decimal numbers; field {@code k}, times {@code factors[k]}, is written to
     * {@code out[k]}, refused (naming source, line, column and character) unless it is a decimal
     * number whose SI value is finite, and non-zero if the number is.
     */
    static void parseFields(String text, String[] names, double[] factors, double[] out, String source,
                            int lineNumber) {
        int start = 0;
        int length = text.length();
        for (int k = 0; k < names.length; k++) {
            int comma = text.indexOf(',', start);
            if (k < names.length - 1 && comma < 0) {
                throw new IllegalArgumentException(source + " line " + lineNumber + ": expected " + names.length
                        + " comma-separated fields as in the header, got " + (k + 1));
            }
            if (k == names.length - 1 && comma >= 0) {
                throw new IllegalArgumentException(source + " line " + lineNumber + ": expected " + names.length
                        + " comma-separated fields as in the header, got more");
            }
            int stop = comma < 0 ? length : comma;
            double parsed = LogText.number(text, start, stop, source, lineNumber, names[k]);
            double value = parsed * factors[k];
            if (!Double.isFinite(value) || (value == 0.0 && parsed != 0.0)) {
                throw new IllegalArgumentException(source + " line " + lineNumber + ", column " + names[k]
                        + " (character " + (start + 1) + "): value " + LogText.quoted(text.substring(start, stop).trim())
                        + " leaves the double range in SI units");
            }
            out[k] = value;
            start = stop + 1;
        }
    }

    /**
     * Refuses, naming the header line, a group of columns that is incomplete, or absent when
     * required.
     *
     * @param what the group's name in the message, for example {@code attitude}
     * @param required whether the group must be present
     * @param names the group's column names
     * @throws IllegalArgumentException if a column of the group is missing (all of them, when required)
     */
    public void requireGroup(String what, boolean required, String... names) {
        requireGroup(source, headerLine, present, what, required, names);
    }

    /** {@link #requireGroup(String, boolean, String...)} for a header being read. */
    static void requireGroup(String source, int headerLine, Column[] present, String what, boolean required,
                             String... names) {
        Arguments.nonNull("what", what);
        Arguments.nonNull("names", names);
        List<String> missing = new ArrayList<>();
        for (String name : names) {
            if (indexOf(present, name) < 0) {
                missing.add(name);
            }
        }
        if (missing.isEmpty() || (!required && missing.size() == names.length)) {
            return;
        }
        throw new IllegalArgumentException(source + " line " + headerLine + " (header): missing " + what
                + " column(s) " + String.join(", ", missing) + "; the " + what + " needs all of "
                + String.join(", ", names) + (required ? "" : " or none"));
    }

    /**
     * Returns the source name, as given or the file's path.
     *
     * @return the source name, as given or the file's path
     */
    public String source() {
        return source;
    }

    /**
     * Returns the line number of the header (1-based).
     *
     * @return the line number of the header (1-based)
     */
    public int headerLine() {
        return headerLine;
    }

    /**
     * Returns the number of rows.
     *
     * @return the number of rows
     */
    public int size() {
        return size;
    }

    /**
     * Whether the header names a column.
     *
     * @param name a column name
     * @return true if the log holds the column
     */
    public boolean has(String name) {
        Arguments.nonNull("name", name);
        return index(name) >= 0;
    }

    /**
     * The values of a column in SI units, one per row (a copy).
     *
     * @param name a column of the log
     * @return the values
     * @throws IllegalArgumentException if the log has no such column
     */
    public double[] values(String name) {
        Arguments.nonNull("name", name);
        int k = index(name);
        if (k < 0) {
            throw new IllegalArgumentException("name must be a column of " + source + ", got '" + name + "'; columns: "
                    + Arrays.toString(present));
        }
        return values[k].clone();
    }

    /**
     * The line of the file a row was read from.
     *
     * @param row row index in [0, size() - 1]
     * @return its 1-based line number
     * @throws IndexOutOfBoundsException if {@code row} is out of range
     */
    public int line(int row) {
        if (row < 0 || row >= size) {
            throw new IndexOutOfBoundsException("row must be in [0, " + (size - 1) + "], got " + row);
        }
        return lines[row];
    }

    private int index(String name) {
        return indexOf(present, name);
    }

    /** Index of the column named {@code name} among {@code present}, or -1. */
    static int indexOf(Column[] present, String name) {
        for (int k = 0; k < present.length; k++) {
            if (present[k].name.equals(name)) {
                return k;
            }
        }
        return -1;
    }

    @Override
    public String toString() {
        return "LogTable{" + source + ", " + size + " rows, columns " + Arrays.toString(present) + "}";
    }
}
