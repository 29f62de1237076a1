package dev.noninertial.frames.motion;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import dev.noninertial.frames.Arguments;

/**
 * The text rules shared by the library's log readers (the motion log of {@link SampledMotion},
 * and any other comma-separated log of numbers): how a file is decoded, how the separator is
 * checked, how a field is quoted in a refusal and how a decimal number is read. Each refusal names
 * the source, the line and the column.
 *
 * <ul>
 *   <li>Files are UTF-8. A malformed byte sequence is decoded as U+FFFD and refused by
 *       {@link #checkLine(String, String, int)} with its line and column.</li>
 *   <li>Fields are separated by commas. A header without commas but with semicolons or tabs is
 *       refused by {@link #checkSeparator(String, String, int)}, naming the separator found.</li>
 *   <li>A field quoted in a message is cut to {@value #MAX_QUOTED} characters and every
 *       invisible or non-ASCII character is shown by its code point, such as {@code U+00A0}.</li>
 *   <li>{@link #number(String, int, int, String, int, String)} refuses a non-zero literal that
 *       underflows to zero (1e-999) and one that overflows.</li>
 * </ul>
 *
 * <p>Stateless and thread-safe.
 */
public final class LogText {

    /** Longest part of a field quoted in a message (characters). */
    public static final int MAX_QUOTED = 40;

    private LogText() {
    }

    /**
     * Opens a file for reading line by line, decoding UTF-8 with malformed input replaced by
     * U+FFFD (refused later with its position by {@link #checkLine(String, String, int)}).
     *
     * @param file the file
     * @return a reader; the caller closes it
     * @throws IOException if the file cannot be opened
     */
    public static BufferedReader open(Path file) throws IOException {
        Arguments.nonNull("file", file);
        return new BufferedReader(new InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8));
    }

    /**
     * Refuses a line holding a malformed byte sequence (decoded as U+FFFD) or a NUL character.
     *
     * @param line the line as read
     * @param source file or resource name, for messages
     * @param lineNumber 1-based line number
     * @throws NullPointerException if {@code line} or {@code source} is null
     * @throws IllegalArgumentException naming source, line and column (1-based character index);
     *         or, for a caller's error, naming {@code lineNumber} when it is below 1
     */
    public static void checkLine(String line, String source, int lineNumber) {
        Arguments.nonNull("line", line);
        checkPosition(source, lineNumber);
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '\uFFFD') {
                throw new IllegalArgumentException(source + " line " + lineNumber + ", column " + (i + 1)
                        + ": malformed UTF-8 byte sequence (decoded as U+FFFD); the file must be UTF-8");
            }
            if (c == '\0') {
                throw new IllegalArgumentException(source + " line " + lineNumber + ", column " + (i + 1)
                        + ": NUL character (U+0000) in the text");
            }
        }
    }

    /**
     * Refuses a header row that is not comma-separated when it holds another common separator.
     *
     * @param header the header row
     * @param source file or resource name
     * @param lineNumber 1-based line number
     * @throws NullPointerException if {@code header} or {@code source} is null
     * @throws IllegalArgumentException if the row has no comma and holds a semicolon or a tab; or,
     *         for a caller's error, naming {@code lineNumber} when it is below 1
     */
    public static void checkSeparator(String header, String source, int lineNumber) {
        Arguments.nonNull("header", header);
        checkPosition(source, lineNumber);
        if (header.indexOf(',') >= 0) {
            return;
        }
        int semicolon = header.indexOf(';');
        int tab = header.indexOf('\t');
        if (semicolon < 0 && tab < 0) {
            return;
        }
        boolean isTab = semicolon < 0 || (tab >= 0 && tab < semicolon);
        int at = isTab ? tab : semicolon;
        throw new IllegalArgumentException(source + " line " + lineNumber + ", column " + (at + 1) + ": the fields"
                + " are separated by " + (isTab ? "tabs (U+0009)" : "semicolons ';'") + "; this format separates"
                + " fields by commas ','");
    }

    /**
     * A field as shown in a message: at most {@value #MAX_QUOTED} characters (the rest counted),
     * every character outside printable ASCII shown as {@code U+XXXX}.
     *
     * @param field the field text
     * @return the quoted form, between single quotes
     */
    public static String quoted(String field) {
        Arguments.nonNull("field", field);
        StringBuilder b = new StringBuilder("'");
        int n = Math.min(field.length(), MAX_QUOTED);
        for (int i = 0; i < n; i++) {
            char c = field.charAt(i);
            if (c >= 0x20 && c < 0x7f) {
                b.append(c);
            } else {
                b.append(String.format("U+%04X", (int) c));
            }
        }
        b.append('\'');
        if (field.length() > n) {
            b.append(" (").append(field.length() - n).append(" more characters)");
        }
        return b.toString();
    }

    /**
     * Reads {@code text[from, to)} as a decimal number (surrounding spaces and tabs allowed) and
     * refuses what is not one, what is not finite and a non-zero literal that underflows to zero.
     *
     * @param text the line
     * @param from start of the field
     * @param to end of the field (exclusive)
     * @param source file or resource name
     * @param lineNumber 1-based line number
     * @param column name of the column, for the message
     * @return the value
     * @throws NullPointerException if {@code text}, {@code source} or {@code column} is null
     * @throws IllegalArgumentException naming source, line, column and the (quoted) field; or, for
     *         a caller's error, naming {@code from} or {@code to} when {@code 0 <= from <= to <=
     *         text.length()} does not hold, or {@code lineNumber} when it is below 1
     */
    public static double number(String text, int from, int to, String source, int lineNumber, String column) {
        Arguments.nonNull("text", text);
        checkPosition(source, lineNumber);
        Arguments.nonNull("column", column);
        if (from < 0 || from > text.length()) {
            throw new IllegalArgumentException("from must be in [0, " + text.length() + "] for a text of length "
                    + text.length() + ", got " + from);
        }
        if (to < from || to > text.length()) {
            throw new IllegalArgumentException("to must be in [" + from + ", " + text.length() + "] (from " + from
                    + ", text of length " + text.length() + "), got " + to);
        }
        double v = MotionLogFile.decimal(text, from, to);
        String where = source + " line " + lineNumber + ", column " + column + " (character " + (from + 1) + ")";
        if (Double.isNaN(v)) {
            throw new IllegalArgumentException(where + ": " + quoted(text.substring(from, to).trim())
                    + " is not a decimal number");
        }
        if (Double.isInfinite(v)) {
            throw new IllegalArgumentException(where + ": " + quoted(text.substring(from, to).trim())
                    + " overflows the double range (largest 1.8e308)");
        }
        if (v == 0.0 && hasNonZeroDigit(text, from, to)) {
            throw new IllegalArgumentException(where + ": " + quoted(text.substring(from, to).trim())
                    + " is not zero but underflows to zero (smallest 4.9e-324)");
        }
        return v;
    }

    /** Refuses a null source name or a line number below 1: the caller's error, not the file's. */
    private static void checkPosition(String source, int lineNumber) {
        Arguments.nonNull("source", source);
        if (lineNumber < 1) {
            throw new IllegalArgumentException("lineNumber must be at least 1 (line numbers are 1-based), got "
                    + lineNumber);
        }
    }

    /** Whether the mantissa of a decimal literal has a non-zero digit. */
    private static boolean hasNonZeroDigit(String text, int from, int to) {
        for (int i = from; i < to; i++) {
            char c = text.charAt(i);
            if (c == 'e' || c == 'E') {
                return false;
            }
            if (c >= '1' && c <= '9') {
                return true;
            }
        }
        return false;
    }
}
