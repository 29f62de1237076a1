package dev.noninertial.geodesy;

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
import java.nio.ByteBuffer;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;

import dev.noninertial.frames.ReferenceFrame;

/**
 * Issue 15, class 1, geodesy: a stream with one defining constant patched is refused with
 * {@link InvalidObjectException} (Java Object Serialization Specification, section 3.7). The
 * patch replaces the eight big-endian bytes of a double (section 6.4: primitive values are
 * written as by {@code DataOutput}). Check values: WGS84 a = 6378137 m, 1/f = 298.257223563,
 * GM = 3.986004418e14 m^3/s^2 (REFERENCES.md, Earth models).
 */
class GeodesyStreamTest {

    // The stream helpers below repeat frames-core's test class dev.noninertial.frames.StreamPatch on
    // purpose: the frames-core jar is sealed, so that class cannot be loaded from the core test jar
    // in this module (tried: "sealing violation: package dev.noninertial.frames is sealed").
    private static byte[] bytes(Object value) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ObjectOutputStream o = new ObjectOutputStream(out)) {
            o.writeObject(value);
        }
        return out.toByteArray();
    }

    private static Object read(byte[] b) throws IOException, ClassNotFoundException {
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(b))) {
            return in.readObject();
        }
    }

    /** Replaces occurrence {@code which} of the double {@code from}. */
    private static byte[] patch(byte[] stream, double from, double to, int which) {
        byte[] f = ByteBuffer.allocate(8).putDouble(from).array();
        byte[] t = ByteBuffer.allocate(8).putDouble(to).array();
        byte[] out = stream.clone();
        int seen = 0;
        for (int i = 0; i + 8 <= out.length; i++) {
            boolean match = true;
            for (int k = 0; k < 8 && match; k++) {
                match = out[i + k] == f[k];
            }
            if (match && seen++ == which) {
                System.arraycopy(t, 0, out, i, 8);
                return out;
            }
        }
        throw new IllegalStateException(from + " occurs " + seen + " times");
    }

    @Test
    void anEllipsoidWithANegativeAxisIsRefused() throws IOException {
        byte[] bad = patch(bytes(Ellipsoid.WGS84), 6378137.0, -6378137.0, 0);
        assertThrows(InvalidObjectException.class, () -> read(bad));
    }

    @Test
    void anEllipsoidWithFlattening09IsRefused() throws IOException {
        byte[] bad = patch(bytes(Ellipsoid.WGS84), 1.0 / 298.257223563, 0.9, 0);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> read(bad));
        assertTrue(e.getMessage().contains("flattening"), e.getMessage());
    }

    @Test
    void aSurveyFilterWithANegativeSigmaIsRefused() throws Exception {
        SurveyFilter filter = SurveyFilter.ofSigma(12.5);
        assertEquals(filter, read(bytes(filter)));
        byte[] bad = patch(bytes(filter), 12.5, -12.5, 0);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> read(bad));
        assertTrue(e.getMessage().contains("sigma"), e.getMessage());
    }

    @Test
    void aSoundingWithANegativeSquaredSpeedIsRefused() throws Exception {
        dev.noninertial.geodesy.air.SoundingAtmosphere air = dev.noninertial.geodesy.air.SoundingAtmosphere.of(
                new double[] {0.0, 1000.0}, new double[] {1.2, 1.1}, new double[] {340.0, 336.0});
        assertEquals(air.density(400.0), ((dev.noninertial.geodesy.air.Atmosphere) read(bytes(air))).density(400.0), 0.0);
        byte[] bad = patch(bytes(air), 336.0 * 336.0, -336.0 * 336.0, 0);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> read(bad));
        assertTrue(e.getMessage().contains("squaredSpeeds[1]"), e.getMessage());
        byte[] unordered = patch(bytes(air), 1000.0, -1.0, 0);
        assertThrows(InvalidObjectException.class, () -> read(unordered));
    }

    @Test
    void anEarthModelWithNegativeGmIsRefused() throws IOException {
        byte[] bad = patch(bytes(EarthModel.WGS84), 3.986004418e14, -3.986004418e14, 0);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> read(bad));
        assertTrue(e.getMessage().contains("gm"), e.getMessage());
    }

    @Test
    void earthFramesWhoseAngleDisagreesWithTheirFrameAreRefused() throws IOException {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-03-20T12:00:00Z"));
        // the angle is stored twice: as the field and inside the Earth-fixed spin; change the first
        byte[] bad = patch(bytes(earth), earth.angleAtEpoch(), earth.angleAtEpoch() + 0.1, 0);
        InvalidObjectException e = assertThrows(InvalidObjectException.class, () -> read(bad));
        assertTrue(e.getMessage().contains("angleAtEpoch"), e.getMessage());
    }

    @Test
    void aGeodeticCovarianceWithANegativeVarianceIsRefused() throws IOException {
        GeodeticUncertainty u = GeodeticUncertainty.of(Ellipsoid.WGS84, LatLonHeight.ofDegrees(10, 20, 30),
                org.hipparchus.linear.MatrixUtils.createRealDiagonalMatrix(new double[] {1e-12, 2e-12, 4.25}));
        byte[] bad = patch(bytes(u), 4.25, -4.25, 0);
        assertThrows(InvalidObjectException.class, () -> read(bad));
    }

    @Test
    void earthFramesAndTheirLocalFramesKeepOneTreeAfterTransport() throws Exception {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-03-20T12:00:00Z"));
        ReferenceFrame site = earth.localLevel(LatLonHeight.ofDegrees(47.5, 8.2, 420.0), LocalAxes.ENU);
        List<?> back = (List<?>) read(bytes(List.of(earth, site)));
        EarthFrames e2 = (EarthFrames) back.get(0);
        ReferenceFrame s2 = (ReferenceFrame) back.get(1);
        assertSame(e2.earthFixed(), s2.parent().orElseThrow());
        assertEquals(site.placementIn(earth.inertial(), 100.0), s2.placementIn(e2.inertial(), 100.0));
        assertEquals(EarthModel.WGS84.normalGravity(LatLonHeight.ofDegrees(47.5, 8.2, 420.0)),
                e2.model().normalGravity(LatLonHeight.ofDegrees(47.5, 8.2, 420.0)), 0.0);
    }
}
