package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;

/** Reading motion logs: the shipped example, and refusals naming the line. */
class MotionLogFileTest {

    private static final String EXAMPLE = "larkspur-gull-trial.csv";

    private static SampledMotion example() throws IOException {
        try (Reader in = new InputStreamReader(MotionLogFileTest.class.getResourceAsStream(EXAMPLE),
                StandardCharsets.UTF_8)) {
            return SampledMotion.readCsv(in, EXAMPLE);
        }
    }

    @Test
    void exampleLogReadsWithItsRowsAndUnits() throws IOException {
        SampledMotion m = example();
        assertEquals(601, m.sampleCount());
        assertEquals(0.0, m.startTime(), 0.0);
        assertEquals(60.0, m.endTime(), 1e-12);
        assertTrue(m.hasMeasuredAngularVelocities());
        // row "0.1, 120.1915, -34.8393, 0.0338, 40.041885, 0.597121, 0.362100, ..." of the file
        Placement p = m.at(0.1);
        assertEquals(0, p.origin().distance(new Vector3D(120.1915, -34.8393, 0.0338)), 1e-12);
        double[] ypr = Orientations.toYawPitchRoll(p.orientation());
        assertEquals(40.041885, Math.toDegrees(ypr[0]), 1e-9);
        assertEquals(0.597121, Math.toDegrees(ypr[1]), 1e-9);
        assertEquals(0.362100, Math.toDegrees(ypr[2]), 1e-9);
        // measured body rates 3.608796, 1.260331, 0.410808 deg/s are the first derivatives at samples
        assertEquals(0, p.angularVelocity().distance(new Vector3D(3.608796, 1.260331, 0.410808)
                .scalarMultiply(Math.PI / 180)), 1e-12);
    }

    @Test
    void exampleRatesAgreeWithThoseDerivedFromAttitudesAlone() throws IOException {
        // The file's body rates follow the z-y-x Euler-rate relation (REFERENCES.md, Attitude
        // kinematics, where it is derived rather than quoted). Dropping the rate columns, the rates derived from
        // the yaw-pitch-roll samples must agree: this ties the library's "w in F axes" convention to
        // the aerospace body rates. Tolerance: 10 Hz interpolation of a 0.8 rad/s roll (h^4 error
        // ~ 1e-5 rad/s) plus the 1e-6 deg rounding of the angles divided by h (~ 2e-7 rad/s).
        String text = new String(MotionLogFileTest.class.getResourceAsStream(EXAMPLE).readAllBytes(),
                StandardCharsets.UTF_8);
        StringBuilder posesOnly = new StringBuilder();
        for (String line : text.split("\n")) {
            if (line.startsWith("#")) {
                continue;
            }
            String[] f = line.split(",");
            posesOnly.append(String.join(",", java.util.Arrays.copyOf(f, 7))).append('\n');
        }
        SampledMotion derived = SampledMotion.readCsv(new StringReader(posesOnly.toString()), "poses");
        SampledMotion measured = example();
        assertTrue(!derived.hasMeasuredAngularVelocities());
        for (double t = 0.05; t < 60; t += 0.731) {
            Vector3D a = derived.at(t).angularVelocity();
            Vector3D b = measured.at(t).angularVelocity();
            assertEquals(0, a.distance(b), 2e-5, "t = " + t);
        }
    }

    @Test
    void fileFromDiskReadsLikeTheResource(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("trial.csv");
        Files.copy(MotionLogFileTest.class.getResourceAsStream(EXAMPLE), file);
        assertEquals(example(), SampledMotion.readCsv(file));
    }

    private static String refusal(String text) {
        return assertThrows(IllegalArgumentException.class,
                () -> SampledMotion.readCsv(new StringReader(text), "log.csv")).getMessage();
    }

    private static final String HEADER = "# comment\n\nt[s], x[m], y[m], z[m], q0[1], q1[1], q2[1], q3[1]\n";

    @Test
    void unitsAreConvertedToSi() throws IOException {
        String text = "t[ms], x[km], y[m], z[m], yaw[deg], pitch[rad], roll[deg], vx[kn], vy[km/h], vz[m/s]\n"
                + "0, 1, 0, 0, 90, 0, 0, 1, 3.6, 0\n"
                + "1000, 1, 0, 0, 90, 0, 0, 1, 3.6, 0\n";
        SampledMotion m = SampledMotion.readCsv(new StringReader(text), "units");
        assertEquals(1.0, m.endTime(), 0.0);
        // at a sample the measured velocity is the first derivative (the rows need not be consistent)
        Placement p = m.at(1.0);
        assertEquals(1000.0, p.origin().getX(), 1e-12);
        // 1 kn = 1852 m / 3600 s (REFERENCES.md, Units: the international nautical mile, exact)
        assertEquals(1852.0 / 3600.0, p.originVelocity().getX(), 1e-15);
        assertEquals(1.0, p.originVelocity().getY(), 1e-15);
        assertEquals(Math.toRadians(90), Orientations.toYawPitchRoll(p.orientation())[0], 1e-15);
    }

    @Test
    void headerProblemsAreRefusedWithTheLine() {
        String m = refusal("# a\nt[s], x[ft], y[m], z[m], q0[1], q1[1], q2[1], q3[1]\n0,0,0,0,1,0,0,0\n");
        assertTrue(m.contains("log.csv line 2") && m.contains("'ft'") && m.contains("allowed: m, km"), m);
        m = refusal("t[s], x[m], y[m], z[m], depth[m], q0[1], q1[1], q2[1], q3[1]\n");
        assertTrue(m.contains("line 1") && m.contains("unknown column 'depth'"), m);
        m = refusal("t[s], x[m], y[m], q0[1], q1[1], q2[1], q3[1]\n");
        assertTrue(m.contains("missing position column(s) z"), m);
        m = refusal("t[s], x[m], y[m], z[m]\n");
        assertTrue(m.contains("exactly one of") && m.contains("neither"), m);
        m = refusal("t[s], x[m], y[m], z[m], yaw[deg], pitch[deg], roll[deg], q0[1], q1[1], q2[1], q3[1]\n");
        assertTrue(m.contains("both"), m);
        m = refusal("t, x[m], y[m], z[m], q0[1], q1[1], q2[1], q3[1]\n");
        assertTrue(m.contains("name[unit]"), m);
        m = refusal("t[s], t[s], x[m], y[m], z[m], q0[1], q1[1], q2[1], q3[1]\n");
        assertTrue(m.contains("twice"), m);
        m = refusal("# only comments\n");
        assertTrue(m.contains("no header"), m);
        m = refusal(HEADER + "0,0,0,0,1,0,0,0\n");
        assertTrue(m.contains("at least 2 sample rows"), m);
    }

    @Test
    void rowProblemsAreRefusedWithTheLine() {
        String ok = "0, 0, 0, 0, 1, 0, 0, 0\n";
        String m = refusal(HEADER + ok + "1, 0, 0, 0, 1, 0, 0\n");
        assertTrue(m.contains("log.csv line 5") && m.contains("expected 8"), m);
        m = refusal(HEADER + ok + "1, 0, 0, 0, 1, 0, 0, 0, 7\n");
        assertTrue(m.contains("line 5") && m.contains("got more"), m);
        m = refusal(HEADER + ok + "1, 0, 0x1, 0, 1, 0, 0, 0\n");
        assertTrue(m.contains("line 5, column y") && m.contains("'0x1' is not a decimal number"), m);
        m = refusal(HEADER + ok + "1, 0, NaN, 0, 1, 0, 0, 0\n");
        assertTrue(m.contains("line 5, column y"), m);
        m = refusal(HEADER + ok + "1, 0, 1e999, 0, 1, 0, 0, 0\n");
        assertTrue(m.contains("line 5, column y") && m.contains("overflows the double range"), m);
        m = refusal(HEADER + ok + "1, 0, , 0, 1, 0, 0, 0\n");
        assertTrue(m.contains("line 5, column y"), m);
        m = refusal(HEADER + ok + "# note\n0, 0, 0, 0, 1, 0, 0, 0\n");
        assertTrue(m.contains("log.csv line 6") && m.contains("log.csv line 4") && m.contains("increase strictly"), m);
        m = refusal(HEADER + ok + "1, 0, 0, 0, 1.1, 0, 0, 0\n");
        assertTrue(m.contains("log.csv line 5") && m.contains("norm"), m);
    }
}
