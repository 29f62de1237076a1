package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;

/**
 * Frames and values are safe to share: across threads (results identical to a single-threaded
 * run, bit for bit, since the computation is deterministic and nothing is mutable) and across
 * machines (Java serialization round trip gives equal values and bit-identical conversions).
 */
class SharingTest {

    @SuppressWarnings("unchecked")
    private static <T> T roundTrip(T value) throws IOException, ClassNotFoundException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(value);
        }
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            return (T) in.readObject();
        }
    }

    private static ReferenceFrame everyMotionKind() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        return lab.attach("fixed", Motions.stationary(new Vector3D(1, 2, 3), Orientations.fromYawPitchRoll(0.1, 0.2, 0.3)))
                .attach("spin", Motions.spinUp(Vector3D.PLUS_K, 0.1, 0.5, 0.05))
                .attach("rock", Motions.oscillation(Vector3D.PLUS_I, 0.2, 0.8, 0.1)
                        .then(Motions.heave(Vector3D.PLUS_K, 1.5, 0.6, 0.2)))
                .attach("drift", Motions.translation(Vector3D.PLUS_J, Vector3D.MINUS_I)
                        .then(Motions.spin(Vector3D.PLUS_J, 0, 0.1)))
                .attach("user", (Motion & Serializable) t -> Placement.identity());
    }

    @Test
    void valuesAndFramesSurviveSerialization() throws Exception {
        Random rng = new Random(3L);
        PointState s = RandomFrames.state(rng);
        assertEquals(s, roundTrip(s));
        Placement p = Placement.of(Vector3D.PLUS_I, Vector3D.PLUS_J, Vector3D.PLUS_K,
                Orientations.fromYawPitchRoll(1, 0.5, -0.25), Vector3D.MINUS_I, Vector3D.MINUS_K);
        assertEquals(p, roundTrip(p));
        FictitiousAccelerations f = p.fictitious(s);
        assertEquals(f, roundTrip(f));

        ReferenceFrame leaf = everyMotionKind();
        ReferenceFrame copy = roundTrip(leaf);
        assertEquals(leaf.path(), copy.path());
        for (double t = -5; t <= 5; t += 0.5) {
            // deterministic arithmetic on the same inputs: bit-identical
            assertEquals(leaf.placementIn(leaf.root(), t), copy.placementIn(copy.root(), t));
        }
        FramedState framed = leaf.stateAt(2.0, s);
        FramedState framedCopy = roundTrip(framed);
        assertEquals(framed.state(), framedCopy.state());
        assertEquals(framed.in(leaf.root()).state(), framedCopy.in(framedCopy.frame().root()).state());
    }

    @Test
    void sharedFramesGiveIdenticalResultsOnManyThreads() throws Exception {
        ReferenceFrame leaf = everyMotionKind();
        ReferenceFrame root = leaf.root();
        int n = 2000;
        List<PointState> expected = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            expected.add(leaf.stateAt(0.01 * i, PointState.stationary(new Vector3D(i, 0, 1))).in(root).state());
        }
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            List<Future<Boolean>> results = new ArrayList<>();
            for (int worker = 0; worker < 8; worker++) {
                int offset = worker;
                results.add(pool.submit(() -> {
                    boolean same = true;
                    for (int k = 0; k < n; k++) {
                        int i = (k * 7 + offset * 13) % n; // each worker walks a different order
                        PointState got = leaf.stateAt(0.01 * i, PointState.stationary(new Vector3D(i, 0, 1))).in(root)
                                .state();
                        same &= got.equals(expected.get(i));
                    }
                    return same;
                }));
            }
            for (Future<Boolean> r : results) {
                assertTrue(r.get());
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
