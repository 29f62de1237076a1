package dev.noninertial.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Ideal sensor readings and increments in bulk ({@link SensorScenario}: IMU on a lever arm of a
 * rolling hull in the Earth tree, {@value SensorScenario#COUNT} samples per call) against the
 * hand-written placement in the root plus gravitation, in the same run.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SensorBenchmark {

    SensorScenario scenario = new SensorScenario();

    /** @return library, bulk readings */
    @Benchmark
    public double[] readingsLibrary() {
        scenario.readings();
        return scenario.out;
    }

    /** @return baseline (b), placement in the root plus gravitation by hand */
    @Benchmark
    public double[] readingsPrimitives() {
        scenario.baseline();
        return scenario.out;
    }

    /** @return library, increments on the 100 Hz grid */
    @Benchmark
    public double[] incrementsLibrary() {
        scenario.increments(SensorScenario.COUNT);
        return scenario.out;
    }
}
