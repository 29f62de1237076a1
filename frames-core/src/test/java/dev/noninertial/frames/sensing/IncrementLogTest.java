package dev.noninertial.frames.sensing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.motion.Motions;

/**
 * Sensor increment logs: the increments of a sensor on an invented turntable against uniform
 * circular motion (textbook: a point at radius r on a table turning at w feels the specific force
 * w^2 r toward the axis, constant in the table's axes, and turns at w about the axis), written and
 * read back to the same doubles, unit conversions by their definitions, and refusals naming the
 * line.
 */
class IncrementLogTest {

    private static final double W = 2.0;     // rad/s, the table's rate
    private static final double R = 0.75;    // m, the sensor's radius

    private static IncrementLog turntable(int count, double interval) {
        ReferenceFrame hall = ReferenceFrame.inertialRoot("hall (invented)");
        ReferenceFrame table = hall.attach("table", Motions.spin(Vector3D.PLUS_K, 0.0, W));
        ReferenceFrame sensor = table.attach("sensor", Motions.stationary(new Vector3D(R, 0, 0)));
        IdealSensor imu = IdealSensor.of(sensor, SpecificForce.uniform(Vector3D.ZERO));
        double[] packed = new double[SensorIncrements.COMPONENTS * count];
        imu.incrementsOver(0.0, interval, count, packed, 0);
        return IncrementLog.ofUniform(0.0, interval, packed);
    }

    @Test
    void aTurntableSensorsIncrementsAreUniformCircularMotion(@TempDir Path folder) throws IOException {
        IncrementLog log = turntable(50, 0.01);
        assertEquals(50, log.size());
        assertEquals(0.5, log.end(), 1e-15);
        for (int i = 0; i < log.size(); i++) {
            SensorIncrements s = log.increment(i);
            // w^2 r toward the axis (-x in the sensor's axes) for dt, and w dt about z: 1e-12 covers the
            // quadrature's tolerance on values of 3e-2 and 2e-2
            assertEquals(-W * W * R * 0.01, s.deltaVelocity().getX(), 1e-12);
            assertEquals(0.0, s.deltaVelocity().getY(), 1e-12);
            assertEquals(W * 0.01, s.deltaAngle().getZ(), 1e-12);
            assertEquals(0.01 * i, s.start(), 1e-15);
        }
        Path file = folder.resolve("table-imu.csv");
        log.writeCsv(file);
        assertEquals(IncrementLog.HEADER, Files.readAllLines(file).get(2));
        IncrementLog back = IncrementLog.readCsv(file);
        // Double.toString reads back to the same doubles
        assertEquals(log.start(), back.start(), 0.0);
        assertArrayEquals(log.ends(), back.ends(), 0.0);
        assertArrayEquals(log.deltaVelocities(), back.deltaVelocities(), 0.0);
        assertArrayEquals(log.deltaAngles(), back.deltaAngles(), 0.0);
        StringWriter text = new StringWriter();
        log.writeCsv(text);
        assertTrue(text.toString().startsWith("# IncrementLog{50 intervals, [0, 0.5] s}\n"), text.toString());
    }

    @Test
    void theSensorsLogAndTheErrorModelsLogAreThePackedForms() {
        ReferenceFrame hall = ReferenceFrame.inertialRoot("hall (invented)");
        ReferenceFrame table = hall.attach("table", Motions.spin(Vector3D.PLUS_K, 0.0, W));
        ReferenceFrame sensor = table.attach("sensor", Motions.stationary(new Vector3D(R, 0, 0)));
        IdealSensor imu = IdealSensor.of(sensor, SpecificForce.uniform(Vector3D.ZERO));
        IncrementLog truth = imu.incrementsOver(0.0, 0.01, 40);
        // the same values as the packed form, bit for bit (one computation behind both)
        IncrementLog packed = turntable(40, 0.01);
        assertArrayEquals(packed.deltaVelocities(), truth.deltaVelocities(), 0.0);
        assertArrayEquals(packed.deltaAngles(), truth.deltaAngles(), 0.0);
        assertArrayEquals(packed.ends(), truth.ends(), 0.0);
        SensorImperfections errors = SensorImperfections.seeded(42L)
                .withBias(SensorImperfections.Triad.ACCELEROMETERS, new Vector3D(0.01, 0, 0))
                .withWhiteNoise(SensorImperfections.Triad.GYROS, new Vector3D(1e-4, 1e-4, 1e-4));
        IncrementLog measured = errors.applyTo(truth);
        double[] expected = truth.packed();
        errors.applyToIncrements(expected, 0, 0.01, 40, expected, 0);
        assertArrayEquals(expected, measured.packed(), 0.0);
        assertArrayEquals(truth.ends(), measured.ends(), 0.0);
        // a bias of 0.01 m/s^2 adds 0.01 dt to every delta-velocity x (the model's definition)
        assertEquals(truth.deltaVelocities()[0] + 0.01 * 0.01, measured.deltaVelocities()[0], 1e-15);
        IllegalArgumentException uneven = assertThrows(IllegalArgumentException.class,
                () -> errors.applyTo(IncrementLog.of(0.0, new double[] {0.01, 0.03}, new double[6], new double[6])));
        assertTrue(uneven.getMessage().contains("intervals of one length"), uneven.getMessage());
        assertThrows(IllegalArgumentException.class, () -> imu.incrementsOver(0.0, 0.01, 0));
    }

    @Test
    void unitsAreConvertedByTheirDefinitions() throws IOException {
        String text = "# a log in other units (invented)\n"
                + "start[ms], end[ms], dvx[ft/s], dvy[ft/s], dvz[ft/s], dax[deg], day[deg], daz[deg]\n"
                + "0, 10, 1, 0, -2, 0.5, 0, 0\n10, 20, 0, 3, 0, 0, 0, -1\n";
        IncrementLog log = IncrementLog.readCsv(new StringReader(text), "other-units.csv");
        // 1 ms = 1e-3 s, 1 ft = 0.3048 m and 1 deg = pi/180 rad, by definition (REFERENCES.md, Units); products rounded
        assertArrayEquals(new double[] {0.01, 0.02}, log.ends(), 1e-18);
        assertArrayEquals(new double[] {0.3048, 0, -0.6096, 0, 0.9144, 0}, log.deltaVelocities(), 1e-15);   // a few ulp
        assertArrayEquals(new double[] {Math.PI / 360, 0, 0, 0, 0, -Math.PI / 180}, log.deltaAngles(), 1e-18);
        assertEquals(0.0, log.increment(1).start() - 0.01, 1e-18);
    }

    @Test
    void badLogsAreRefusedNamingTheLine() {
        String head = IncrementLog.HEADER + "\n";
        assertRefused(head + "0, 0.01, 0, 0, 0, 0, 0, 0\n0.02, 0.03, 0, 0, 0, 0, 0, 0\n", "log.csv line 3",
                "previous interval's end");
        assertRefused(head + "0, 0.01, 0, 0, 0, 0, 0, 0\n0.01, 0.01, 0, 0, 0, 0, 0, 0\n", "log.csv line 3",
                "after the interval's start");
        assertRefused(head + "0, 0.01, 0, 0, 0, 0, 0\n", "log.csv line 2", "fields");
        assertRefused(head + "0, 0.01, 0, 0, x, 0, 0, 0\n", "log.csv line 2, column dvz", "not a decimal");
        assertRefused(head, "log.csv", "at least 1 interval");
        assertRefused("start[s],end[s],dvx[m/s],dvy[m/s],dvz[m/s],dax[rad],day[rad]\n0,1,0,0,0,0,0\n",
                "log.csv line 1", "missing increment column(s) daz");
        assertRefused("start[s],end[s],dvx[g],dvy[m/s],dvz[m/s],dax[rad],day[rad],daz[rad]\n", "log.csv line 1",
                "unit 'g' not allowed for column dvx");
        assertThrows(IllegalArgumentException.class, () -> IncrementLog.ofUniform(0.0, 0.01, new double[7]));
        assertThrows(IllegalArgumentException.class,
                () -> IncrementLog.of(0.0, new double[] {0.01, 0.005}, new double[6], new double[6]));
        assertThrows(IllegalArgumentException.class,
                () -> IncrementLog.of(0.0, new double[] {0.01}, new double[] {0, Double.NaN, 0}, new double[3]));
    }

    private static void assertRefused(String text, String where, String what) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> IncrementLog.readCsv(new StringReader(text), "log.csv"));
        assertTrue(e.getMessage().contains(where) && e.getMessage().contains(what), e.getMessage());
    }
}
