package dev.noninertial.bench;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.openjdk.jmh.results.Result;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.CommandLineOptionException;
import org.openjdk.jmh.runner.options.CommandLineOptions;

/**
 * Runs the JMH benchmarks (same command-line options as {@code org.openjdk.jmh.Main}, e.g.
 * {@code -f 1 -wi 3 -i 5 -prof gc}) and prints the ratios of library to baselines with their
 * error bars. With {@code -Dreport.html=FILE} it also writes the table as an HTML fragment.
 *
 * <p>The error of a ratio {@code a / b} is propagated from JMH's 99.9% confidence half-widths:
 * {@code (a / b) sqrt((ea / a)^2 + (eb / b)^2)}.
 */
public final class BenchmarkReport {

    private BenchmarkReport() {
    }

    /**
     * One ratio of the report.
     *
     * @param what readable description
     * @param numerator benchmark key of the library path
     * @param denominator benchmark key of the reference path
     * @param goal the goal as text, empty for none
     * @param limit the largest ratio meeting the goal, NaN for none
     * @param scale factor applied to the ratio (6 turns "six single links" into "one mean link")
     */
    record Ratio(String what, String numerator, String denominator, String goal, double limit, double scale) {
    }

    /** Where the ratio definitions live (shared with the site's benchmark page). */
    static final String RATIOS = "ratios.tsv";

    /**
     * The ratios reported, in page order, read from {@code ratios.tsv} beside this class (the
     * site's benchmark page reads the same file).
     *
     * @return the ratios
     */
    static List<Ratio> ratios() {
        List<Ratio> r = new ArrayList<>();
        try (InputStream in = BenchmarkReport.class.getResourceAsStream(RATIOS)) {
            if (in == null) {
                throw new IllegalStateException("missing resource dev/noninertial/bench/" + RATIOS);
            }
            int n = 0;
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                n++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] c = line.split("\t", -1);
                if (c.length != 6) {
                    throw new IllegalStateException(RATIOS + " line " + n + ": expected 6 tab-separated columns, found "
                            + c.length);
                }
                double limit = c[4].isBlank() ? Double.NaN : Double.parseDouble(c[4]);
                double scale = c[5].isBlank() ? 1.0 : Double.parseDouble(c[5]);
                r.add(new Ratio(c[0], c[1], c[2], c[3], limit, scale));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return r;
    }

    private static String key(RunResult run) {
        String name = run.getParams().getBenchmark();
        String simple = name.substring(name.lastIndexOf('.', name.lastIndexOf('.') - 1) + 1);
        StringBuilder k = new StringBuilder(simple);
        for (String p : run.getParams().getParamsKeys()) {
            k.append(':').append(p).append('=').append(run.getParams().getParam(p));
        }
        return k.toString();
    }

    /**
     * Runs the benchmarks and prints the report.
     *
     * @param args JMH command-line options
     * @throws RunnerException if JMH fails
     * @throws CommandLineOptionException if the options are malformed
     * @throws IOException if the HTML file cannot be written
     */
    public static void main(String[] args) throws RunnerException, CommandLineOptionException, IOException {
        Collection<RunResult> runs = new Runner(new CommandLineOptions(args)).run();
        Map<String, Result<?>> primary = new HashMap<>();
        Map<String, Result<?>> alloc = new HashMap<>();
        for (RunResult run : runs) {
            String k = key(run);
            primary.put(k, run.getPrimaryResult());
            Result<?> a = run.getSecondaryResults().get("gc.alloc.rate.norm");
            if (a != null) {
                alloc.put(k, a);
            }
        }
        StringBuilder text = new StringBuilder();
        StringBuilder html = new StringBuilder("<table>\n<tr><th>ratio</th><th>measured</th><th>goal</th>"
                + "<th>met</th></tr>\n");
        for (Ratio r : ratios()) {
            Result<?> a = primary.get(r.numerator());
            Result<?> b = primary.get(r.denominator());
            if (a == null || b == null) {
                continue;
            }
            double q = r.scale() * a.getScore() / b.getScore();
            double e = q * Math.hypot(a.getScoreError() / a.getScore(), b.getScoreError() / b.getScore());
            String measured = Double.isFinite(e) ? String.format(Locale.ROOT, "%.2f &plusmn; %.2f", q, e)
                    : String.format(Locale.ROOT, "%.2f", q);
            String met = Double.isNaN(r.limit()) ? "" : q <= r.limit() ? "yes" : "no";
            text.append(String.format(Locale.ROOT, "%-72s %18s  %-12s %s%n", r.what(),
                    measured.replace("&plusmn;", "+-"), r.goal(), met));
            html.append("<tr><td>").append(r.what()).append("</td><td>").append(measured).append("</td><td>")
                    .append(r.goal()).append("</td><td>").append(met).append("</td></tr>\n");
        }
        html.append("</table>\n");
        StringBuilder scores = new StringBuilder("<table>\n<tr><th>benchmark</th><th>ns per op</th>"
                + "<th>bytes allocated per op</th></tr>\n");
        text.append(String.format(Locale.ROOT, "%n%-60s %22s %18s%n", "benchmark", "ns/op", "B/op"));
        primary.keySet().stream().sorted().forEach(k -> {
            Result<?> p = primary.get(k);
            Result<?> a = alloc.get(k);
            String ns = String.format(Locale.ROOT, "%.2f &plusmn; %.2f", p.getScore(), p.getScoreError());
            String bytes = a == null ? "" : String.format(Locale.ROOT, "%.1f", a.getScore());
            text.append(String.format(Locale.ROOT, "%-60s %22s %18s%n", k, ns.replace("&plusmn;", "+-"), bytes));
            scores.append("<tr><td>").append(k).append("</td><td>").append(ns).append("</td><td>").append(bytes)
                    .append("</td></tr>\n");
        });
        scores.append("</table>\n");
        System.out.print(text);
        String file = System.getProperty("report.html");
        if (file != null) {
            Files.writeString(Path.of(file), html.toString() + scores, StandardCharsets.UTF_8);
        }
    }
}
