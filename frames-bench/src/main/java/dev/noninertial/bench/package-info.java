/**
 * JMH benchmarks of the library's hot paths, each measured in the same run and on the same inputs
 * as two hand-written baselines: {@link dev.noninertial.bench.ObjectBaseline} (the straightforward
 * code a user writes with Hipparchus {@code Vector3D} and {@code Rotation} objects) and
 * {@link dev.noninertial.bench.PrimitiveBaseline} (hand-inlined code on primitive doubles, the
 * practical limit). {@link dev.noninertial.bench.HotPathGate} is the quick allocation and speed
 * check that CI runs.
 *
 * <p>Run the full set with {@code java -jar frames-bench/target/benchmarks.jar -prof gc}.
 */
package dev.noninertial.bench;
