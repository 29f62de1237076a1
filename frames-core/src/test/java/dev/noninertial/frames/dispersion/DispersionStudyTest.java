package dev.noninertial.frames.dispersion;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

/** Reproducibility, partition invariance, serialization, CSV and refusal of bad input. */
class DispersionStudyTest {

    /** A nonlinear model, so that any change of the drawn inputs shows in the outcomes. */
    private static DispersionStudy study(int cases) {
        DispersionModel model = c -> {
            double v = c.value("speed");
            double angle = Math.toRadians(c.value("angle"));
            double range = v * v * Math.sin(2 * angle) / 9.80665;
            return new double[] {range * Math.cos(c.value("bearing")), range * Math.sin(c.value("bearing")),
                Math.exp(c.value("drift") / 10)};
        };
        return DispersionStudy.of(model, "east_m", "north_m", "factor")
                .withInput("speed", InputDistribution.normal(100.0, 2.0))
                .withInput("angle", InputDistribution.truncatedNormal(45.0, 3.0, 40.0, 60.0))
                .withInput("bearing", InputDistribution.uniform(-0.1, 0.1))
                .withInput("drift", InputDistribution.normal(0.0, 1.0))
                .withCases(cases).withSeed(0xC0FFEEL);
    }

    @Test
    void anyThreadCountGivesTheSameTableBitForBit() {
        // Physical invariant of the design: a case depends only on (master seed, index).
        DispersionStudy s = study(3001);   // not a multiple of the block size
        DispersionResult one = s.run(1);
        for (int threads : new int[] {2, 3, 7, Runtime.getRuntime().availableProcessors()}) {
            assertEquals(one, s.run(threads), threads + " threads");
        }
        assertEquals(one, s.run());
        // and any case re-run alone equals its row
        for (int i : new int[] {0, 1, 31, 32, 1500, 3000}) {
            double[] alone = s.runCase(i);
            double[] row = one.outcome(i);
            for (int k = 0; k < row.length; k++) {
                assertEquals(Double.doubleToRawLongBits(row[k]), Double.doubleToRawLongBits(alone[k]));
            }
            assertArrayEquals(one.row(i), s.tableRow(i), 0.0);
        }
    }

    @Test
    void casesDoNotDependOnTheCaseCountAndAppendingAnInputKeepsEarlierDraws() {
        DispersionResult small = study(100).run(2);
        DispersionResult large = study(1000).run(2);
        for (int i = 0; i < 100; i++) {
            assertArrayEquals(small.row(i), large.row(i), 0.0);
        }
        DispersionStudy more = study(100).withInput("extra", InputDistribution.uniform(0, 1));
        for (int i = 0; i < 100; i++) {
            assertArrayEquals(study(100).drawCase(i).values(),
                    java.util.Arrays.copyOf(more.drawCase(i).values(), 4), 0.0);
        }
        // another seed gives other draws
        assertNotEquals(study(100).withSeed(1L).run(1), small);
    }

    @Test
    void aSerializedStudyRunsToTheSameTable() throws Exception {
        DispersionStudy s = study(500);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(s);
        }
        DispersionStudy copy;
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            copy = (DispersionStudy) in.readObject();
        }
        assertEquals(s.run(2), copy.run(2));
    }

    @Test
    void csvHoldsEveryValueExactly() {
        DispersionResult r = study(50).run(1);
        StringWriter text = new StringWriter();
        r.writeCsv(text);
        String[] lines = text.toString().split("\n");
        assertEquals("case,speed,angle,bearing,drift,east_m,north_m,factor", lines[0]);
        assertEquals(51, lines.length);
        for (int i = 0; i < 50; i++) {
            String[] cells = lines[i + 1].split(",");
            assertEquals(String.valueOf(i), cells[0]);
            double[] row = r.row(i);
            for (int c = 0; c < row.length; c++) {
                // Double.toString / parseDouble round trip is exact (Java SE specification).
                assertEquals(Double.doubleToRawLongBits(row[c]), Double.doubleToRawLongBits(Double.parseDouble(cells[c + 1])));
            }
        }
    }

    @Test
    void refusesBadInputAndNamesIt() {
        DispersionModel m = c -> new double[] {c.value(0)};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DispersionStudy.of(m, "x").withCases(0));
        assertTrue(e.getMessage().contains("count") && e.getMessage().contains("got 0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> DispersionStudy.of(m));
        assertThrows(IllegalArgumentException.class, () -> DispersionStudy.of(m, "x", "x"));
        assertThrows(IllegalArgumentException.class, () -> DispersionStudy.of(m, "a,b"));
        assertThrows(IllegalArgumentException.class,
                () -> DispersionStudy.of(m, "x").withInput("x", InputDistribution.uniform(0, 1)));
        assertThrows(IllegalStateException.class, () -> DispersionStudy.of(m, "x").run());
        assertThrows(IllegalArgumentException.class, () -> InputDistribution.normal(0, 0));
        assertThrows(IllegalArgumentException.class, () -> InputDistribution.normal(Double.NaN, 1));
        assertThrows(IllegalArgumentException.class, () -> InputDistribution.uniform(1, 1));
        assertThrows(IllegalArgumentException.class, () -> InputDistribution.truncatedNormal(0, 1, 40, 41));
        DispersionStudy ok = DispersionStudy.of(m, "x").withInput("u", InputDistribution.uniform(0, 1)).withCases(10);
        assertThrows(IllegalArgumentException.class, () -> ok.run(0));
        assertThrows(IllegalArgumentException.class, () -> ok.runCase(10));
        assertThrows(IllegalArgumentException.class, () -> ok.run(1).ellipse("x", "x", 0.5));
        assertThrows(IllegalArgumentException.class, () -> ok.run(1).percentile("x", 101));
        assertThrows(IllegalArgumentException.class, () -> ConfidenceEllipse.mahalanobisRadius(1.0));
        // a model returning NaN or the wrong length is refused, naming the case
        DispersionStudy nan = ok.withModel(c -> new double[] {c.index() == 7 ? Double.NaN : 1.0});
        IllegalStateException bad = assertThrows(IllegalStateException.class, () -> nan.run(2));
        assertTrue(bad.getMessage().contains("case 7") && bad.getMessage().contains("'x'"), bad.getMessage());
        DispersionStudy wrong = ok.withModel(c -> new double[] {1.0, 2.0});
        assertThrows(IllegalStateException.class, () -> wrong.run(1));
        // a table beyond one Java array is refused before any case runs: 1e8 cases x 23 columns (22 inputs, 1 outcome)
        DispersionStudy huge = ok.withCases(DispersionStudy.MAX_CASES);
        for (int i = 0; i < 21; i++) {
            huge = huge.withInput("u" + i, InputDistribution.uniform(0, 1));
        }
        DispersionStudy tooLarge = huge;
        IllegalStateException big = assertThrows(IllegalStateException.class, () -> tooLarge.run(1));
        assertTrue(big.getMessage().contains("2300000000"), big.getMessage());
    }
}
