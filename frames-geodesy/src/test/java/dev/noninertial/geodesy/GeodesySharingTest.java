package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.frames.dynamics.TrajectoryEvent;
import dev.noninertial.frames.dynamics.TrajectorySample;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.frames.uncertainty.UncertainState;

/**
 * Earth models, Earth frames (with carried and body frames), trajectory results and uncertain
 * states survive Java serialization with bit-identical behaviour, and shared Earth frames give
 * identical results on many threads. Check: the deterministic computation itself (same inputs,
 * same bits) - a copy that differs in any bit has lost or altered state.
 */
class GeodesySharingTest {

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

    // invented survey launch
    private static final LatLonHeight START = LatLonHeight.ofDegrees(61.2, -4.7, 3.0);

    private static ReferenceFrame vesselBody(EarthFrames earth) {
        ReferenceFrame level = earth.carriedLevel("survey launch",
                GeodeticPath.steadyCourse(Ellipsoid.WGS84, START, new Vector3D(4.0, -2.5, 0), LocalAxes.NED),
                LocalAxes.NED);
        return earth.body("hull", level, AttitudeProfile.constantRates(AttitudeSample.stationary(0.3, 0.02, -0.05)
                .withRates(0.01, 0.0, 0.002)), LocalAxes.NED);
    }

    @Test
    void earthValuesAndFramesSurviveSerialization() throws Exception {
        assertEquals(START, roundTrip(START));
        assertEquals(Ellipsoid.GRS80, roundTrip(Ellipsoid.GRS80));
        assertEquals(EarthModel.WGS84, roundTrip(EarthModel.WGS84));
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-14T06:30:00Z"));
        ReferenceFrame hull = vesselBody(earth);
        ReferenceFrame copy = roundTrip(hull);
        assertEquals(hull.path(), copy.path());
        for (double t = 0; t <= 600; t += 37.5) {
            assertEquals(hull.placementIn(hull.root(), t), copy.placementIn(copy.root(), t));
        }
        EarthFrames earthCopy = roundTrip(earth);
        assertEquals(earth.rotationAngle(123.0), earthCopy.rotationAngle(123.0), 0.0);
    }

    @Test
    void trajectoryResultsAndUncertainStatesSurviveSerialization() throws Exception {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-14T06:30:00Z"));
        ReferenceFrame enu = earth.localLevel(START, LocalAxes.ENU);
        Trajectory tr = TrajectorySolver.of(enu).plusForce(earth.gravitationIn(enu))
                .plusEvent(TrajectoryEvent.groundImpact(Vector3D.PLUS_K, 0.0)).withMaxStep(2.0)
                .solve(PointState.of(Vector3D.ZERO, new Vector3D(20, 0, 40)), 0.0, 30.0);
        TrajectorySample sample = tr.sampleAt(3.0);
        TrajectorySample sampleCopy = roundTrip(sample);
        assertEquals(sample.state().state(), sampleCopy.state().state());
        assertEquals(sample.fictitious(), sampleCopy.fictitious());
        assertTrue(tr.stopEvent().isPresent());
        assertEquals(tr.stopEvent().get().state().state(), roundTrip(tr.stopEvent().get()).state().state());

        RealMatrix p = MatrixUtils.createRealDiagonalMatrix(new double[] {4, 4, 9, 0.1, 0.1, 0.2});
        UncertainState u = UncertainState.of(tr.at(3.0), p);
        UncertainState uCopy = roundTrip(u);
        assertEquals(u.mean().state(), uCopy.mean().state());
        assertEquals(u.covariance(), uCopy.covariance());
        // the copy converts through its own (deserialized) tree to the same bits
        assertEquals(u.in(enu.root()).covariance(), uCopy.in(uCopy.frame().root()).covariance());
    }

    @Test
    void sharedEarthFramesGiveIdenticalResultsOnManyThreads() throws Exception {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-14T06:30:00Z"));
        ReferenceFrame hull = vesselBody(earth);
        ReferenceFrame eci = earth.inertial();
        int n = 1500;
        List<FramedState> expected = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            expected.add(hull.stateAt(0.4 * i, PointState.stationary(new Vector3D(12, -3, -8))).in(eci));
        }
        ExecutorService pool = Executors.newFixedThreadPool(6);
        try {
            List<Future<Boolean>> results = new ArrayList<>();
            for (int w = 0; w < 6; w++) {
                int offset = w;
                results.add(pool.submit(() -> {
                    boolean same = true;
                    for (int k = 0; k < n; k++) {
                        int i = (k * 11 + offset * 101) % n; // 11 and 1500 share no factor: every index
                        same &= hull.stateAt(0.4 * i, PointState.stationary(new Vector3D(12, -3, -8))).in(eci)
                                .state().equals(expected.get(i).state());
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
