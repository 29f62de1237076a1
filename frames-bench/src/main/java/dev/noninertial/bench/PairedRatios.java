package dev.noninertial.bench;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

/**
 * The ratios of {@link BenchmarkReport}, measured a second way that resists a loaded machine:
 * library and reference run in alternation, in short slices of about a millisecond, in the same
 * JVM; each round keeps the fastest of five slices per side (the least disturbed by other
 * processes), and the result is the median ratio over the rounds with its interquartile range.
 * JMH runs one benchmark after the other, so a load that changes between two benchmarks skews
 * their ratio; alternation cancels most of that.
 *
 * <p>Run: {@code java -cp frames-bench/target/benchmarks.jar dev.noninertial.bench.PairedRatios [rounds [regex]]}.
 */
public final class PairedRatios {

    /** One timed operation. */
    @FunctionalInterface
    interface Op {
        void run();
    }

    // sinks: results stored here escape, so nothing is optimized away
    static volatile Object sinkObject;
    static double sinkDouble;

    private PairedRatios() {
    }

    private static Map<String, Op> operations() {
        Map<String, Op> ops = new HashMap<>();
        ConversionBenchmark c = new ConversionBenchmark();
        String k = "ConversionBenchmark.";
        ops.put(k + "toBaseLibrary", () -> sinkObject = c.toBaseLibrary());
        ops.put(k + "toBaseObjects", () -> sinkObject = c.toBaseObjects());
        ops.put(k + "toBasePrimitives", () -> sinkObject = c.toBasePrimitives());
        ops.put(k + "fromBaseLibrary", () -> sinkObject = c.fromBaseLibrary());
        ops.put(k + "fromBaseObjects", () -> sinkObject = c.fromBaseObjects());
        ops.put(k + "fromBasePrimitives", () -> sinkObject = c.fromBasePrimitives());
        ops.put(k + "fictitiousLibrary", () -> sinkObject = c.fictitiousLibrary());
        ops.put(k + "fictitiousObjects", () -> sinkObject = c.fictitiousObjects());
        ops.put(k + "fictitiousPrimitives", () -> sinkObject = c.fictitiousPrimitives());
        for (int depth : new int[] {1, 3, 6}) {
            ChainBenchmark h = new ChainBenchmark();
            h.depth = depth;
            h.build();
            String p = ":depth=" + depth;
            ops.put("ChainBenchmark.library" + p, () -> sinkObject = h.library());
            ops.put("ChainBenchmark.objects" + p, () -> sinkObject = h.objects());
            ops.put("ChainBenchmark.primitives" + p, () -> sinkObject = h.primitives());
            ops.put("ChainBenchmark.eachLinkAlone" + p, () -> sinkDouble += h.eachLinkAlone());
        }
        BulkBenchmark b = new BulkBenchmark();
        b.fill();
        k = "BulkBenchmark.";
        ops.put(k + "placementToBaseLibrary", () -> sinkObject = b.placementToBaseLibrary());
        ops.put(k + "placementToBasePrimitives", () -> sinkObject = b.placementToBasePrimitives());
        ops.put(k + "placementToBaseObjects", () -> sinkObject = b.placementToBaseObjects());
        ops.put(k + "placementFromBaseLibrary", () -> sinkObject = b.placementFromBaseLibrary());
        ops.put(k + "placementFromBasePrimitives", () -> sinkObject = b.placementFromBasePrimitives());
        ops.put(k + "motionToBaseLibrary", () -> sinkObject = b.motionToBaseLibrary());
        ops.put(k + "motionToBaseLibraryObjects", () -> sinkObject = b.motionToBaseLibraryObjects());
        ops.put(k + "motionToBasePrimitives", () -> sinkObject = b.motionToBasePrimitives());
        ops.put(k + "motionToBaseObjects", () -> sinkObject = b.motionToBaseObjects());
        GeodesyBenchmark g = new GeodesyBenchmark();
        k = "GeodesyBenchmark.";
        ops.put(k + "toCartesianLibrary", () -> sinkObject = g.toCartesianLibrary());
        ops.put(k + "toCartesianObjects", () -> sinkObject = g.toCartesianObjects());
        ops.put(k + "toCartesianPrimitives", () -> sinkObject = g.toCartesianPrimitives());
        ops.put(k + "toGeodeticLibrary", () -> sinkObject = g.toGeodeticLibrary());
        ops.put(k + "toGeodeticObjects", () -> sinkObject = g.toGeodeticObjects());
        ops.put(k + "toGeodeticPrimitives", () -> sinkObject = g.toGeodeticPrimitives());
        ops.put(k + "eraLibrary", () -> sinkDouble += g.eraLibrary());
        ops.put(k + "eraPrimitives", () -> sinkDouble += g.eraPrimitives());
        DynamicsBenchmark d = new DynamicsBenchmark();
        k = "DynamicsBenchmark.";
        ops.put(k + "stepLibrary", () -> sinkObject = d.stepLibrary());
        ops.put(k + "stepObjects", () -> sinkObject = d.stepObjects());
        ops.put(k + "stepPrimitives", () -> sinkObject = d.stepPrimitives());
        ops.put(k + "trajectoryLibrary", () -> sinkObject = d.trajectoryLibrary());
        ops.put(k + "trajectoryObjects", () -> sinkObject = d.trajectoryObjects());
        ops.put(k + "trajectoryPrimitives", () -> sinkObject = d.trajectoryPrimitives());
        AirBenchmark air = new AirBenchmark();
        k = "AirBenchmark.";
        ops.put(k + "dragLibrary", () -> sinkObject = air.dragLibrary());
        ops.put(k + "dragPrimitives", () -> sinkObject = air.dragPrimitives());
        ops.put(k + "stepLibrary", () -> sinkObject = air.stepLibrary());
        ops.put(k + "stepPrimitives", () -> sinkObject = air.stepPrimitives());
        NavigationBenchmark nb = new NavigationBenchmark();
        nb.reset();
        k = "NavigationBenchmark.";
        ops.put(k + "stepLibrary", () -> sinkObject = nb.stepLibrary());
        ops.put(k + "stepPrimitives", () -> sinkObject = nb.stepPrimitives());
        ops.put(k + "stepObjects", () -> sinkObject = nb.stepObjects());
        return ops;
    }

    /**
     * Measures every ratio and prints median and interquartile range.
     *
     * @param args optional number of rounds (default 9), then optionally a regular expression:
     *        only ratios whose description contains a match are measured
     */
    public static void main(String[] args) {
        int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 9;
        if (rounds < 3) {
            throw new IllegalArgumentException("rounds must be >= 3, got " + rounds);
        }
        java.util.regex.Pattern only = java.util.regex.Pattern.compile(args.length > 1 ? args[1] : "");
        Map<String, Op> ops = operations();
        StringBuilder html = new StringBuilder("<table>\n<tr><th>ratio</th><th>median</th>"
                + "<th>interquartile range</th><th>goal</th><th>met</th></tr>\n");
        for (BenchmarkReport.Ratio r : BenchmarkReport.ratios()) {
            Op a = ops.get(r.numerator());
            Op b = ops.get(r.denominator());
            if (a == null || b == null || !only.matcher(r.what()).find()) {
                continue;
            }
            double[] q = ratios(a, b, rounds);
            for (int i = 0; i < q.length; i++) {
                q[i] *= r.scale();
            }
            Arrays.sort(q);
            double median = q[q.length / 2];
            double lo = q[q.length / 4];
            double hi = q[(3 * q.length) / 4];
            String met = Double.isNaN(r.limit()) ? "" : median <= r.limit() ? "yes" : "no";
            System.out.printf(Locale.ROOT, "%-72s %6.2f  [%5.2f, %5.2f]  %-12s %s%n", r.what(), median, lo, hi,
                    r.goal(), met);
            html.append(String.format(Locale.ROOT,
                    "<tr><td>%s</td><td>%.2f</td><td>%.2f to %.2f</td><td>%s</td><td>%s</td></tr>%n",
                    r.what(), median, lo, hi, r.goal(), met));
        }
        html.append("</table>\n");
        String file = System.getProperty("report.html");
        if (file != null) {
            try {
                java.nio.file.Files.writeString(java.nio.file.Path.of(file), html);
            } catch (java.io.IOException e) {
                throw new IllegalStateException("cannot write " + file, e);
            }
        }
    }

    private static double[] ratios(Op a, Op b, int rounds) {
        // warm-up and calibration: about 0.5 s of alternating calls
        long calls = 0;
        long t0 = System.nanoTime();
        while (System.nanoTime() - t0 < 500_000_000L) {
            a.run();
            b.run();
            calls++;
        }
        double perPair = (System.nanoTime() - t0) / (double) calls;
        int slice = (int) Math.max(1, Math.min(1_000_000, 1_000_000 / perPair));
        double[] q = new double[rounds];
        for (int r = 0; r < rounds; r++) {
            double ta;
            double tb;
            if (r % 2 == 0) {
                ta = best(a, slice);
                tb = best(b, slice);
            } else {
                tb = best(b, slice);
                ta = best(a, slice);
            }
            q[r] = ta / tb;
        }
        return q;
    }

    private static double best(Op op, int slice) {
        long best = Long.MAX_VALUE;
        for (int s = 0; s < 5; s++) {
            long t0 = System.nanoTime();
            for (int i = 0; i < slice; i++) {
                op.run();
            }
            best = Math.min(best, System.nanoTime() - t0);
        }
        return best;
    }
}
