package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * {@link LogText#number} reads a field {@code text[from, to)}: a range outside the text is the
 * caller's error and is refused naming {@code from} or {@code to} (the rule of
 * {@link String#substring(int, int)}: {@code 0 <= from <= to <= length}), not with a bare
 * {@link StringIndexOutOfBoundsException}.
 */
class LogTextFieldRangeTest {

    private static final String ROW = "0, 1.25, 2";

    @Test
    void aFieldInsideTheLineIsRead() {
        // "1.25" is characters 3 to 7 of the row; a decimal literal read exactly (IEEE 754: 1.25 = 5/4)
        assertEquals(1.25, LogText.number(ROW, 3, 7, "demo.csv", 2, "x"), 0.0);
        // an empty range of the line is not a number
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LogText.number(ROW, 3, 3, "demo.csv", 2, "x"));
        assertTrue(e.getMessage().contains("demo.csv line 2, column x"), e.getMessage());
    }

    @Test
    void aRangeOutsideTheTextNamesItsBound() {
        int[][] bad = {{-1, 7}, {11, 11}, {Integer.MIN_VALUE, 7}};
        for (int[] r : bad) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> LogText.number(ROW, r[0], r[1], "demo.csv", 2, "x"));
            assertTrue(e.getMessage().startsWith("from must be in [0, 10]"), e.getMessage());
        }
        int[][] badTo = {{3, 2}, {3, 11}, {3, Integer.MAX_VALUE}};
        for (int[] r : badTo) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> LogText.number(ROW, r[0], r[1], "demo.csv", 2, "x"));
            assertTrue(e.getMessage().startsWith("to must be in [3, 10]"), e.getMessage());
        }
        assertThrows(NullPointerException.class, () -> LogText.number(null, 0, 0, "demo.csv", 2, "x"));
    }

    @Test
    void aLineNumberBelowOneOrAMissingNameIsTheCallersError() {
        // line numbers are 1-based: 0 and negative numbers would print a position no editor shows
        for (int line : new int[] {0, -1, Integer.MIN_VALUE}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> LogText.number(ROW, 3, 7, "demo.csv", line, "x"));
            assertEquals("lineNumber must be at least 1 (line numbers are 1-based), got " + line, e.getMessage());
            e = assertThrows(IllegalArgumentException.class, () -> LogText.checkLine(ROW, "demo.csv", line));
            assertTrue(e.getMessage().startsWith("lineNumber must be at least 1"), e.getMessage());
            e = assertThrows(IllegalArgumentException.class, () -> LogText.checkSeparator(ROW, "demo.csv", line));
            assertTrue(e.getMessage().startsWith("lineNumber must be at least 1"), e.getMessage());
        }
        NullPointerException n = assertThrows(NullPointerException.class,
                () -> LogText.number(ROW, 3, 7, null, 2, "x"));
        assertTrue(n.getMessage().contains("source"), n.getMessage());
        n = assertThrows(NullPointerException.class, () -> LogText.number(ROW, 3, 7, "demo.csv", 2, null));
        assertTrue(n.getMessage().contains("column"), n.getMessage());
        n = assertThrows(NullPointerException.class, () -> LogText.checkLine(null, "demo.csv", 2));
        assertTrue(n.getMessage().contains("line"), n.getMessage());
        n = assertThrows(NullPointerException.class, () -> LogText.checkSeparator(null, "demo.csv", 2));
        assertTrue(n.getMessage().contains("header"), n.getMessage());
    }
}
