package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.RotationOrder;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.motion.SampledMotion;
import dev.noninertial.frames.uncertainty.PlacementUncertainty;
import dev.noninertial.frames.uncertainty.UncertainState;

/**
 * Issue 15, class 1: every serializable type re-runs its factory checks on reading. Each hostile
 * stream is a good object's stream with one value patched; the check is that reading refuses it
 * with {@link InvalidObjectException} (Java Object Serialization Specification, section 3.7:
 * {@code readObject} and {@code readResolve} validate and throw that exception).
 */
class HostileStreamTest {

    private static final Rotation TURN = new Rotation(RotationOrder.ZYX, RotationConvention.FRAME_TRANSFORM,
            0.3, -0.2, 0.7);

    @Test
    void aNonOrthogonalPlacementIsRefused() {
        Placement p = Placement.stationary(new Vector3D(1, 2, 3), TURN);
        double r00 = p.orientationMatrix()[0][0];
        byte[] bad = StreamPatch.replaceDouble(StreamPatch.bytes(p), r00, 1.5 * r00);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> StreamPatch.read(bad));
        assertTrue(e.getMessage().contains("rotation"), e.getMessage());
    }

    @Test
    void aReflectingPlacementIsRefused() {
        // negating one row of R keeps R R^T = I exactly but makes det R = -1: a mirror
        Placement p = Placement.stationary(new Vector3D(1, 2, 3), TURN);
        byte[] bad = StreamPatch.bytes(p);
        for (double r : p.orientationMatrix()[2]) {
            bad = StreamPatch.replaceDouble(bad, r, -r);
        }
        byte[] mirror = bad;
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> StreamPatch.read(mirror));
        assertTrue(e.getMessage().contains("determinant"), e.getMessage());
    }

    @Test
    void anIncrementLogWhoseEndsGoBackIsRefused() throws Exception {
        dev.noninertial.frames.sensing.IncrementLog log = dev.noninertial.frames.sensing.IncrementLog.of(0.0,
                new double[] {0.25, 0.5}, new double[6], new double[] {0, 0, 1.5e-3, 0, 0, 1.5e-3});
        Object back = StreamPatch.roundTrip(log);
        assertTrue(back.toString().contains("2 intervals"), back.toString());
        byte[] bad = StreamPatch.replaceDouble(StreamPatch.bytes(log), 0.5, 0.125);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> StreamPatch.read(bad));
        assertTrue(e.getMessage().contains("after the interval's start"), e.getMessage());
    }

    @Test
    void aNonFinitePointStateIsRefused() {
        PointState s = PointState.of(new Vector3D(1.25, 2, 3), new Vector3D(4, 5, 6), Vector3D.ZERO);
        byte[] bad = StreamPatch.replaceDouble(StreamPatch.bytes(s), 1.25, Double.NaN);
        assertThrows(InvalidObjectException.class, () -> StreamPatch.read(bad));
    }

    @Test
    void aFrameWhoseParentIsItselfIsRefused() throws Exception {
        ReferenceFrame root = ReferenceFrame.inertialRoot("root");
        ReferenceFrame child = root.attach("child", Motions.stationary(new Vector3D(1, 0, 0)));
        // proxy-class trick: while writing the child, every later object that stands for a frame
        // (the frame itself or its serialized form) is replaced by the first one written, so the
        // child's parent in the stream is the child itself
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes) {
            private Object first;

            {
                enableReplaceObject(true);
            }

            @Override
            protected Object replaceObject(Object obj) {
                boolean frameLike = obj instanceof ReferenceFrame
                        || obj.getClass().getNestHost() == ReferenceFrame.class;
                if (!frameLike) {
                    return obj;
                }
                if (first == null) {
                    first = obj;
                    return obj;
                }
                return first;
            }
        }) {
            out.writeObject(child);
        }
        // today's code would give a frame whose root() never returns: read in a thread we can abandon
        Object[] result = new Object[1];
        Thread reader = new Thread(() -> {
            try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
                Object f = in.readObject();
                result[0] = f;
                ((ReferenceFrame) f).root();
            } catch (Exception e) {
                result[0] = e;
            }
        });
        reader.setDaemon(true);
        reader.start();
        reader.join(5_000);
        assertTrue(result[0] instanceof InvalidObjectException, "expected a refusal, got " + result[0]);
    }

    @Test
    void framesSharedInAStreamStaySharedAndKeepTheirTree() throws Exception {
        ReferenceFrame root = ReferenceFrame.inertialRoot("root");
        ReferenceFrame a = root.attach("a", Motions.spin(Vector3D.PLUS_K, 0.1, 0.2));
        ReferenceFrame b = a.attach("b", Motions.stationary(new Vector3D(1, 0, 0)));
        ReferenceFrame c = b.attach("c", Motions.stationary(new Vector3D(0, 1, 0)));
        @SuppressWarnings("unchecked")
        List<ReferenceFrame> back = (List<ReferenceFrame>) StreamPatch.roundTrip(List.of(c, a, root, b));
        assertSame(back.get(2), back.get(0).root());
        assertSame(back.get(1), back.get(3).parent().orElseThrow());
        assertSame(back.get(3), back.get(0).parent().orElseThrow());
        assertEquals("root/a/b/c", back.get(0).path());
        // the same placement bits after transport: the motions are values
        assertEquals(c.placementIn(root, 2.5), back.get(0).placementIn(back.get(2), 2.5));
    }

    @Test
    void aSampledMotionKeepsTheQuaternionsItValidated() throws Exception {
        // q and -q are the same attitude; the factories sign-align consecutive quaternions, so a
        // stream that flips one must be read back aligned (else the interpolation takes the long way)
        double h = Math.sin(0.05);
        double c = Math.cos(0.05);
        SampledMotion m = SampledMotion.fromArrays(new double[] {0, 1, 2},
                new double[] {0, 0, 0, 1, 0, 0, 2, 0, 0},
                new double[] {1, 0, 0, 0, c, 0, 0, h, Math.cos(0.1), 0, 0, Math.sin(0.1)});
        byte[] flipped = StreamPatch.replaceDouble(StreamPatch.bytes(m), c, -c);
        flipped = StreamPatch.replaceDouble(flipped, h, -h);
        SampledMotion back = (SampledMotion) StreamPatch.read(flipped);
        for (double t : new double[] {0.5, 1.0, 1.5}) {
            // re-normalising a unit quaternion changes at most its last bits: 1e-15 rad
            double d = Rotation.distance(m.at(t).orientation(), back.at(t).orientation());
            assertTrue(d < 1e-15, "t = " + t + ": attitude differs by " + d + " rad");
            assertEquals(m.at(t).angularVelocity().getZ(), back.at(t).angularVelocity().getZ(), 1e-12);
        }
    }

    @Test
    void aSampledMotionWithTimesOutOfOrderIsRefused() {
        SampledMotion m = SampledMotion.fromArrays(new double[] {0, 1.5},
                new double[] {0, 0, 0, 1, 0, 0}, new double[] {1, 0, 0, 0, 1, 0, 0, 0});
        byte[] bad = StreamPatch.replaceDouble(StreamPatch.bytes(m), 1.5, -1.5);
        assertThrows(InvalidObjectException.class, () -> StreamPatch.read(bad));
    }

    @Test
    void aNegativeVarianceIsRefused() {
        ReferenceFrame root = ReferenceFrame.inertialRoot("root");
        UncertainState u = UncertainState.of(root.stateAt(0, PointState.stationary(new Vector3D(1, 2, 3))),
                MatrixUtils.createRealDiagonalMatrix(new double[] {0.0123, 1, 1, 1, 1, 1}));
        byte[] bad = StreamPatch.replaceDouble(StreamPatch.bytes(u), 0.0123, -0.0123);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> StreamPatch.read(bad));
        assertTrue(e.getMessage().contains("variance"), e.getMessage());
    }

    @Test
    void aNegativePlacementVarianceIsRefused() {
        PlacementUncertainty u = PlacementUncertainty.ofSigmas(0.1, 0.2);
        byte[] bad = StreamPatch.replaceDouble(StreamPatch.bytes(u), 0.1 * 0.1, -0.01, 0);
        assertThrows(InvalidObjectException.class, () -> StreamPatch.read(bad));
    }

    @Test
    void aSpinWithANonUnitAxisIsRefused() {
        Motion spin = Motions.spin(new Vector3D(0.6, 0, 0.8), 0.25, 1.0);
        byte[] bad = StreamPatch.replaceDouble(StreamPatch.bytes(spin), 0.6, 6.0);
        assertThrows(InvalidObjectException.class, () -> StreamPatch.read(bad));
    }

    @Test
    void aRoundTripKeepsEveryValue() throws IOException, ClassNotFoundException {
        Placement p = Placement.of(new Vector3D(1, 2, 3), new Vector3D(0.1, 0, 0), Vector3D.ZERO, TURN,
                new Vector3D(0, 0, 0.3), Vector3D.ZERO);
        assertEquals(p, StreamPatch.roundTrip(p));
        PointState s = PointState.of(new Vector3D(1, 2, 3), new Vector3D(4, 5, 6), new Vector3D(7, 8, 9));
        assertEquals(s, StreamPatch.roundTrip(s));
    }
}
