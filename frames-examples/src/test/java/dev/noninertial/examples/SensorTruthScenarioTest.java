package dev.noninertial.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sensor scenario's centrifuge rows against the textbook uniform-circular-motion result
 * (centripetal acceleration w^2 r, any mechanics textbook; REFERENCES.md, Analytic results of
 * mechanics), and its cautions.
 */
class SensorTruthScenarioTest {

    @Test
    void centrifugeHoldReadsTheCentripetalAccelerationAndTheCautionsArePrinted(@TempDir Path dir) throws Exception {
        List<ScenarioTable> tables = SensorTruthScenario.run(new DemoSetting());
        assertEquals(2, tables.size());
        Path csv = tables.get(1).writeCsv(dir);
        // row at t = 60 s (hold at 21 rpm): columns t, arm rate, f out, f along, f up, |f|, gyro z
        String row = Files.readAllLines(csv).stream().filter(l -> l.startsWith("60")).findFirst().orElseThrow();
        String[] f = row.split(",");
        double w = 21.0 * 2 * Math.PI / 60.0;
        // -w^2 r at r = 7.5 m; 0.02 m/s^2 allows the Earth's terms (rate 7.3e-5 rad/s coupling with w,
        // the site's own centripetal 0.018 m/s^2 horizontal) and the 4 printed decimals
        assertEquals(-w * w * 7.5, Double.parseDouble(f[2]), 0.02, row);
        assertEquals(0.0, Double.parseDouble(f[3]), 1e-4, row);
        // gyro: arm rate plus the Earth rate's vertical part w_E sin(57.62 deg) = 3.5e-3 deg/s
        assertEquals(Math.toDegrees(w) + 0.0035, Double.parseDouble(f[6]), 0.002, row);
        String text = tables.get(1).toText() + tables.get(0).toText();
        assertTrue(text.contains("licensed practice") && text.contains("lifting procedures"), text);
    }
}
