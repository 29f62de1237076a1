package dev.noninertial.site;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;

/**
 * The generated parts of the benchmark page, made from JMH results files checked in under
 * {@code src-site/data/jmh/*.json} (written by {@code java -jar frames-bench/target/benchmarks.jar
 * -rf json -rff FILE ...}) and the ratio definitions of {@code frames-bench}
 * ({@code dev/noninertial/bench/ratios.tsv}). No benchmark runs while the site is built.
 *
 * <p>The page fragment {@code pages/benchmarks.html} marks where each part goes with an empty
 * element carrying {@code data-generated}: {@code jmh-conditions} (settings and JVM of each results
 * file), {@code jmh-ratios} (every ratio with its run-to-run spread) and {@code jmh-scores} (time
 * and allocation per benchmark, with the spread between forks). When several files hold the same
 * benchmark, the file later in name order wins, so a helper who adds or re-measures benchmarks adds
 * one file.
 *
 * <p>Run-to-run spread: JMH runs each benchmark in several forks (fresh JVMs). For a ratio
 * {@code a / b} the page shows the ratio of the means and the lowest and highest of the per-fork
 * ratios {@code a_k / b_k} (fork {@code k} of each), which shows how much one run can differ from
 * the next; the JMH 99.9% half-width is propagated as {@code q sqrt((ea/a)^2 + (eb/b)^2)}.
 */
public final class BenchmarkPage {

    /** Where the ratio definitions live, relative to the repository root. */
    static final String RATIOS = "frames-bench/src/main/resources/dev/noninertial/bench/ratios.tsv";

    private BenchmarkPage() {
    }

    /** One benchmark of a results file: its key, scores per fork, unit and allocation. */
    record Measured(String key, String file, double score, double error, String unit, List<Double> forkMeans,
                    double allocation, Map<String, Object> settings) {
    }

    /** One ratio definition (see ratios.tsv). */
    record Ratio(String what, String numerator, String denominator, String goal, double limit, double scale) {
    }

    /**
     * Fills the generated parts of the benchmark page.
     *
     * @param fragment the page fragment, with its {@code data-generated} placeholders
     * @param repositoryRoot the repository root (for the ratio definitions)
     * @param resultsDir the folder of JMH results files
     * @return the fragment with the tables written in
     * @throws IOException if a file cannot be read
     * @throws IllegalStateException if a results file or the ratio file is malformed
     */
    public static String fill(String fragment, Path repositoryRoot, Path resultsDir) throws IOException {
        Document doc = Markup.parseFragment(fragment);
        List<Element> places = doc.body().select("[data-generated^=jmh-]");
        if (places.isEmpty()) {
            return fragment;
        }
        Map<String, Measured> results = read(resultsDir);
        List<Ratio> ratios = ratios(repositoryRoot.resolve(RATIOS));
        for (Element place : places) {
            String what = place.attr("data-generated");
            String html = switch (what) {
                case "jmh-conditions" -> conditions(results, resultsDir);
                case "jmh-ratios" -> ratioTable(results, ratios);
                case "jmh-scores" -> scoreTable(results);
                default -> throw new IllegalStateException("benchmarks.html: unknown data-generated=\"" + what
                        + "\" (known: jmh-conditions, jmh-ratios, jmh-scores)");
            };
            place.html(html);
        }
        return Markup.html(doc.body());
    }

    /** Every benchmark of every results file, later files replacing earlier ones. */
    static Map<String, Measured> read(Path dir) throws IOException {
        Map<String, Measured> all = new LinkedHashMap<>();
        if (!Files.isDirectory(dir)) {
            return all;
        }
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(f -> f.getFileName().toString().endsWith(".json")).sorted(
                    Comparator.comparing(f -> f.getFileName().toString())).toList();
        }
        for (Path f : files) {
            Object root;
            try {
                root = JsonText.parse(Files.readString(f, StandardCharsets.UTF_8));
            } catch (IllegalArgumentException e) {
                throw new IllegalStateException("JMH results file " + f.getFileName() + ": " + e.getMessage(), e);
            }
            if (!(root instanceof List<?> runs)) {
                throw new IllegalStateException("JMH results file " + f.getFileName() + " is not a JSON array");
            }
            for (Object o : runs) {
                Measured m = measured(f.getFileName().toString(), (Map<?, ?>) o);
                all.put(m.key(), m);
            }
        }
        return all;
    }

    @SuppressWarnings("unchecked")
    private static Measured measured(String file, Map<?, ?> run) {
        String benchmark = (String) run.get("benchmark");
        int cut = benchmark.lastIndexOf('.', benchmark.lastIndexOf('.') - 1);
        StringBuilder key = new StringBuilder(benchmark.substring(cut + 1));
        Object params = run.get("params");
        if (params instanceof Map<?, ?> pm) {
            pm.forEach((k, v) -> key.append(':').append(k).append('=').append(v));
        }
        Map<?, ?> primary = (Map<?, ?>) run.get("primaryMetric");
        List<Double> forkMeans = new ArrayList<>();
        if (primary.get("rawData") instanceof List<?> forks) {
            for (Object fork : forks) {
                double sum = 0;
                int n = 0;
                for (Object v : (List<?>) fork) {
                    sum += (Double) v;
                    n++;
                }
                if (n > 0) {
                    forkMeans.add(sum / n);
                }
            }
        }
        double allocation = Double.NaN;
        if (run.get("secondaryMetrics") instanceof Map<?, ?> secondary
                && secondary.get("gc.alloc.rate.norm") instanceof Map<?, ?> alloc) {
            allocation = number(alloc.get("score"));
        }
        Map<String, Object> settings = new LinkedHashMap<>();
        for (String s : List.of("jmhVersion", "jdkVersion", "vmName", "vmVersion", "forks", "warmupIterations",
                "warmupTime", "measurementIterations", "measurementTime", "jvmArgs")) {
            settings.put(s, run.get(s));
        }
        return new Measured(key.toString(), file, number(primary.get("score")), number(primary.get("scoreError")),
                (String) primary.get("scoreUnit"), forkMeans, allocation, (Map<String, Object>) (Map<?, ?>) settings);
    }

    private static double number(Object o) {
        if (o instanceof Double d) {
            return d;
        }
        return Double.NaN; // JMH writes "NaN" as a string when it has no error estimate
    }

    static List<Ratio> ratios(Path file) throws IOException {
        List<Ratio> r = new ArrayList<>();
        int n = 0;
        for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
            n++;
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] c = line.split("\t", -1);
            if (c.length != 6) {
                throw new IllegalStateException(RATIOS + " line " + n + ": expected 6 tab-separated columns, found "
                        + c.length);
            }
            r.add(new Ratio(c[0], c[1], c[2], c[3], c[4].isBlank() ? Double.NaN : Double.parseDouble(c[4]),
                    c[5].isBlank() ? 1.0 : Double.parseDouble(c[5])));
        }
        return r;
    }

    private static String conditions(Map<String, Measured> results, Path dir) {
        if (results.isEmpty()) {
            return "<p class=\"note\">No JMH results file under <code>src-site/data/jmh/</code> yet.</p>";
        }
        Map<String, List<Measured>> byFile = new LinkedHashMap<>();
        results.values().forEach(m -> byFile.computeIfAbsent(m.file(), k -> new ArrayList<>()).add(m));
        StringBuilder b = new StringBuilder("<ul>\n");
        byFile.forEach((file, list) -> {
            Map<String, Object> s = list.get(0).settings();
            b.append("<li><a href=\"data/jmh/").append(Markup.escape(file)).append("\"><code>")
             .append(Markup.escape(file)).append("</code></a>: ").append(list.size()).append(" benchmarks; JMH ")
             .append(text(s.get("jmhVersion"))).append(", JDK ").append(text(s.get("jdkVersion"))).append(" (")
             .append(text(s.get("vmName"))).append(' ').append(text(s.get("vmVersion"))).append("); ")
             .append(count(s.get("forks"))).append(" forks, ").append(count(s.get("warmupIterations")))
             .append(" warm-up iterations of ").append(text(s.get("warmupTime"))).append(", ")
             .append(count(s.get("measurementIterations"))).append(" measured iterations of ")
             .append(text(s.get("measurementTime")));
            if (s.get("jvmArgs") instanceof List<?> args && !args.isEmpty()) {
                b.append("; JVM options of the first benchmark <code>").append(Markup.escape(String.join(" ",
                        args.stream().map(String::valueOf).toList()))).append("</code>");
            }
            b.append(".</li>\n");
        });
        return b.append("</ul>\n").toString();
    }

    private static String text(Object o) {
        return o == null ? "?" : Markup.escape(String.valueOf(o));
    }

    private static String count(Object o) {
        return o instanceof Double d ? String.valueOf(d.intValue()) : text(o);
    }

    private static String ratioTable(Map<String, Measured> results, List<Ratio> ratios) {
        StringBuilder b = new StringBuilder("<table class=\"jmh-ratios\">\n<tr><th>ratio</th><th class=\"num\">mean"
                + "</th><th class=\"num\">lowest to highest over forks</th><th class=\"num\">JMH 99.9%</th>"
                + "<th>goal</th><th>met (mean)</th></tr>\n");
        int rows = 0;
        for (Ratio r : ratios) {
            Measured a = results.get(r.numerator());
            Measured d = results.get(r.denominator());
            if (a == null || d == null) {
                continue;
            }
            rows++;
            double q = r.scale() * a.score() / d.score();
            double e = q * Math.hypot(a.error() / a.score(), d.error() / d.score());
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            int forks = Math.min(a.forkMeans().size(), d.forkMeans().size());
            for (int k = 0; k < forks; k++) {
                double rk = r.scale() * a.forkMeans().get(k) / d.forkMeans().get(k);
                lo = Math.min(lo, rk);
                hi = Math.max(hi, rk);
            }
            String met = Double.isNaN(r.limit()) ? "" : q <= r.limit() ? "yes" : "no";
            if (!met.isEmpty() && forks > 1 && lo <= r.limit() != hi <= r.limit()) {
                met += " (not in every fork)";
            }
            b.append("<tr><td>").append(Markup.escape(r.what())).append("</td><td class=\"num\">").append(f2(q))
             .append("</td><td class=\"num\">").append(forks > 1 ? f2(lo) + " to " + f2(hi) : "one fork")
             .append("</td><td class=\"num\">").append(Double.isFinite(e) ? "&plusmn; " + f2(e) : "")
             .append("</td><td>").append(Markup.escape(r.goal())).append("</td><td>").append(met)
             .append("</td></tr>\n");
        }
        if (rows == 0) {
            return "<p class=\"note\">No ratio of <code>" + RATIOS + "</code> has both benchmarks in the results files.</p>";
        }
        return b.append("</table>\n").toString();
    }

    private static String scoreTable(Map<String, Measured> results) {
        if (results.isEmpty()) {
            return "";
        }
        StringBuilder b = new StringBuilder("<table class=\"jmh-scores\">\n<tr><th>benchmark</th><th class=\"num\">"
                + "time per op</th><th class=\"num\">JMH 99.9%</th><th class=\"num\">fork means, lowest to highest"
                + "</th><th class=\"num\">spread</th><th class=\"num\">bytes per op</th></tr>\n");
        results.keySet().stream().sorted().forEach(k -> {
            Measured m = results.get(k);
            double lo = m.forkMeans().stream().mapToDouble(Double::doubleValue).min().orElse(Double.NaN);
            double hi = m.forkMeans().stream().mapToDouble(Double::doubleValue).max().orElse(Double.NaN);
            String unit = Markup.escape(m.unit() == null ? "" : m.unit());
            b.append("<tr><td><code>").append(Markup.escape(k)).append("</code></td><td class=\"num\">")
             .append(g(m.score())).append(' ').append(unit).append("</td><td class=\"num\">")
             .append(Double.isFinite(m.error()) ? "&plusmn; " + g(m.error()) : "").append("</td><td class=\"num\">")
             .append(m.forkMeans().size() > 1 ? g(lo) + " to " + g(hi) : "one fork").append("</td><td class=\"num\">")
             .append(m.forkMeans().size() > 1 ? String.format(Locale.ROOT, "%.0f%%", 100 * (hi - lo) / m.score()) : "")
             .append("</td><td class=\"num\">").append(Double.isNaN(m.allocation()) ? "" : String.format(Locale.ROOT,
                     "%.1f", m.allocation())).append("</td></tr>\n");
        });
        return b.append("</table>\n").toString();
    }

    private static String f2(double x) {
        return String.format(Locale.ROOT, "%.2f", x);
    }

    private static String g(double x) {
        if (!Double.isFinite(x)) {
            return "";
        }
        return String.format(Locale.ROOT, Math.abs(x) >= 100 ? "%.1f" : Math.abs(x) >= 10 ? "%.2f" : "%.3f", x);
    }
}
