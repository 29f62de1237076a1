package dev.noninertial.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;

/**
 * Placement of the innermost frame of a chain in the root, through 1, 3 or 6 links with
 * time-varying motions (spin, heave, roll, spin-up, polynomial translation, pitch); the time
 * advances by 1 ms per call so that every call evaluates every motion afresh.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ChainBenchmark {

    /** Number of links between the innermost frame and the root. */
    @Param({"1", "3", "6"})
    public int depth;

    ReferenceFrame root;
    ReferenceFrame[] singles;
    ReferenceFrame leaf;
    double t;
    double[] scratch = new double[PrimitiveBaseline.P];
    double[] out = new double[PrimitiveBaseline.P];

    /** Builds the chain. */
    @Setup
    public void build() {
        ReferenceFrame[] frames = Scenario.chain(depth);
        root = frames[0];
        leaf = frames[depth];
        Motion[] links = Scenario.chainMotions();
        singles = new ReferenceFrame[depth];
        for (int i = 0; i < depth; i++) {
            singles[i] = root.attach("single" + i, links[i]);
        }
        t = 0.0;
    }

    /** Advances time by 1 ms, wrapping at 100 s so that angles stay in the fast range of sin and cos. */
    static double next(double time) {
        double n = time + 1e-3;
        return n > 100.0 ? 0.0 : n;
    }

    /** @return library: placement of the leaf in the root */
    @Benchmark
    public Placement library() {
        t = next(t);
        return leaf.placementIn(root, t);
    }

    /** @return baseline (a): the same chain composed with Hipparchus objects */
    @Benchmark
    public ObjectBaseline.Pose objects() {
        t = next(t);
        return ObjectBaseline.chain(depth, t);
    }

    /** @return baseline (b): the same chain composed on primitives (the output array) */
    @Benchmark
    public double[] primitives() {
        t = next(t);
        PrimitiveBaseline.chain(depth, t, scratch, out);
        return out;
    }

    /**
     * Each of the same {@code depth} link motions as a frame attached directly to the root, placed
     * with {@link ReferenceFrame#placementIn(ReferenceFrame, double)} one after the other: the
     * cost of the links as single links, without composing them. Divided by {@code depth}, it is
     * the mean cost of one single link of this chain.
     *
     * @return a sum of components, so that nothing is optimized away
     */
    @Benchmark
    public double eachLinkAlone() {
        t = next(t);
        double sum = 0;
        for (int i = 0; i < depth; i++) {
            sum += singles[i].placementIn(root, t).origin().getX();
        }
        return sum;
    }
}
