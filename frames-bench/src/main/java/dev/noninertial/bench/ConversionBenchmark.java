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

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;

/**
 * One full state (position, velocity, acceleration) through one placement, both ways, and the
 * fictitious accelerations of a state: library object API against baselines (a) and (b).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ConversionBenchmark {

    // non-final fields so that the JIT cannot fold the inputs into constants
    Placement placement = Scenario.placement();
    PointState state = Scenario.state();
    ObjectBaseline.Pose pose = ObjectBaseline.scenarioPose();
    Vector3D r = Scenario.POSITION;
    Vector3D v = Scenario.VELOCITY;
    Vector3D a = Scenario.ACCELERATION;
    double[] p = PrimitiveBaseline.scenarioPlacement();
    double[] s = PrimitiveBaseline.scenarioState();
    double[] out = new double[12];

    /** @return library, frame to base */
    @Benchmark
    public PointState toBaseLibrary() {
        return placement.toBase(state);
    }

    /** @return baseline (a), frame to base */
    @Benchmark
    public ObjectBaseline.Kinematics toBaseObjects() {
        return ObjectBaseline.toBase(pose, r, v, a);
    }

    /** @return baseline (b), frame to base (the output array) */
    @Benchmark
    public double[] toBasePrimitives() {
        PrimitiveBaseline.toBase(p, s, 0, out, 0);
        return out;
    }

    /** @return library, base to frame */
    @Benchmark
    public PointState fromBaseLibrary() {
        return placement.fromBase(state);
    }

    /** @return baseline (a), base to frame */
    @Benchmark
    public ObjectBaseline.Kinematics fromBaseObjects() {
        return ObjectBaseline.fromBase(pose, r, v, a);
    }

    /** @return baseline (b), base to frame (the output array) */
    @Benchmark
    public double[] fromBasePrimitives() {
        PrimitiveBaseline.fromBase(p, s, 0, out, 0);
        return out;
    }

    /** @return library, fictitious accelerations */
    @Benchmark
    public FictitiousAccelerations fictitiousLibrary() {
        return placement.fictitious(state);
    }

    /** @return baseline (a), fictitious accelerations */
    @Benchmark
    public ObjectBaseline.Inertial fictitiousObjects() {
        return ObjectBaseline.fictitious(pose, r, v);
    }

    /** @return baseline (b), fictitious accelerations (the output array) */
    @Benchmark
    public double[] fictitiousPrimitives() {
        PrimitiveBaseline.fictitious(p, s, out);
        return out;
    }
}
