package dev.noninertial.geodesy.navigation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.sensing.IncrementLog;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * At rest (issue 13): a vehicle standing still for one hour at 100 Hz drifts by less than 1 mm.
 * Physical invariant (REFERENCES.md, "Inertial sensors and navigation"): at rest on the Earth the
 * accelerometers read minus normal gravity and the gyros the Earth rate, both resolved in body
 * axes, and the velocity equation's terms then cancel exactly (specific force + gravity = 0,
 * Coriolis and transport-rate terms 0, the body turns with the level frame).
 */
class AtRestTest {

    @Test
    void standingStillForOneHourDriftsLessThanOneMillimetre() {
        EarthModel model = EarthModel.WGS84;
        LatLonHeight site = LatLonHeight.ofDegrees(47.3, 8.6, 450.0);   // invented site
        Rotation attitude = Orientations.fromYawPitchRoll(1.1, 0.05, -0.03);
        for (LocalAxes axes : LocalAxes.values()) {
            Vector3D g = model.normalGravityIn(site, axes);
            Vector3D w = model.earthRateIn(site.latitude(), axes);
            Rotation r = axes == LocalAxes.NED ? attitude : enu(attitude);
            double h = 0.01;
            Vector3D dv = r.applyTo(g.negate()).scalarMultiply(h);   // f_b = -R g, constant
            Vector3D da = r.applyTo(w).scalarMultiply(h);             // w_ib^b = R w_ie^n, constant
            int n = 360_000;
            double[] ends = new double[n];
            double[] dvs = new double[3 * n];
            double[] das = new double[3 * n];
            for (int k = 0; k < n; k++) {
                ends[k] = (k + 1) * h;
                dvs[3 * k] = dv.getX();
                dvs[3 * k + 1] = dv.getY();
                dvs[3 * k + 2] = dv.getZ();
                das[3 * k] = da.getX();
                das[3 * k + 1] = da.getY();
                das[3 * k + 2] = da.getZ();
            }
            LevelNavigator nav = LevelNavigator.of(model, axes);
            NavigationState start = NavigationState.of(0.0, site, Vector3D.ZERO, axes, r);
            NavigationState end = nav.run(start, ends, dvs, das);
            double drift = Truth.ecef(end.position()).distance(Truth.ecef(site));
            double turn = Rotation.distance(end.attitude(), r);
            System.out.printf(Locale.ROOT, "at rest %s, 1 h at 100 Hz: drift %.3e m, speed %.3e m/s, attitude %.3e rad%n",
                    axes, drift, end.velocity().getNorm(), turn);
            assertTrue(drift < 1e-3, "drift " + drift + " m");            // bar of issue 13
            // the cancellation is exact up to rounding (1e-16 per step over 3.6e5 steps, growing
            // with the vertical channel's instability): 1e-9 rad is far above that, far below any term
            assertTrue(turn < 1e-9, "attitude " + turn + " rad");
        }
    }

    @Test
    void aLoggedStandstillReadBackFromItsFileStaysPut(@TempDir Path folder) throws IOException {
        EarthModel model = EarthModel.WGS84;
        LatLonHeight site = LatLonHeight.ofDegrees(47.3, 8.6, 450.0);   // invented site
        Rotation r = Orientations.fromYawPitchRoll(1.1, 0.05, -0.03);
        Vector3D dv = r.applyTo(model.normalGravityIn(site, LocalAxes.NED).negate()).scalarMultiply(0.01);
        Vector3D da = r.applyTo(model.earthRateIn(site.latitude(), LocalAxes.NED)).scalarMultiply(0.01);
        int n = 60_000;   // 10 min at 100 Hz
        double[] packed = new double[6 * n];
        for (int k = 0; k < n; k++) {
            double[] one = {dv.getX(), dv.getY(), dv.getZ(), da.getX(), da.getY(), da.getZ()};
            System.arraycopy(one, 0, packed, 6 * k, 6);
        }
        IncrementLog written = IncrementLog.ofUniform(100.0, 0.01, packed);
        Path file = folder.resolve("standstill-imu.csv");
        written.writeCsv(file);
        IncrementLog log = IncrementLog.readCsv(file);
        LevelNavigator nav = LevelNavigator.of(model, LocalAxes.NED);
        NavigationState start = NavigationState.of(100.0, site, Vector3D.ZERO, LocalAxes.NED, r);
        NavigationState end = nav.run(start, log);
        // the physical invariant of the test above: at rest the terms cancel; the same bar, 1 mm
        double drift = Truth.ecef(end.position()).distance(Truth.ecef(site));
        assertTrue(drift < 1e-3, "drift " + drift + " m");
        // the file holds the same doubles: the same run as from the arrays, bit for bit
        NavigationState fromArrays = nav.run(start, written.ends(), written.deltaVelocities(), written.deltaAngles());
        assertEquals(fromArrays.position(), end.position());
        assertEquals(fromArrays.velocity(), end.velocity());
        IllegalArgumentException late = assertThrows(IllegalArgumentException.class,
                () -> nav.run(NavigationState.of(101.0, site, Vector3D.ZERO, LocalAxes.NED, r), log));
        assertTrue(late.getMessage().contains("increments start at 100.0 s, the state is at 101.0 s"), late.getMessage());
    }

    /** The same body attitude over ENU axes: R_enu = R_ned M, M mapping ENU to NED components. */
    static Rotation enu(Rotation ned) {
        double[][] a = Orientations.toMatrix(ned);
        double[][] m = {{0, 1, 0}, {1, 0, 0}, {0, 0, -1}};
        double[][] p = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                for (int k = 0; k < 3; k++) {
                    p[i][j] += a[i][k] * m[k][j];
                }
            }
        }
        return Orientations.fromMatrix(p);
    }
}
