package dev.noninertial.frames.dispersion;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Serializable;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * The outcome table of a {@link DispersionStudy} and its statistics: mean, covariance,
 * confidence ellipse, circular error probable, percentiles, and the table as CSV.
 *
 * <p>The table has one row per case, in case-index order; each row holds the case's inputs in
 * declaration order followed by its outcomes. Every statistic is computed from the table in
 * index order, so two runs with identical tables (whatever their thread count or cluster
 * partitioning) report identical statistics bit for bit.
 *
 * <p>Definitions: sample mean; sample covariance with divisor {@code n - 1} (two-pass, centred
 * on the mean); percentiles by linear interpolation between order statistics, position
 * {@code h = (n - 1) p} counted from 0 (Hyndman and Fan, "Sample quantiles in statistical
 * packages", The American Statistician 50(4), 1996, definition 7); circular error probable as
 * the median distance of the cases from their mean point.
 *
 * <p>Immutable, thread-safe and {@link Serializable}.
 *
 * <p>Results are for simulation and analysis. They are not for planning safety or hazard areas or
 * any decision on which safety depends; defer to local codes, standards and licensed practice.
 */
public final class DispersionResult implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Input names in declaration order. */
    @SuppressWarnings("serial") // List.copyOf list: serializable
    private final List<String> inputNames;
    /** Outcome names in order. */
    @SuppressWarnings("serial") // List.copyOf list: serializable
    private final List<String> outcomeNames;
    /** Values per row: inputs plus outcomes. */
    private final int width;
    /** Number of rows (cases). */
    private final int rows;
    /** Row-major table, {@code rows * width} values. */
    private final double[] table;

    private DispersionResult(List<String> inputNames, List<String> outcomeNames, double[] table) {
        this.inputNames = inputNames;
        this.outcomeNames = outcomeNames;
        this.width = inputNames.size() + outcomeNames.size();
        this.rows = table.length / width;
        this.table = table;
    }

    /**
     * A result from a complete table (used by the runners; the array is copied).
     *
     * @param inputNames input names in declaration order
     * @param outcomeNames outcome names in order (at least one)
     * @param table row-major values, one row per case in index order, each row the inputs then
     *        the outcomes; at least one row; finite values
     * @return the result
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if the table is empty, not a whole number of rows, or
     *         holds a non-finite value
     */
    public static DispersionResult ofTable(List<String> inputNames, List<String> outcomeNames, double[] table) {
        Arguments.nonNull("inputNames", inputNames);
        Arguments.nonNull("outcomeNames", outcomeNames);
        Arguments.nonNull("table", table);
        if (outcomeNames.isEmpty()) {
            throw new IllegalArgumentException("outcomeNames must hold at least 1 name, got 0");
        }
        int width = inputNames.size() + outcomeNames.size();
        if (table.length == 0 || table.length % width != 0) {
            throw new IllegalArgumentException("table length must be a positive multiple of the row width "
                    + width + ", got " + table.length);
        }
        for (int i = 0; i < table.length; i++) {
            if (!Double.isFinite(table[i])) {
                throw new IllegalArgumentException("table value of case " + (i / width) + ", column '"
                        + columnName(inputNames, outcomeNames, i % width) + "' must be finite, got " + table[i]);
            }
        }
        return new DispersionResult(List.copyOf(inputNames), List.copyOf(outcomeNames), table.clone());
    }

    private static String columnName(List<String> inputs, List<String> outcomes, int column) {
        return column < inputs.size() ? inputs.get(column) : outcomes.get(column - inputs.size());
    }

    /**
     * Returns the number of cases (rows).
     *
     * @return the number of cases (rows)
     */
    public int caseCount() {
        return rows;
    }

    /**
     * Returns the input names in declaration order (unmodifiable).
     *
     * @return the input names in declaration order (unmodifiable)
     */
    public List<String> inputNames() {
        return inputNames;
    }

    /**
     * Returns the outcome names in order (unmodifiable).
     *
     * @return the outcome names in order (unmodifiable)
     */
    public List<String> outcomeNames() {
        return outcomeNames;
    }

    /**
     * One row of the table: the case's inputs followed by its outcomes.
     *
     * @param index case index in [0, caseCount)
     * @return new array
     * @throws IllegalArgumentException if {@code index} is out of range
     */
    public double[] row(int index) {
        checkRow(index);
        return Arrays.copyOfRange(table, index * width, (index + 1) * width);
    }

    /**
     * The outcome vector of one case.
     *
     * @param index case index in [0, caseCount)
     * @return new array in the order of {@link #outcomeNames()}
     * @throws IllegalArgumentException if {@code index} is out of range
     */
    public double[] outcome(int index) {
        checkRow(index);
        int from = index * width + inputNames.size();
        return Arrays.copyOfRange(table, from, (index + 1) * width);
    }

    private void checkRow(int index) {
        if (index < 0 || index >= rows) {
            throw new IllegalArgumentException("index must be in [0, " + (rows - 1) + "], got " + index);
        }
    }

    /** The column of a name, the refusal naming the caller's argument {@code argument}. */
    private int columnIndex(String argument, String name) {
        Arguments.nonNull(argument, name);
        int i = inputNames.indexOf(name);
        if (i >= 0) {
            return i;
        }
        int k = outcomeNames.indexOf(name);
        if (k >= 0) {
            return inputNames.size() + k;
        }
        throw new IllegalArgumentException(argument + " must be one of " + inputNames + " or " + outcomeNames
                + ", got '" + name + "'");
    }

    /**
     * All values of one column (an input or an outcome), in case order.
     *
     * @param name input or outcome name
     * @return new array of {@link #caseCount()} values
     * @throws IllegalArgumentException if there is no such column
     */
    public double[] column(String name) {
        int c = columnIndex("name", name);
        double[] values = new double[rows];
        for (int i = 0; i < rows; i++) {
            values[i] = table[i * width + c];
        }
        return values;
    }

    /**
     * The sample mean of a column.
     *
     * @param name input or outcome name
     * @return the mean
     * @throws IllegalArgumentException if there is no such column
     */
    public double mean(String name) {
        return meanOf(columnIndex("name", name));
    }

    private double meanOf(int c) {
        double sum = 0.0;
        for (int i = 0; i < rows; i++) {
            sum += table[i * width + c];
        }
        return sum / rows;
    }

    /**
     * The sample means of the outcomes.
     *
     * @return new array in the order of {@link #outcomeNames()}
     */
    public double[] mean() {
        double[] means = new double[outcomeNames.size()];
        for (int k = 0; k < means.length; k++) {
            means[k] = meanOf(inputNames.size() + k);
        }
        return means;
    }

    /**
     * The sample covariance of two columns, divisor {@code n - 1}.
     *
     * @param a first input or outcome name
     * @param b second input or outcome name
     * @return the covariance ({@code NaN} for a single case)
     * @throws IllegalArgumentException if there is no such column
     */
    public double covariance(String a, String b) {
        int ca = columnIndex("a", a);
        int cb = columnIndex("b", b);
        return covarianceOf(ca, cb, meanOf(ca), meanOf(cb));
    }

    private double covarianceOf(int ca, int cb, double ma, double mb) {
        double sum = 0.0;
        for (int i = 0; i < rows; i++) {
            sum += (table[i * width + ca] - ma) * (table[i * width + cb] - mb);
        }
        return sum / (rows - 1);
    }

    /**
     * The sample covariance matrix of the outcomes, divisor {@code n - 1}.
     *
     * @return new symmetric array {@code [k][k]} in the order of {@link #outcomeNames()}
     *         ({@code NaN} for a single case)
     */
    public double[][] covariance() {
        int k = outcomeNames.size();
        int first = inputNames.size();
        double[] means = mean();
        double[][] cov = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = a; b < k; b++) {
                cov[a][b] = covarianceOf(first + a, first + b, means[a], means[b]);
                cov[b][a] = cov[a][b];
            }
        }
        return cov;
    }

    /**
     * The sample standard deviation of a column (divisor {@code n - 1}).
     *
     * @param name input or outcome name
     * @return the standard deviation
     * @throws IllegalArgumentException if there is no such column
     */
    public double standardDeviation(String name) {
        int c = columnIndex("name", name);
        double m = meanOf(c);
        return Math.sqrt(covarianceOf(c, c, m, m));
    }

    /**
     * A percentile of a column: linear interpolation between order statistics at position
     * {@code h = (n - 1) percent / 100} (Hyndman and Fan definition 7).
     *
     * @param name input or outcome name
     * @param percent the percentile, in [0, 100]
     * @return the value below which {@code percent} % of the cases lie
     * @throws IllegalArgumentException if there is no such column or {@code percent} is out of range
     */
    public double percentile(String name, double percent) {
        Arguments.inRange("percent", percent, 0.0, 100.0);
        double[] sorted = column(name);
        Arrays.sort(sorted);
        return interpolatedOrderStatistic(sorted, percent / 100.0);
    }

    private static double interpolatedOrderStatistic(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int low = (int) Math.floor(h);
        if (low >= sorted.length - 1) {
            return sorted[sorted.length - 1];
        }
        return sorted[low] + (h - low) * (sorted[low + 1] - sorted[low]);
    }

    /**
     * The confidence ellipse of two outcomes (or inputs) at a probability, from their sample mean
     * and covariance under a bivariate normal assumption (see {@link ConfidenceEllipse}).
     *
     * @param x name of the column along x (for a footprint: east)
     * @param y name of the column along y (for a footprint: north)
     * @param probability probability held, in (0, 1)
     * @return the ellipse
     * @throws IllegalArgumentException if a name is unknown, {@code x} equals {@code y}, the
     *         probability is out of range, or there are fewer than 3 cases
     */
    public ConfidenceEllipse ellipse(String x, String y, double probability) {
        int cx = columnIndex("x", x);
        int cy = columnIndex("y", y);
        if (cx == cy) {
            throw new IllegalArgumentException("y must differ from x = '" + x + "', got '" + y + "'");
        }
        if (rows < 3) {
            throw new IllegalArgumentException("caseCount must be at least 3 for an ellipse, got " + rows);
        }
        double mx = meanOf(cx);
        double my = meanOf(cy);
        return ConfidenceEllipse.of(x, y, mx, my, covarianceOf(cx, cx, mx, mx), covarianceOf(cx, cy, mx, my),
                covarianceOf(cy, cy, my, my), probability);
    }

    /**
     * The fraction of cases inside or on an ellipse whose axes are two columns of this table.
     *
     * @param ellipse the ellipse (its {@code xName} and {@code yName} name the columns)
     * @return fraction in [0, 1]
     * @throws IllegalArgumentException if a column is unknown
     */
    public double fractionInside(ConfidenceEllipse ellipse) {
        Arguments.nonNull("ellipse", ellipse);
        int cx = columnIndex("ellipse.xName()", ellipse.xName());
        int cy = columnIndex("ellipse.yName()", ellipse.yName());
        int inside = 0;
        for (int i = 0; i < rows; i++) {
            if (ellipse.contains(table[i * width + cx], table[i * width + cy])) {
                inside++;
            }
        }
        return (double) inside / rows;
    }

    /**
     * The circular error probable of two columns: the median distance of the cases from their
     * mean point (the radius of the circle about the mean point holding half of the cases).
     *
     * @param x name of the column along x
     * @param y name of the column along y
     * @return the CEP (units of the columns)
     * @throws IllegalArgumentException if a name is unknown or {@code x} equals {@code y}
     */
    public double cep(String x, String y) {
        columnIndex("x", x);
        columnIndex("y", y);
        return cepAbout(x, y, mean(x), mean(y));
    }

    /**
     * The circular error probable about a given point (for example the nominal aim point): the
     * median distance of the cases from it.
     *
     * @param x name of the column along x
     * @param y name of the column along y
     * @param centreX x of the centre
     * @param centreY y of the centre
     * @return the median distance
     * @throws IllegalArgumentException if a name is unknown, {@code x} equals {@code y}, or the
     *         centre is not finite
     */
    public double cepAbout(String x, String y, double centreX, double centreY) {
        int cx = columnIndex("x", x);
        int cy = columnIndex("y", y);
        if (cx == cy) {
            throw new IllegalArgumentException("y must differ from x = '" + x + "', got '" + y + "'");
        }
        Arguments.finite("centreX", centreX);
        Arguments.finite("centreY", centreY);
        double[] distance = new double[rows];
        for (int i = 0; i < rows; i++) {
            distance[i] = Math.hypot(table[i * width + cx] - centreX, table[i * width + cy] - centreY);
        }
        Arrays.sort(distance);
        return interpolatedOrderStatistic(distance, 0.5);
    }

    /**
     * A footprint summary of two outcomes: case count, mean point, standard deviations,
     * correlation, CEP and the 50 % and 95 % ellipses, one item per line.
     *
     * @param x name of the column along x (for example east)
     * @param y name of the column along y (for example north)
     * @return readable text
     * @throws IllegalArgumentException if a name is unknown or {@code x} equals {@code y}
     */
    public String footprint(String x, String y) {
        if (columnIndex("x", x) == columnIndex("y", y)) {
            throw new IllegalArgumentException("y must differ from x = '" + x + "', got '" + y + "'");
        }
        double sx = standardDeviation(x);
        double sy = standardDeviation(y);
        double r = covariance(x, y) / (sx * sy);
        StringBuilder text = new StringBuilder();
        text.append("cases                 ").append(rows).append('\n');
        text.append("mean point (").append(x).append(", ").append(y).append(")  (")
                .append(Formats.number(mean(x))).append(", ").append(Formats.number(mean(y))).append(")\n");
        text.append("standard deviations   ").append(Formats.number(sx)).append(", ").append(Formats.number(sy))
                .append(", correlation ").append(Formats.number(r)).append('\n');
        text.append("CEP about mean point  ").append(Formats.number(cep(x, y))).append('\n');
        for (double p : new double[] {0.5, 0.95}) {
            ConfidenceEllipse e = ellipse(x, y, p);
            text.append(Formats.number(100 * p)).append(" % ellipse          semi-axes ")
                    .append(Formats.number(e.semiMajor())).append(" x ").append(Formats.number(e.semiMinor()))
                    .append(", major axis ").append(Formats.number(Math.toDegrees(e.orientation())))
                    .append(" deg from +").append(x).append(" toward +").append(y).append(", holds ")
                    .append(Formats.number(100 * fractionInside(e))).append(" % of cases\n");
        }
        return text.toString();
    }

    /**
     * Writes the table as CSV: a header line {@code case,<inputs>,<outcomes>}, then one line per
     * case with its index and values. Values are written with {@link Double#toString(double)},
     * which reads back to the identical double.
     *
     * @param out the destination (not closed)
     * @throws UncheckedIOException if writing fails
     */
    public void writeCsv(Writer out) {
        Arguments.nonNull("out", out);
        try {
            StringBuilder line = new StringBuilder("case");
            List<String> names = new ArrayList<>(inputNames);
            names.addAll(outcomeNames);
            for (String name : names) {
                line.append(',').append(name);
            }
            out.write(line.append('\n').toString());
            for (int i = 0; i < rows; i++) {
                line.setLength(0);
                line.append(i);
                for (int c = 0; c < width; c++) {
                    line.append(',').append(table[i * width + c]);
                }
                out.write(line.append('\n').toString());
            }
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Writes the table as CSV to a file (see {@link #writeCsv(Writer)}), replacing it.
     *
     * @param file the file; its directory must exist
     * @throws UncheckedIOException if writing fails
     */
    public void writeCsv(Path file) {
        Arguments.nonNull("file", file);
        try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            writeCsv(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Whether another result has the same names and the same table bit for bit (raw IEEE 754
     * bits of every value).
     *
     * @param other another object
     * @return true if equal
     */
    @Override
    public boolean equals(Object other) {
        if (!(other instanceof DispersionResult r) || r.table.length != table.length
                || !r.inputNames.equals(inputNames) || !r.outcomeNames.equals(outcomeNames)) {
            return false;
        }
        for (int i = 0; i < table.length; i++) {
            if (Double.doubleToRawLongBits(table[i]) != Double.doubleToRawLongBits(r.table[i])) {
                return false;
            }
        }
        return true;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(table) * 31 + outcomeNames.hashCode();
    }

    @Override
    public String toString() {
        double[] means = mean();
        StringBuilder text = new StringBuilder("DispersionResult[").append(rows).append(" cases, mean {");
        for (int k = 0; k < means.length; k++) {
            text.append(k == 0 ? "" : ", ").append(outcomeNames.get(k)).append('=').append(Formats.number(means[k]));
        }
        return text.append("}]").toString();
    }
}
