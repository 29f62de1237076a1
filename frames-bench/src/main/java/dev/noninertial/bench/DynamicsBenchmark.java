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

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.frames.dynamics.TrajectorySolver;

/**
 * A point mass under constant gravity integrated in a frame that spins up about the vertical
 * (Euler, Coriolis and centrifugal terms all present), with the solver's default Dormand-Prince
 * 8(5,3) scheme and tolerances: one integrator step (a span short enough to be taken in one step)
 * and a whole 100 s trajectory. Both baselines use the same Hipparchus integrator with the same
 * tolerances ({@link DynamicsBaselines}), so the ratios measure what the library adds around it.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class DynamicsBenchmark {

    TrajectorySolver solver = DynamicsBaselines.solver();
    PointState start = DynamicsBaselines.start();

    /** @return library, one step */
    @Benchmark
    public Trajectory stepLibrary() {
        return solver.solve(start, 0.0, DynamicsBaselines.ONE_STEP);
    }

    /** @return baseline (a), one step, equations on Vector3D objects */
    @Benchmark
    public double[] stepObjects() {
        return DynamicsBaselines.integrate(false, DynamicsBaselines.ONE_STEP);
    }

    /** @return baseline (b), one step, equations on primitives */
    @Benchmark
    public double[] stepPrimitives() {
        return DynamicsBaselines.integrate(true, DynamicsBaselines.ONE_STEP);
    }

    /** @return library, 100 s trajectory */
    @Benchmark
    public Trajectory trajectoryLibrary() {
        return solver.solve(start, 0.0, DynamicsBaselines.SPAN);
    }

    /** @return baseline (a), 100 s, equations on Vector3D objects */
    @Benchmark
    public double[] trajectoryObjects() {
        return DynamicsBaselines.integrate(false, DynamicsBaselines.SPAN);
    }

    /** @return baseline (b), 100 s, equations on primitives */
    @Benchmark
    public double[] trajectoryPrimitives() {
        return DynamicsBaselines.integrate(true, DynamicsBaselines.SPAN);
    }
}
