package dev.noninertial.bench;

import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;

/**
 * One million states converted per call, in primitive arrays (9 doubles per state): through one
 * placement, and through a spin-up motion with one time per state. Scores and
 * {@code gc.alloc.rate.norm} (with {@code -prof gc}) are per state
 * ({@link OperationsPerInvocation}).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx1g"})
public class BulkBenchmark {

    /** States per call. */
    public static final int N = 1_000_000;

    Placement placement = Scenario.placement();
    Motion spin = Scenario.spinUp();
    ObjectBaseline.Pose pose = ObjectBaseline.scenarioPose();
    double[] p = PrimitiveBaseline.scenarioPlacement();
    double[] times;
    double[] source;
    double[] target;

    /** Fills the inputs with invented states (fixed seed). */
    @Setup
    public void fill() {
        Random random = new Random(42L);
        times = new double[N];
        source = new double[N * PointState.COMPONENTS];
        target = new double[N * PointState.COMPONENTS];
        for (int k = 0; k < N; k++) {
            times[k] = 60.0 * k / N;
        }
        for (int i = 0; i < source.length; i++) {
            source[i] = 200 * random.nextDouble() - 100;
        }
    }

    /** @return library, one placement, frame to base */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] placementToBaseLibrary() {
        placement.toBase(source, 0, target, 0, N);
        return target;
    }

    /** @return baseline (b), one placement, frame to base */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] placementToBasePrimitives() {
        PrimitiveBaseline.toBaseAll(p, source, target, N);
        return target;
    }

    /** @return baseline (a), one placement, frame to base, one set of objects per state */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] placementToBaseObjects() {
        for (int k = 0; k < N; k++) {
            int i = k * 9;
            ObjectBaseline.Kinematics s = ObjectBaseline.toBase(pose,
                    new Vector3D(source[i], source[i + 1], source[i + 2]),
                    new Vector3D(source[i + 3], source[i + 4], source[i + 5]),
                    new Vector3D(source[i + 6], source[i + 7], source[i + 8]));
            store(s, target, i);
        }
        return target;
    }

    /** @return library, one placement, base to frame */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] placementFromBaseLibrary() {
        placement.fromBase(source, 0, target, 0, N);
        return target;
    }

    /** @return baseline (b), one placement, base to frame */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] placementFromBasePrimitives() {
        PrimitiveBaseline.fromBaseAll(p, source, target, N);
        return target;
    }

    /** @return library, spin-up motion at one time per state, frame to base */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] motionToBaseLibrary() {
        spin.toBase(times, 0, source, 0, target, 0, N);
        return target;
    }

    /** @return library object API in a loop: one placement and two states per state */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] motionToBaseLibraryObjects() {
        for (int k = 0; k < N; k++) {
            int i = k * 9;
            spin.at(times[k]).toBase(PointState.fromArray(source, i)).toArray(target, i);
        }
        return target;
    }

    /** @return baseline (b), spin-up computed in locals per state, frame to base */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] motionToBasePrimitives() {
        PrimitiveBaseline.spinUpToBaseAll(times, source, target, N);
        return target;
    }

    /** @return baseline (a), spin-up with a Hipparchus rotation per state, frame to base */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] motionToBaseObjects() {
        Vector3D n = Scenario.SPIN_AXIS;
        Vector3D al = n.scalarMultiply(Scenario.SPIN_ACCELERATION);
        for (int k = 0; k < N; k++) {
            double t = times[k];
            double angle = Scenario.SPIN_ANGLE0 + t * (Scenario.SPIN_RATE0 + 0.5 * Scenario.SPIN_ACCELERATION * t);
            ObjectBaseline.Pose at = new ObjectBaseline.Pose(Vector3D.ZERO, Vector3D.ZERO, Vector3D.ZERO,
                    new Rotation(n, angle, RotationConvention.FRAME_TRANSFORM),
                    n.scalarMultiply(Scenario.SPIN_RATE0 + Scenario.SPIN_ACCELERATION * t), al);
            int i = k * 9;
            ObjectBaseline.Kinematics s = ObjectBaseline.toBase(at,
                    new Vector3D(source[i], source[i + 1], source[i + 2]),
                    new Vector3D(source[i + 3], source[i + 4], source[i + 5]),
                    new Vector3D(source[i + 6], source[i + 7], source[i + 8]));
            store(s, target, i);
        }
        return target;
    }

    private static void store(ObjectBaseline.Kinematics s, double[] target, int i) {
        target[i] = s.position().getX();
        target[i + 1] = s.position().getY();
        target[i + 2] = s.position().getZ();
        target[i + 3] = s.velocity().getX();
        target[i + 4] = s.velocity().getY();
        target[i + 5] = s.velocity().getZ();
        target[i + 6] = s.acceleration().getX();
        target[i + 7] = s.acceleration().getY();
        target[i + 8] = s.acceleration().getZ();
    }
}
