package dev.noninertial.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import dev.noninertial.geodesy.navigation.NavigationState;

/**
 * One strapdown step of {@code LevelNavigator} (primitive and object forms) against the
 * hand-written step of {@link NavigationBaseline}, and a bulk run of one hour at 100 Hz
 * (360,000 steps), on the at-rest increments of {@link NavigationScenario}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class NavigationBenchmark {

    NavigationScenario scenario = new NavigationScenario();
    double[] work;
    double[] baseline;
    double time;
    double baselineTime;
    NavigationState state;
    Vector3D dv = new Vector3D(scenario.dv);
    Vector3D da = new Vector3D(scenario.da);
    double[][] hour = scenario.run(360_000);

    /** Fresh states for each iteration. */
    @Setup(Level.Iteration)
    public void reset() {
        work = scenario.navigator.newWork(scenario.start);
        baseline = scenario.baselineState();
        time = 0.0;
        baselineTime = 0.0;
        state = scenario.start;
    }

    /** @return library, one step on the work array (allocation-free) */
    @Benchmark
    public double[] stepLibrary() {
        time += NavigationScenario.STEP;
        scenario.navigator.advance(work, time, scenario.dv[0], scenario.dv[1], scenario.dv[2], scenario.da[0],
                scenario.da[1], scenario.da[2]);
        return work;
    }

    /** @return baseline (b), the hand-written step */
    @Benchmark
    public double[] stepPrimitives() {
        baselineTime += NavigationScenario.STEP;
        NavigationBaseline.step(baseline, baselineTime, scenario.dv[0], scenario.dv[1], scenario.dv[2],
                scenario.da[0], scenario.da[1], scenario.da[2]);
        return baseline;
    }

    /** @return library, one step with the object API (allocates the new state) */
    @Benchmark
    public NavigationState stepObjects() {
        state = scenario.navigator.advance(state, state.time() + NavigationScenario.STEP, dv, da);
        return state;
    }

    /** @return library, a bulk run of one hour at 100 Hz */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Warmup(iterations = 3)
    @Measurement(iterations = 5)
    public NavigationState hourAt100HzLibrary() {
        return scenario.navigator.run(scenario.start, hour[0], hour[1], hour[2]);
    }
}
