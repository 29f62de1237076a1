package dev.noninertial.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
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
import dev.noninertial.geodesy.air.AirDrag;

/**
 * Air drag: one evaluation of {@link AirDrag} in a site frame on the spinning Earth, and one
 * integrator step with gravitation and drag, each beside the hand-written primitive code of
 * {@link AirBaselines} on the same inputs.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class AirBenchmark {

    AirDrag drag = AirBaselines.libraryDrag();
    TrajectorySolver solver = AirBaselines.librarySolver();
    PointState start = AirBaselines.start();
    double[] out = new double[9];
    double time = 12.5;

    /** @return library drag */
    @Benchmark
    public Vector3D dragLibrary() {
        return drag.at(time, start);
    }

    /** @return baseline (b), drag on primitives */
    @Benchmark
    public double[] dragPrimitives() {
        AirBaselines.drag(250.0, -400.0, 1200.0, 120.0, 130.0, 25.0, out);
        return out;
    }

    /** @return library, one step with gravitation and drag */
    @Benchmark
    public Trajectory stepLibrary() {
        return solver.solve(start, 0.0, AirBaselines.ONE_STEP);
    }

    /** @return baseline (b), one step with gravitation and drag */
    @Benchmark
    public double[] stepPrimitives() {
        return AirBaselines.integrate(AirBaselines.ONE_STEP);
    }
}
