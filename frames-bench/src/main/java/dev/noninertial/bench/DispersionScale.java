package dev.noninertial.bench;

import java.lang.management.ManagementFactory;
import java.util.Locale;

import com.sun.management.OperatingSystemMXBean;

import dev.noninertial.examples.AirdropStudy;
import dev.noninertial.frames.dispersion.DispersionResult;
import dev.noninertial.frames.dispersion.DispersionStudy;

/**
 * Cost and scaling of the airdrop dispersion study (trajectories of about 100 s with drag and
 * Earth rotation): the local runner on 1 and on all threads, against the hand-written primitive
 * integration of the same equations ({@link AirdropBaseline}) on one thread. Prints wall time,
 * process CPU time and cost per trajectory, the machine's load average before and after, and the
 * largest difference between the library's and the baseline's landing points.
 *
 * <p>Usage: {@code java -cp frames-bench/target/benchmarks.jar dev.noninertial.bench.DispersionScale [cases]}
 * (default 20000). Wall times on a shared machine depend on the other load; CPU time per
 * trajectory is the steadier figure. The Spark figures come from
 * {@code dev.noninertial.spark.AirdropCommand --spark --check} in frames-spark.
 */
public final class DispersionScale {

    private DispersionScale() {
    }

    private static final OperatingSystemMXBean OS =
            (OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();

    /**
     * Entry point.
     *
     * @param args optional number of cases
     */
    public static void main(String[] args) {
        int cases = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
        int cores = Runtime.getRuntime().availableProcessors();
        System.out.printf(Locale.ROOT, "airdrop study, %d cases, %d cores, load average %.2f, %s%n", cases, cores,
                OS.getSystemLoadAverage(), java.time.Instant.now());
        DispersionStudy warm = AirdropStudy.study(Math.min(2000, cases), 1L);
        warm.run();
        AirdropBaseline baseline = new AirdropBaseline();
        for (int i = 0; i < warm.cases(); i++) {
            baseline.descent(warm.drawCase(i));
        }
        DispersionStudy study = AirdropStudy.study(cases, 20261202L);
        DispersionResult one = measure("local runner, 1 thread", cases, () -> study.run(1));
        DispersionResult all = measure("local runner, " + cores + " threads", cases, () -> study.run(cores));
        double[] worst = new double[1];
        measure("hand-written primitive baseline, 1 thread", cases, () -> {
            for (int i = 0; i < cases; i++) {
                double[] b = baseline.descent(study.drawCase(i));
                double[] o = one.outcome(i);
                worst[0] = Math.max(worst[0], Math.hypot(b[0] - o[0], b[1] - o[1]));
            }
            return null;
        });
        System.out.printf(Locale.ROOT, "1 thread and %d threads identical bit for bit: %s%n", cores,
                one.equals(all) ? "yes" : "NO");
        System.out.printf(Locale.ROOT, "largest landing-point difference library vs baseline: %.3g m%n", worst[0]);
        System.out.printf(Locale.ROOT, "load average after: %.2f%n", OS.getSystemLoadAverage());
    }

    private interface Run<T> {
        T run();
    }

    private static <T> T measure(String what, int cases, Run<T> run) {
        long cpu0 = OS.getProcessCpuTime();
        long t0 = System.nanoTime();
        T result = run.run();
        double wall = (System.nanoTime() - t0) * 1e-9;
        double cpu = (OS.getProcessCpuTime() - cpu0) * 1e-9;
        System.out.printf(Locale.ROOT, "%-44s wall %7.2f s, CPU %7.2f s, %.3f ms CPU per trajectory, "
                + "%.3f ms wall per trajectory%n", what, wall, cpu, 1e3 * cpu / cases, 1e3 * wall / cases);
        return result;
    }
}
