package dev.noninertial.bench;

import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.motion.SampledMotion;
import dev.noninertial.geodesy.air.Atmosphere1976;
import dev.noninertial.geodesy.air.SoundingAtmosphere;

/**
 * The quick allocation and speed check that CI runs (through {@code HotPathGateTest} in
 * {@code mvn -B verify}, or standalone with
 * {@code java -cp frames-bench/target/benchmarks.jar dev.noninertial.bench.HotPathGate}).
 *
 * <p><b>Allocation</b> (deterministic): the bytes allocated by the current thread, read from
 * {@code com.sun.management.ThreadMXBean#getCurrentThreadAllocatedBytes}, around one call of each
 * bulk path on {@value #STATES} states, smallest of several repetitions. A bulk path passes when
 * it allocates nothing per state: at most its documented per-call allowance (0 bytes through a
 * placement; one scratch array of {@link Placement#COMPONENTS} doubles through a motion, which
 * the JIT often removes). Any per-state allocation would show as at least
 * {@value #STATES} x 16 bytes, so the verdict does not depend on timing.
 *
 * <p><b>Speed</b> (noisy, so the bound is loose): library and hand-written primitive code
 * (baseline (b), {@link PrimitiveBaseline}) are timed in alternation on the same inputs, in
 * rounds; the verdict uses the median ratio over the rounds and fails only above
 * {@value #GROSS_REGRESSION}x, which catches a lost fast path, not a few percent. The timed paths are
 * the bulk paths, whose goal is parity with hand-written code; object paths, which allocate
 * their result, are measured by the JMH benchmarks instead, where the result cannot be optimized
 * away or hoisted.
 */
public final class HotPathGate {

    /** States per bulk call. */
    public static final int STATES = 20_000;
    /** A speed ratio above this fails the gate. */
    public static final double GROSS_REGRESSION = 3.0;

    private static final double[] SINK = new double[1];
    private static final double[][] CONTROL = new double[1][];

    private HotPathGate() {
    }

    /**
     * One allocation measurement.
     *
     * @param path what was measured
     * @param bytesPerCall smallest bytes allocated by one call over the repetitions
     * @param states states converted per call
     * @param allowanceBytes bytes per call allowed (nothing per state); negative for an
     *        informational row that cannot fail
     */
    public record Allocation(String path, long bytesPerCall, int states, long allowanceBytes) {
        /** @return true unless the path is gated and allocates more than its allowance */
        public boolean passed() {
            return allowanceBytes < 0 || bytesPerCall <= allowanceBytes;
        }

        /** @return bytes per state */
        public double bytesPerState() {
            return (double) bytesPerCall / states;
        }
    }

    /**
     * One paired timing.
     *
     * @param path what was measured
     * @param ratios library time over baseline (b) time, one per round
     * @param gated true if a median above {@link #GROSS_REGRESSION} fails the gate; false for an
     *        informational row (object paths, which allocate their result and are not expected
     *        to match allocation-free code)
     */
    public record Speed(String path, double[] ratios, boolean gated) {
        /** @return the median ratio */
        public double median() {
            double[] s = ratios.clone();
            Arrays.sort(s);
            int n = s.length;
            return n % 2 == 1 ? s[n / 2] : 0.5 * (s[n / 2 - 1] + s[n / 2]);
        }

        /** @return true for an informational row or a median ratio of at most {@link #GROSS_REGRESSION} */
        public boolean passed() {
            return !gated || median() <= GROSS_REGRESSION;
        }
    }

    /** Inputs shared by the checks (invented, fixed seed). */
    static final class Inputs {
        final Placement placement = Scenario.placement();
        final Motion spin = Scenario.spinUp();
        final Motion lambda;
        /** A stack made by {@code then}: the spin-up, then a heave along z. */
        final Motion stacked;
        final double[] p = PrimitiveBaseline.scenarioPlacement();
        final PointState state = Scenario.state();
        final double[] times = new double[STATES];
        final double[] source = new double[STATES * PointState.COMPONENTS];
        final double[] target = new double[STATES * PointState.COMPONENTS];
        final double[] placementSlot = new double[Placement.COMPONENTS];
        /** The spin-up sampled at 1001 instants over the 60 s of the query times, with a drifting origin. */
        final SampledMotion sampled;

        Inputs() {
            int n = 1001;
            double[] st = new double[n];
            double[] sp = new double[3 * n];
            double[] sq = new double[4 * n];
            for (int k = 0; k < n; k++) {
                double t = 0.06 * k;
                st[k] = t;
                sp[3 * k] = 0.5 * t;
                sp[3 * k + 1] = Math.sin(0.2 * t);
                double[] c = new double[Placement.QUATERNION_COMPONENTS];
                spin.at(t).toQuaternionArray(c, 0);
                System.arraycopy(c, 9, sq, 4 * k, 4);
            }
            sampled = SampledMotion.fromArrays(st, sp, sq);
            Motion built = spin;
            lambda = t -> built.at(t);
            stacked = spin.then(Motions.heave(Vector3D.PLUS_K, 1.5, 0.6, 0.0));
            Random random = new Random(42L);
            for (int k = 0; k < STATES; k++) {
                times[k] = 60.0 * k / STATES;
            }
            for (int i = 0; i < source.length; i++) {
                source[i] = 200 * random.nextDouble() - 100;
            }
        }
    }

    /**
     * Measures the allocation of every bulk path (gated) and of some object paths (informational).
     *
     * @return one row per path
     */
    public static List<Allocation> allocations() {
        Inputs in = new Inputs();
        com.sun.management.ThreadMXBean mx = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        if (!mx.isThreadAllocatedMemorySupported()) {
            throw new IllegalStateException("this JVM does not count allocated bytes per thread");
        }
        mx.setThreadAllocatedMemoryEnabled(true);
        long scratch = 16 + 8L * Placement.COMPONENTS;
        List<Allocation> rows = new ArrayList<>();
        rows.add(new Allocation("Placement.toBase(double[]...)", bytes(mx,
                () -> in.placement.toBase(in.source, 0, in.target, 0, STATES)), STATES, 0));
        rows.add(new Allocation("Placement.fromBase(double[]...)", bytes(mx,
                () -> in.placement.fromBase(in.source, 0, in.target, 0, STATES)), STATES, 0));
        rows.add(new Allocation("Motion.toBase(times, ...) spin-up", bytes(mx,
                () -> in.spin.toBase(in.times, 0, in.source, 0, in.target, 0, STATES)), STATES, scratch));
        rows.add(new Allocation("Motion.fromBase(times, ...) spin-up", bytes(mx,
                () -> in.spin.fromBase(in.times, 0, in.source, 0, in.target, 0, STATES)), STATES, scratch));
        rows.add(new Allocation("Motion.toBase(times, ...) sampled motion", bytes(mx,
                () -> in.sampled.toBase(in.times, 0, in.source, 0, in.target, 0, STATES)), STATES, scratch));
        rows.add(new Allocation("SampledMotion.at(t, target, offset) x STATES", bytes(mx, () -> {
            for (int k = 0; k < STATES; k++) {
                in.sampled.at(in.times[k], in.placementSlot, 0);
            }
        }), STATES, 0));
        rows.add(new Allocation("Motion.toBase(times, ...) stack made by then", bytes(mx,
                () -> in.stacked.toBase(in.times, 0, in.source, 0, in.target, 0, STATES)), STATES, scratch));
        rows.add(new Allocation("stack made by then: at(t, target, offset) x STATES", bytes(mx, () -> {
            for (int k = 0; k < STATES; k++) {
                in.stacked.at(in.times[k], in.placementSlot, 0);
            }
        }), STATES, 0));
        rows.add(new Allocation("Motion.toBase(times, ...) user lambda (info: default at(t))", bytes(mx,
                () -> in.lambda.toBase(in.times, 0, in.source, 0, in.target, 0, STATES)), STATES, -1));
        rows.add(new Allocation("Placement.toBase(PointState) x STATES (info: one result each)", bytes(mx, () -> {
            double sum = 0;
            for (int k = 0; k < STATES; k++) {
                sum += in.placement.toBase(in.state).position().getX();
            }
            SINK[0] = sum;
        }), STATES, -1));
        NavigationScenario nav = new NavigationScenario();
        double[][] navRun = nav.run(STATES);
        double[] navWork = nav.navigator.newWork(nav.start);
        double[] navTime = {0.0};
        rows.add(new Allocation("LevelNavigator.advance(work, ...) x STATES", bytes(mx, () -> {
            for (int k = 0; k < STATES; k++) {
                navTime[0] += NavigationScenario.STEP;
                nav.navigator.advance(navWork, navTime[0], nav.dv[0], nav.dv[1], nav.dv[2], nav.da[0], nav.da[1],
                        nav.da[2]);
            }
        }), STATES, 0));
        // a run allocates its work array and its result (state, position, history): about 0.6 kB
        rows.add(new Allocation("LevelNavigator.run(start, STATES steps)", bytes(mx,
                () -> nav.navigator.run(nav.start, navRun[0], navRun[1], navRun[2])), STATES, 1024));
        SensorScenario sensor = new SensorScenario();
        // per call: the scratch array of the readings (about 0.4 kB); nothing per reading
        rows.add(new Allocation("IdealSensor.readingsAt(times...) Earth tree, lever arm", bytes(mx,
                sensor::readings), STATES, 1024));
        // per call: the scratch of the adaptive quadrature (about 17 kB); nothing per increment
        rows.add(new Allocation("IdealSensor.incrementsOver(grid...) Earth tree, 100 Hz", bytes(mx,
                () -> sensor.increments(STATES)), STATES, 20_000));
        // the atmospheres the drag reads at every evaluation: nothing per call
        Atmosphere1976 standard = Atmosphere1976.standard();
        double[] levels = new double[23];
        double[] rho = new double[levels.length];
        double[] sound = new double[levels.length];
        for (int i = 0; i < levels.length; i++) {
            levels[i] = 500.0 * i;
            rho[i] = standard.density(levels[i]);
            sound[i] = standard.speedOfSound(levels[i]);
        }
        SoundingAtmosphere sounding = SoundingAtmosphere.of(levels, rho, sound);
        rows.add(new Allocation("Atmosphere1976 density + speedOfSound x STATES", bytes(mx, () -> {
            double sum = 0;
            for (int k = 0; k < STATES; k++) {
                sum += standard.density(11.0 * (k % 1000)) + standard.speedOfSound(11.0 * (k % 1000));
            }
            SINK[0] = sum;
        }), STATES, 0));
        rows.add(new Allocation("SoundingAtmosphere density + speedOfSound x STATES", bytes(mx, () -> {
            double sum = 0;
            for (int k = 0; k < STATES; k++) {
                sum += sounding.density(11.0 * (k % 1000)) + sounding.speedOfSound(11.0 * (k % 1000));
            }
            SINK[0] = sum;
        }), STATES, 0));
        rows.add(new Allocation("control: one new double[STATES] per call (info: proves the counter)",
                bytes(mx, () -> CONTROL[0] = new double[STATES]), STATES, -1));
        return rows;
    }

    private static long bytes(com.sun.management.ThreadMXBean mx, Runnable r) {
        long overhead = Long.MAX_VALUE;
        long best = Long.MAX_VALUE;
        for (int rep = 0; rep < 8; rep++) {
            long b0 = mx.getCurrentThreadAllocatedBytes();
            long b1 = mx.getCurrentThreadAllocatedBytes();
            overhead = Math.min(overhead, b1 - b0);
            long c0 = mx.getCurrentThreadAllocatedBytes();
            r.run();
            long c1 = mx.getCurrentThreadAllocatedBytes();
            best = Math.min(best, c1 - c0);
        }
        return Math.max(0, best - overhead);
    }

    /**
     * Paired timings of library paths against baseline (b).
     *
     * @param rounds number of rounds (odd is best for the median)
     * @return one row per path
     */
    public static List<Speed> speeds(int rounds) {
        Inputs in = new Inputs();
        List<Speed> rows = new ArrayList<>();
        rows.add(pair("bulk Placement.toBase, per state", rounds, true,
                () -> in.placement.toBase(in.source, 0, in.target, 0, STATES),
                () -> PrimitiveBaseline.toBaseAll(in.p, in.source, in.target, STATES)));
        rows.add(pair("bulk Placement.fromBase, per state", rounds, true,
                () -> in.placement.fromBase(in.source, 0, in.target, 0, STATES),
                () -> PrimitiveBaseline.fromBaseAll(in.p, in.source, in.target, STATES)));
        rows.add(pair("bulk Motion.toBase spin-up, per state", rounds, true,
                () -> in.spin.toBase(in.times, 0, in.source, 0, in.target, 0, STATES),
                () -> PrimitiveBaseline.spinUpToBaseAll(in.times, in.source, in.target, STATES)));
        SensorScenario sensor = new SensorScenario();
        rows.add(pair("bulk IdealSensor.readingsAt vs placement in root + gravitation, per reading", rounds, true,
                sensor::readings, sensor::baseline));
        // information: cost of one increment (4 readings per increment on a grid, plus the
        // quadrature) over one reading; goal 8x
        rows.add(pair("IdealSensor increments / readings (info), per sample", rounds, false,
                () -> sensor.increments(STATES), sensor::readings));
        NavigationScenario nav = new NavigationScenario();
        double[] navWork = nav.navigator.newWork(nav.start);
        double[] navBase = nav.baselineState();
        double[] clock = {0.0, 0.0};
        rows.add(pair("LevelNavigator.advance(work, ...), per step", rounds, true, () -> {
            for (int k = 0; k < STATES; k++) {
                clock[0] += NavigationScenario.STEP;
                nav.navigator.advance(navWork, clock[0], nav.dv[0], nav.dv[1], nav.dv[2], nav.da[0], nav.da[1],
                        nav.da[2]);
            }
        }, () -> {
            for (int k = 0; k < STATES; k++) {
                clock[1] += NavigationScenario.STEP;
                NavigationBaseline.step(navBase, clock[1], nav.dv[0], nav.dv[1], nav.dv[2], nav.da[0], nav.da[1],
                        nav.da[2]);
            }
        }));
        return rows;
    }

    private static Speed pair(String path, int rounds, boolean gated, Runnable library, Runnable baseline) {
        // warm-up: enough calls for both to reach the optimizing compiler
        long until = System.nanoTime() + 400_000_000L;
        while (System.nanoTime() < until) {
            library.run();
            baseline.run();
        }
        double[] ratios = new double[rounds];
        for (int r = 0; r < rounds; r++) {
            // alternate which goes first, so a slow moment of a shared machine hits both evenly
            double a;
            double b;
            if (r % 2 == 0) {
                a = time(library);
                b = time(baseline);
            } else {
                b = time(baseline);
                a = time(library);
            }
            ratios[r] = a / b;
        }
        return new Speed(path, ratios, gated);
    }

    /** Best of 15 calls, in ns: the minimum is the least disturbed by other processes. */
    private static double time(Runnable r) {
        long best = Long.MAX_VALUE;
        for (int k = 0; k < 15; k++) {
            long t0 = System.nanoTime();
            r.run();
            best = Math.min(best, System.nanoTime() - t0);
        }
        return best;
    }

    /**
     * Formats the allocation rows as a table.
     *
     * @param rows the rows
     * @return printable text
     */
    public static String format(List<Allocation> rows) {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%-62s %12s %12s %10s%n",
                "allocation (" + STATES + " states per call)", "bytes/call", "bytes/state", "verdict"));
        for (Allocation a : rows) {
            b.append(String.format(Locale.ROOT, "%-62s %12d %12.4f %10s%n", a.path(), a.bytesPerCall(),
                    a.bytesPerState(), a.allowanceBytes() < 0 ? "info" : a.passed() ? "ok" : "FAIL"));
        }
        return b.toString();
    }

    /**
     * Formats the speed rows as a table.
     *
     * @param rows the rows
     * @return printable text
     */
    public static String formatSpeeds(List<Speed> rows) {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%-62s %12s %10s  %s%n",
                "speed, library / hand-written primitives", "median", "verdict", "rounds"));
        for (Speed s : rows) {
            StringBuilder r = new StringBuilder();
            for (double x : s.ratios()) {
                r.append(String.format(Locale.ROOT, " %.2f", x));
            }
            b.append(String.format(Locale.ROOT, "%-62s %11.2fx %10s %s%n", s.path(), s.median(),
                    !s.gated() ? "info" : s.passed() ? "ok" : "FAIL", r));
        }
        return b.toString();
    }

    /**
     * Runs both checks and prints the tables; exits with status 1 if a check fails.
     *
     * @param args optional: number of speed rounds (default 7)
     */
    public static void main(String[] args) {
        int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 7;
        if (rounds < 1) {
            throw new IllegalArgumentException("rounds must be >= 1, got " + rounds);
        }
        List<Allocation> alloc = allocations();
        System.out.print(format(alloc));
        List<Speed> speed = speeds(rounds);
        System.out.print(formatSpeeds(speed));
        boolean ok = alloc.stream().allMatch(Allocation::passed) && speed.stream().allMatch(Speed::passed);
        System.out.println(ok ? "hot-path gate: passed" : "hot-path gate: FAILED");
        if (!ok) {
            System.exit(1);
        }
    }
}
