package dev.noninertial.examples;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import dev.noninertial.examples.chart.Curve;
import dev.noninertial.examples.chart.CurveSheet;

/**
 * One result table of a scenario: named columns with units, rows of numbers or words, and notes.
 * Printed as aligned text for the console and written as CSV (full double precision) for
 * spreadsheets and plotting.
 */
final class ScenarioTable {

    /** A column: name, unit (empty for none) and the printf format of its numbers in the text form. */
    record Column(String name, String unit, String format) {
        String header() {
            return unit.isEmpty() ? name : name + " [" + unit + "]";
        }
    }

    private final String id;
    private final String title;
    private final List<Column> columns = new ArrayList<>();
    private final List<Object[]> rows = new ArrayList<>();
    private final List<String> notes = new ArrayList<>();

    ScenarioTable(String id, String title) {
        this.id = id;
        this.title = title;
    }

    ScenarioTable column(String name, String unit, String format) {
        columns.add(new Column(name, unit, format));
        return this;
    }

    /** Adds a row; each cell is a Double (formatted by its column) or any other object (printed as is). */
    ScenarioTable row(Object... cells) {
        if (cells.length != columns.size()) {
            throw new IllegalArgumentException("row must have " + columns.size() + " cells, got " + cells.length);
        }
        rows.add(cells.clone());
        return this;
    }

    ScenarioTable note(String text) {
        notes.add(text);
        return this;
    }

    String id() {
        return id;
    }

    List<Object[]> rows() {
        return rows;
    }

    private String cellText(int column, Object cell) {
        if (cell instanceof Double d) {
            if (d.isNaN()) {
                return ""; // a scalar row has no vector components
            }
            return String.format(Locale.ROOT, columns.get(column).format(), d);
        }
        return String.valueOf(cell);
    }

    /** Aligned text: title, header, a rule, the rows, then the notes. */
    String toText() {
        int n = columns.size();
        int[] width = new int[n];
        for (int c = 0; c < n; c++) {
            width[c] = columns.get(c).header().length();
            for (Object[] r : rows) {
                width[c] = Math.max(width[c], cellText(c, r[c]).length());
            }
        }
        StringBuilder b = new StringBuilder();
        b.append("== ").append(title).append(" ==\n");
        StringBuilder rule = new StringBuilder();
        for (int c = 0; c < n; c++) {
            b.append(c == 0 ? "" : "  ").append(pad(columns.get(c).header(), width[c], c == 0));
            rule.append(c == 0 ? "" : "  ").append("-".repeat(width[c]));
        }
        b.append('\n').append(rule).append('\n');
        for (Object[] r : rows) {
            for (int c = 0; c < n; c++) {
                boolean left = c == 0 && !(r[c] instanceof Double);
                b.append(c == 0 ? "" : "  ").append(pad(cellText(c, r[c]), width[c], left));
            }
            b.append('\n');
        }
        for (String note : notes) {
            b.append("  note: ").append(note).append('\n');
        }
        return b.toString();
    }

    private static String pad(String text, int width, boolean left) {
        String fill = " ".repeat(Math.max(0, width - text.length()));
        return left ? text + fill : fill + text;
    }

    /**
     * Writes {@code DIR/id.svg}: the numeric columns {@code yColumns} against column {@code xColumn},
     * one curve each, drawn by the project's own chart writer. All y columns must share a unit.
     */
    Path writeSvg(Path directory, String quantity, int xColumn, int... yColumns) throws IOException {
        int n = rows.size();
        double[] x = new double[n];
        for (int r = 0; r < n; r++) {
            x[r] = (Double) rows.get(r)[xColumn];
        }
        Column xc = columns.get(xColumn);
        CurveSheet sheet = CurveSheet.titled(title).withHorizontalAxis(xc.name(), xc.unit())
                .withVerticalAxis(quantity, columns.get(yColumns[0]).unit());
        for (int c : yColumns) {
            double[] y = new double[n];
            for (int r = 0; r < n; r++) {
                y[r] = (Double) rows.get(r)[c];
            }
            sheet = sheet.withCurve(Curve.of(columns.get(c).name(), x, y));
        }
        Path file = directory.resolve(id + ".svg");
        Files.writeString(file, sheet.toSvg(), StandardCharsets.UTF_8);
        return file;
    }

    /** Writes {@code DIR/id.csv}: a header of "name [unit]" cells, then the rows at full precision. */
    Path writeCsv(Path directory) throws IOException {
        Path file = directory.resolve(id + ".csv");
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            List<String> head = new ArrayList<>();
            for (Column c : columns) {
                head.add(csv(c.header()));
            }
            w.write(String.join(",", head));
            w.write('\n');
            for (Object[] r : rows) {
                List<String> cells = new ArrayList<>();
                for (Object cell : r) {
                    cells.add(cell instanceof Double d ? (d.isNaN() ? "" : Double.toString(d)) : csv(String.valueOf(cell)));
                }
                w.write(String.join(",", cells));
                w.write('\n');
            }
        }
        return file;
    }

    private static String csv(String text) {
        if (text.contains(",") || text.contains("\"") || text.contains("\n")) {
            return "\"" + text.replace("\"", "\"\"") + "\"";
        }
        return text;
    }
}
