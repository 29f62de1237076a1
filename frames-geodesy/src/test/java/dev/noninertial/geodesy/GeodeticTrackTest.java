package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.frames.sensing.InertialReading;
import dev.noninertial.frames.units.Units;

/**
 * Logged geodetic tracks: textbook navigation terms along a logged parallel, the survey line's
 * Eotvos correction against the gravimetry rule of thumb, finite differences of the carried body
 * frame, and refusals naming the file and line. The logs are invented (demo data).
 */
class GeodeticTrackTest {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-01T06:00:00Z"));
    /** WGS84, REFERENCES.md, Earth models. */
    private static final double A = 6378137.0;
    private static final double E2 = 6.69437999014e-3;
    private static final double W = 7.292115e-5;

    /** An invented survey vessel going due east at 10 kn along 60 N, logged at 1 Hz. */
    private static String eastboundLog(int seconds, boolean heave) {
        double v = Units.knots(10.0);
        double rn = A / Math.sqrt(1 - E2 * 0.75);     // sin^2(60 deg) = 0.75
        double lonRate = v / (rn * 0.5);              // cos(60 deg) = 0.5, h = 0
        StringBuilder b = new StringBuilder("# survey vessel Brannoch Wake, line 7 (invented)\n");
        b.append("t[s], lat[deg], lon[deg], h[m]\n");
        for (int k = 0; k <= seconds; k++) {
            double h = heave ? 0.8 * Math.sin(0.6 * k) : 0.0;
            b.append(String.format(Locale.ROOT, "%d, 60.0, %.15f, %.12f%n", k, 4.0 + Math.toDegrees(lonRate * k), h));
        }
        return b.toString();
    }

    @Test
    void aLoggedParallelGivesTheTextbookTermsAndTheEotvosRuleOfThumb() throws IOException {
        GeodeticTrack track = GeodeticTrack.readCsv(new StringReader(eastboundLog(120, false)), "line7.csv", 2.0);
        ReferenceFrame ned = EARTH.carriedLevel("vessel", track, LocalAxes.NED);
        InertialReading r = IdealSensor.of(ned, EARTH.gravitationIn(ned)).readingAt(61.5);
        // w_ie + w_en in NED (REFERENCES.md, Inertial navigation), h = 0, vN = 0
        double lat = Math.toRadians(60.0);
        double v = Units.knots(10.0);
        double rn = A / Math.sqrt(1 - E2 * 0.75);
        Vector3D w = new Vector3D(W * Math.cos(lat) + v / rn, 0, -W * Math.sin(lat) - v * Math.tan(lat) / rn);
        // a linear longitude is reproduced exactly by the quartic stencils: only rounding of the
        // logged decimals (15 digits of degrees, ~1e-17 rad) and of the interpolant remains; 1e-9
        // relative covers the rounding of lon ~ 0.07 rad differentiated over 1 s samples
        assertTrue(r.angularRate().subtract(w).getNorm() <= 1e-9 * w.getNorm(), r + " vs " + w);
        List<SurveyPoint> line = track.surveyAtSamples(EARTH);
        assertEquals(121, line.size());
        double rule = 7.503 * 10.0 * Math.cos(lat) + 0.004154 * 100.0;   // common practice, REFERENCES.md, Gravimetry
        for (SurveyPoint p : line) {
            // the requirement: within 0.01 mGal of the rule of thumb
            assertEquals(rule, Units.toMilligals(p.eotvosCorrection()), 0.01, p.toString());
            // the ideal gravimeter reads normal gravity lowered by the Eotvos effect (h = 0: Somigliana);
            // 1e-9 m/s^2: interpolation of the rates and rounding
            assertEquals(p.normalGravity() - p.eotvosCorrection(), p.gravimeterReading(), 1e-9, p.toString());
            assertEquals(0.0, p.verticalAcceleration(), 1e-9);
        }
    }

    @Test
    void theSurveyCsvHoldsTheRuleOfThumbAndReadsBackToTheSameNumbers(@TempDir Path folder) throws IOException {
        GeodeticTrack track = GeodeticTrack.readCsv(new StringReader(eastboundLog(30, false)), "line7.csv", 2.0);
        Path file = folder.resolve("line7-survey.csv");
        track.writeSurveyCsv(EARTH, file);
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        assertTrue(lines.get(0).startsWith("# survey of GeodeticTrack{31 samples"), lines.get(0));
        assertTrue(lines.get(1).contains("not for primary navigation"), lines.get(1));
        assertEquals(GeodeticTrack.SURVEY_HEADER, lines.get(2));
        assertEquals(3 + 31, lines.size());
        List<SurveyPoint> points = track.surveyAtSamples(EARTH);
        double rule = 7.503 * 10.0 * Math.cos(Math.toRadians(60.0)) + 0.004154 * 100.0;   // common practice, REFERENCES.md
        for (int i = 0; i < points.size(); i++) {
            String[] cells = lines.get(3 + i).split(",");
            assertEquals(8, cells.length, lines.get(3 + i));
            SurveyPoint p = points.get(i);
            // Double.toString reads back to the same double: exact
            assertEquals(p.time(), Double.parseDouble(cells[0]), 0.0);
            assertEquals(Math.toDegrees(p.position().latitude()), Double.parseDouble(cells[1]), 0.0);
            assertEquals(Math.toDegrees(p.position().longitude()), Double.parseDouble(cells[2]), 0.0);
            assertEquals(p.position().height(), Double.parseDouble(cells[3]), 0.0);
            assertEquals(p.gravimeterReading(), Double.parseDouble(cells[6]), 0.0);
            assertEquals(p.normalGravity(), Double.parseDouble(cells[7]), 0.0);
            // the corrections in mGal: the rule of thumb for 10 kn due east at 60 N within 0.01 mGal, no heave
            assertEquals(rule, Double.parseDouble(cells[4]), 0.01, lines.get(3 + i));
            assertEquals(0.0, Double.parseDouble(cells[5]), 1e-4, lines.get(3 + i));
            // latitude as logged: 60 deg to the rounding of the degree-radian round trip
            assertEquals(60.0, Double.parseDouble(cells[1]), 1e-12);
        }
    }

    @Test
    void heaveAddsTheVerticalAccelerationToTheReading() throws IOException {
        GeodeticTrack track = GeodeticTrack.readCsv(new StringReader(eastboundLog(60, true)), "line8.csv", 2.0);
        for (double t : new double[] {5.5, 17.25, 40.0}) {
            SurveyPoint p = track.surveyAt(EARTH, t);
            // physical invariant (first order): reading = normal gravity - Eotvos + d2h/dt2 (f = a - g); the
            // terms left out (normal gravity series at |h| < 1 m, vertical velocity cross terms)
            // are below 1e-7 m/s^2 (0.01 mGal)
            assertEquals(p.normalGravity() - p.eotvosCorrection() + p.verticalAcceleration(), p.gravimeterReading(),
                    1e-7, p.toString());
            // the interpolated heave acceleration follows -0.8 * 0.36 sin(0.6 t): quintic Hermite on
            // 1 s samples, error ~h^3 w^5 A ~ 0.05 m/s^2 at most; 10 % of the amplitude 0.288 m/s^2
            assertEquals(-0.288 * Math.sin(0.6 * t), p.verticalAcceleration(), 0.03, "t " + t);
        }
    }

    @Test
    void theFreeAirAnomalyOfTheIdealReadingIsZeroAndTheClassicGradientHolds() throws IOException {
        GeodeticTrack track = GeodeticTrack.readCsv(new StringReader(eastboundLog(60, true)), "line8.csv", 2.0);
        for (double t : new double[] {5.5, 17.25, 40.0}) {
            SurveyPoint p = track.surveyAt(EARTH, t);
            // the ideal gravimeter: zero to first order, 1e-7 m/s^2 (0.01 mGal) as in the test above
            assertEquals(0.0, p.freeAirAnomaly(p.gravimeterReading()), 1e-7, p.toString());
            // a reading 5 mGal above the ideal one is a 5 mGal anomaly (linear in the reading)
            assertEquals(5.0, Units.toMilligals(p.freeAirAnomaly(p.gravimeterReading() + Units.milligals(5.0))), 0.01);
        }
        // the height term of normal gravity is the free-air correction: for a station at h = 100 m the
        // anomaly of the same reading rises by 0.3086 mGal/m x 100 m (common practice) relative to h = 0;
        // the latitude dependence of the gradient and its h^2 term change it by 0.2 mGal at most
        SurveyPoint low = new SurveyPoint(0.0, LatLonHeight.ofDegrees(60.0, 4.0, 0.0), 0.0, 0.0, 9.8, 0.0);
        double g0 = EARTH.model().normalGravity(LatLonHeight.ofDegrees(60.0, 4.0, 0.0));
        double g100 = EARTH.model().normalGravity(LatLonHeight.ofDegrees(60.0, 4.0, 100.0));
        double rise = Units.toMilligals(new SurveyPoint(0.0, LatLonHeight.ofDegrees(60.0, 4.0, 100.0), 0.0, 0.0, 9.8,
                g100).freeAirAnomaly(9.8) - new SurveyPoint(0.0, low.position(), 0.0, 0.0, 9.8, g0).freeAirAnomaly(9.8));
        assertEquals(30.86, rise, 0.2);
        assertThrows(IllegalArgumentException.class, () -> low.freeAirAnomaly(Double.NaN));
    }

    @Test
    void theBodyFrameOfALoggedAttitudeHasConsistentRates() {
        int n = 200;
        double[] t = new double[n];
        double[] lat = new double[n];
        double[] lon = new double[n];
        double[] h = new double[n];
        double[] hd = new double[n];
        double[] pt = new double[n];
        double[] rl = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = 0.1 * k;
            lat[k] = Math.toRadians(47.0 + 1e-4 * t[k]);
            lon[k] = Math.toRadians(179.999 + 2e-4 * t[k]);        // crosses the antimeridian
            lon[k] = Math.IEEEremainder(lon[k], 2 * Math.PI);
            h[k] = 30.0 + 0.5 * Math.sin(0.4 * t[k]);
            hd[k] = Math.IEEEremainder(Math.toRadians(350.0 + 3.0 * t[k]), 2 * Math.PI);  // turning through north
            pt[k] = 0.05 * Math.sin(0.7 * t[k]);
            rl[k] = 0.1 * Math.sin(0.5 * t[k] + 0.3);
        }
        GeodeticTrack track = GeodeticTrack.fromArrays(t, lat, lon, h, hd, pt, rl, 0.5);
        assertTrue(track.hasAttitude());
        ReferenceFrame level = EARTH.carriedLevel("aircraft level", track, LocalAxes.NED);
        ReferenceFrame body = EARTH.body("aircraft", level, track.attitude(), LocalAxes.NED);
        // the interpolant passes through the samples (angles as logged, unwrapped)
        assertEquals(Math.toRadians(350.0 + 3.0 * 10.0) - 2 * Math.PI, track.attitude().at(10.0).heading(), 1e-12);
        // five-point central differences of the orientation in ECEF (h = 1e-3 s): [w x] = -R' R^T
        double step = 1e-3;
        for (double tc : new double[] {2.05, 7.3, 15.55}) {
            double[][][] m = new double[5][][];
            for (int k = -2; k <= 2; k++) {
                m[k + 2] = body.placementIn(EARTH.earthFixed(), tc + k * step).orientationMatrix();
            }
            Placement p = body.placementIn(EARTH.earthFixed(), tc);
            double[][] d = new double[3][3];
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    d[i][j] = (-m[4][i][j] + 8 * m[3][i][j] - 8 * m[1][i][j] + m[0][i][j]) / (12 * step);
                }
            }
            double[][] r = m[2];
            double[][] s = new double[3][3];
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    s[i][j] = -(d[i][0] * r[j][0] + d[i][1] * r[j][1] + d[i][2] * r[j][2]);
                }
            }
            Vector3D fd = new Vector3D(0.5 * (s[2][1] - s[1][2]), 0.5 * (s[0][2] - s[2][0]), 0.5 * (s[1][0] - s[0][1]));
            // 1e-8 rad/s: truncation h^4 w^(5) and rounding eps/h of the differences
            assertTrue(fd.subtract(p.angularVelocity()).getNorm() <= 1e-8, "t " + tc + ": " + fd + " vs "
                    + p.angularVelocity());
            // and the origin velocity is the derivative of the origin
            Vector3D o1 = body.placementIn(EARTH.earthFixed(), tc + step).origin();
            Vector3D o0 = body.placementIn(EARTH.earthFixed(), tc - step).origin();
            Vector3D v = o1.subtract(o0).scalarMultiply(0.5 / step);
            // 1e-5 m/s: central difference truncation h^2 a' / 6 and rounding of 6e6 m positions
            assertTrue(v.subtract(p.originVelocity()).getNorm() <= 1e-5, "t " + tc);
        }
    }

    @Test
    void badLogsAreRefusedWithFileAndLine() {
        String head = "t[s], lat[deg], lon[deg], h[m]\n";
        assertRefused(head + "0, 50, 3, 0\n1, 50, 3.001\n", "log.csv line 3", "fields");
        assertRefused(head + "0, 50, 3, 0\n1, 50, abc, 0\n", "log.csv line 3, column lon", "not a decimal");
        assertRefused(head + "0, 50, 3, 0\n1, 50, NaN, 0\n", "log.csv line 3, column lon", "not a decimal");
        assertRefused(head + "0, 50, 3, 0\n5, 50, 3.001, 0\n", "log.csv line 3", "exceeds maxGap");
        assertRefused(head + "0, 50, 3, 0\n0, 50, 3.001, 0\n", "log.csv line 3", "must be after");
        assertRefused(head + "0, 89.995, 3, 0\n1, 89.996, 3, 0\n", "log.csv line 2", "pole");
        assertRefused(head + "0, 89.9, 3, 0\n1, 89.9, 183, 0\n", "log.csv line 3", "crosses a pole");
        assertRefused("t[s], lat[deg], lon[deg]\n0, 1, 2\n", "log.csv line 1", "missing track column(s) h");
        // the text rules of every log reader (LogTable): separator, NUL, a number leaving the double range
        assertRefused("t[s]; lat[deg]; lon[deg]; h[m]\n", "log.csv line 1", "semicolons");
        assertRefused(head + "0, 50, 3, 0\n1, 50, 3.001,\u0000 0\n", "log.csv line 3", "NUL character");
        assertRefused(head + "0, 50, 3, 1e999\n", "log.csv line 2, column h", "overflows");
        assertRefused("t[s], lat[deg], lon[deg], h[furlong]\n", "log.csv line 1", "unit 'furlong'");
        assertRefused("t[s], lat[deg], lon[deg], h[m], heading[deg]\n", "log.csv line 1", "heading, pitch, roll");
        assertRefused(head + "0, 50, 3, 0\n", "at least 2", "");
    }

    @Test
    void arrayRefusalsNameTheArrayParameter() {
        double[] t = {0, 1, 2};
        double[] lat = {0.829, 0.829, 0.829};
        double[] lon = {0.143, 0.1431, 0.1432};
        double[] h = {420, 421, 422};
        double[] nan = {0.0, Double.NaN, 0.0};
        // the arrays are named as the factory's parameters, not as the file's columns
        assertArrayRefused("sample 1, latitudes", () -> GeodeticTrack.fromArrays(t, nan, lon, h, 10.0));
        assertArrayRefused("sample 1, heights", () -> GeodeticTrack.fromArrays(t, lat, lon, nan, 10.0));
        assertArrayRefused("sample 1, pitches",
                () -> GeodeticTrack.fromArrays(t, lat, lon, h, new double[3], nan, new double[3], 10.0));
        assertArrayRefused("times must hold at least 2 samples",
                () -> GeodeticTrack.fromArrays(new double[0], new double[0], new double[0], new double[0], 10.0));
    }

    private static void assertArrayRefused(String what, org.junit.jupiter.api.function.Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().contains(what), e.getMessage());
    }

    private static void assertRefused(String text, String where, String what) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GeodeticTrack.readCsv(new StringReader(text), "log.csv", 2.0));
        assertTrue(e.getMessage().contains(where) && e.getMessage().contains(what), e.getMessage());
    }
}
