package dev.noninertial.bench;

import java.io.IOException;
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
        Ratio(String what, String numerator, String denominator, String goal, double limit) {
            this(what, numerator, denominator, goal, limit, 1.0);
        }
    }

    /** @return the ratios reported, in page order */
    static List<Ratio> ratios() {
        List<Ratio> r = new ArrayList<>();
        String c = "ConversionBenchmark.";
        r.add(new Ratio("full state F to B, object API / (a) Hipparchus objects", c + "toBaseLibrary", c + "toBaseObjects", "at most 0.5", 0.5));
        r.add(new Ratio("full state F to B, object API / (b) primitives", c + "toBaseLibrary", c + "toBasePrimitives", "at most 3", 3));
        r.add(new Ratio("full state B to F, object API / (a)", c + "fromBaseLibrary", c + "fromBaseObjects", "at most 0.5", 0.5));
        r.add(new Ratio("full state B to F, object API / (b)", c + "fromBaseLibrary", c + "fromBasePrimitives", "at most 3", 3));
        r.add(new Ratio("fictitious accelerations, object API / (a)", c + "fictitiousLibrary", c + "fictitiousObjects", "at most 0.5", 0.5));
        r.add(new Ratio("fictitious accelerations, object API / (b)", c + "fictitiousLibrary", c + "fictitiousPrimitives", "at most 3", 3));
        String h = "ChainBenchmark.";
        for (String d : new String[] {"1", "3", "6"}) {
            r.add(new Ratio("placement through a chain of " + d + ", object API / (a)", h + "library:depth=" + d,
                    h + "objects:depth=" + d, "at most 0.5", 0.5));
            r.add(new Ratio("placement through a chain of " + d + ", object API / (b)", h + "library:depth=" + d,
                    h + "primitives:depth=" + d, "at most 3", 3));
        }
        r.add(new Ratio("chain of 6 / mean single link of the same six motions, library",
                h + "library:depth=6", h + "eachLinkAlone:depth=6", "at most 6", 6, 6.0));
        r.add(new Ratio("chain of 6 / single link (the first, cheapest motion), library", h + "library:depth=6",
                h + "library:depth=1", "", Double.NaN));
        r.add(new Ratio("chain of 6 / single link, (b) primitives (for reference)", h + "primitives:depth=6",
                h + "primitives:depth=1", "", Double.NaN));
        String b = "BulkBenchmark.";
        r.add(new Ratio("bulk F to B through a placement, per state / (b)", b + "placementToBaseLibrary", b + "placementToBasePrimitives", "at most 1.2", 1.2));
        r.add(new Ratio("bulk F to B through a placement, per state / (a)", b + "placementToBaseLibrary", b + "placementToBaseObjects", "", Double.NaN));
        r.add(new Ratio("bulk B to F through a placement, per state / (b)", b + "placementFromBaseLibrary", b + "placementFromBasePrimitives", "at most 1.2", 1.2));
        r.add(new Ratio("bulk F to B through a motion at one time per state / (b)", b + "motionToBaseLibrary", b + "motionToBasePrimitives", "at most 1.2", 1.2));
        r.add(new Ratio("bulk F to B through a motion at one time per state / (a)", b + "motionToBaseLibrary", b + "motionToBaseObjects", "", Double.NaN));
        r.add(new Ratio("object API in a loop over the same states / (b) (for reference)", b + "motionToBaseLibraryObjects", b + "motionToBasePrimitives", "", Double.NaN));
        String g = "GeodesyBenchmark.";
        r.add(new Ratio("geodetic to Cartesian, library / (a) objects", g + "toCartesianLibrary", g + "toCartesianObjects", "", Double.NaN));
        r.add(new Ratio("geodetic to Cartesian, library / (b) primitives", g + "toCartesianLibrary", g + "toCartesianPrimitives", "", Double.NaN));
        r.add(new Ratio("Cartesian to geodetic (exact), library / (a) fixed-point iteration", g + "toGeodeticLibrary", g + "toGeodeticObjects", "", Double.NaN));
        r.add(new Ratio("Cartesian to geodetic (exact), library / (b) Bowring, two passes", g + "toGeodeticLibrary", g + "toGeodeticPrimitives", "", Double.NaN));
        r.add(new Ratio("Cartesian to geodetic / geodetic to Cartesian, library", g + "toGeodeticLibrary", g + "toCartesianLibrary", "at most 3", 3));
        r.add(new Ratio("Earth rotation angle, library / (b) formula without checks", g + "eraLibrary", g + "eraPrimitives", "", Double.NaN));
        String d = "DynamicsBenchmark.";
        r.add(new Ratio("one integrator step, library / (a) same integrator, Vector3D equations", d + "stepLibrary", d + "stepObjects", "", Double.NaN));
        r.add(new Ratio("one integrator step, library / (b) same integrator, primitive equations", d + "stepLibrary", d + "stepPrimitives", "", Double.NaN));
        r.add(new Ratio("100 s trajectory, library / (a)", d + "trajectoryLibrary", d + "trajectoryObjects", "", Double.NaN));
        r.add(new Ratio("100 s trajectory, library / (b)", d + "trajectoryLibrary", d + "trajectoryPrimitives", "", Double.NaN));
        String air = "AirBenchmark.";
        r.add(new Ratio("air drag evaluation, library / (b) primitives", air + "dragLibrary", air + "dragPrimitives", "", Double.NaN));
        r.add(new Ratio("one step with gravitation and drag, library / (b) same integrator, primitive drag", air + "stepLibrary", air + "stepPrimitives", "", Double.NaN));
        String n = "NavigationBenchmark.";
        r.add(new Ratio("one strapdown step, library work array / (b) hand-written step", n + "stepLibrary", n + "stepPrimitives", "at most 1.5", 1.5));
        r.add(new Ratio("one strapdown step, object API / (b) hand-written step", n + "stepObjects", n + "stepPrimitives", "", Double.NaN));
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
