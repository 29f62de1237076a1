package dev.noninertial.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Smoke test of the worked scenarios, with two figures checked against outside formulas.
 */
class ScenarioRunnerTest {

    // WGS84 rotation rate, semi-major axis and first eccentricity squared, NIMA TR8350.2 (2000),
    // Tables 3.1 and 3.3
    // sources: REFERENCES.md, Earth models
    static final double W = 7.292115e-5;
    static final double A = 6378137.0;
    static final double E2 = 6.69437999014e-3;

    @Test
    void printsTheCautionFirstAndWritesOneCsvPerTable(@TempDir Path dir) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ScenarioRunner.run(new PrintStream(bytes, true, StandardCharsets.UTF_8), dir);
        String text = bytes.toString(StandardCharsets.UTF_8);
        assertTrue(text.startsWith("CAUTION: results are for simulation and analysis only"), text);
        for (String id : List.of("site-rotation", "ship-crane", "long-range")) {
            Path csv = dir.resolve(id + ".csv");
            assertTrue(Files.exists(csv), id);
            assertTrue(Files.readAllLines(csv).size() > 2, "rows in " + id);
        }
        // units in the headers (the site table carries them in its own unit column)
        assertTrue(Files.readAllLines(dir.resolve("ship-crane.csv")).get(0).startsWith("t [s],"));
        assertTrue(Files.readAllLines(dir.resolve("long-range.csv")).get(0).startsWith("azimuth [deg],"));
        assertTrue(Files.readAllLines(dir.resolve("site-rotation.csv")).get(0).endsWith(",unit"));
        String svg = Files.readString(dir.resolve("ship-crane.svg"));
        assertTrue(svg.startsWith("<") && svg.contains("<svg") && svg.contains("Euler"), "ship-crane.svg is an SVG chart");
    }

    @Test
    void northboundCrossRangeDeflectionMatchesFirstOrderCoriolis() {
        ScenarioTable t = LongRangeScenario.run(new DemoSetting());
        Object[] north = t.rows().get(0);
        double time = (Double) north[1];
        double cross = (Double) north[5];
        double lat = DemoSetting.KELVARO_POINT.latitude();
        double vh = 800.0 * Math.cos(Math.toRadians(45.0));
        double vz = 800.0 * Math.sin(Math.toRadians(45.0));
        // flat-Earth first order in w (derivation as in Taylor, Classical Mechanics, sec. 9.9):
        // the vertical Earth-rate part pushes right by w sin(lat) vh T^2, the north part pushes the
        // rising and falling body west by (1/3) w cos(lat) vz T^2 in all (left for a northbound shot)
        // sources: REFERENCES.md, Analytic results of mechanics
        double expected = W * Math.sin(lat) * vh * time * time - W * Math.cos(lat) * vz * time * time / 3.0;
        System.out.printf("MEASURED northbound cross-range deflection %.2f m, flat-Earth first order %.2f m,"
                + " relative difference %.2e%n", cross, expected, (cross - expected) / expected);
        // 2 %: curvature and gravity change over the 65 km range (range / R ~ 1 %) are neglected
        assertEquals(expected, cross, 0.02 * expected);
    }

    @Test
    void gravityPassedByMistakeDriftsByTheDoubleCountedCentrifugalTerm() {
        ScenarioTable t = SiteRotationScenario.run(new DemoSetting());
        Object[] wrong = t.rows().get(t.rows().size() - 1);
        double north = (Double) wrong[2];
        double lat = DemoSetting.KELVARO_POINT.latitude();
        double h = DemoSetting.KELVARO_POINT.height();
        // distance from the axis (N + h) cos(lat), N = a / sqrt(1 - e^2 sin^2 lat) (TR8350.2 Eq. 4-15);
        // horizontal part of the extra centrifugal term w^2 (N + h) cos(lat) sin(lat), toward the equator
        // sources: REFERENCES.md, Earth models
        double n = A / Math.sqrt(1 - E2 * Math.sin(lat) * Math.sin(lat));
        double south = W * W * (n + h) * Math.cos(lat) * Math.sin(lat);
        double expected = -0.5 * south * 60.0 * 60.0;
        System.out.printf("MEASURED gravity passed by mistake at the site: north drift after 60 s %.4f m,"
                + " formula %.4f m%n", north, expected);
        // 1 %: the Coriolis term on the acquired velocity bends the path by a relative amount ~ w t = 4e-3
        assertEquals(expected, north, 0.01 * Math.abs(expected));
    }
}
