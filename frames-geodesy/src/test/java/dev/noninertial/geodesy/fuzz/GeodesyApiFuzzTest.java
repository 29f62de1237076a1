package dev.noninertial.geodesy.fuzz;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.sensing.IncrementLog;
import dev.noninertial.frames.sensing.SensorIncrements;
import dev.noninertial.frames.fuzz.ApiFuzz;
import dev.noninertial.frames.fuzz.CoreSamples;
import dev.noninertial.frames.fuzz.FuzzReports;
import dev.noninertial.frames.fuzz.SampleValues;
import dev.noninertial.geodesy.AttitudeProfile;
import dev.noninertial.geodesy.AttitudeSample;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.GeodeticPath;
import dev.noninertial.geodesy.GeodeticTrack;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;
import dev.noninertial.geodesy.SurveyFilter;
import dev.noninertial.geodesy.air.SoundingAtmosphere;
import dev.noninertial.geodesy.air.WindProfile;
import dev.noninertial.geodesy.navigation.LevelNavigator;
import dev.noninertial.geodesy.navigation.NavigationState;

/**
 * The reflection fuzz of frames-geodesy's public API (issue 15), with the rule of {@link ApiFuzz}.
 * Valid values: WGS84 (REFERENCES.md, WGS84) and invented sites near 47.5 deg N (demo values).
 */
class GeodesyApiFuzzTest {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-03-20T12:00:00Z"));
    private static final LatLonHeight SITE = LatLonHeight.ofDegrees(47.5, 8.2, 420.0);
    private static final ReferenceFrame ENU = EARTH.localLevel("site", SITE, LocalAxes.ENU);
    /** A navigator and a state at rest at the site, at t = -0.5 s so that the ends {0, 1, 2} follow it. */
    private static final LevelNavigator NAVIGATOR = LevelNavigator.of(EarthModel.WGS84, LocalAxes.ENU);
    private static final NavigationState AT_REST = NavigationState.of(-0.5, SITE, Vector3D.ZERO, LocalAxes.ENU,
            Orientations.identity());

    static SampleValues table() {
        SampleValues s = CoreSamples.table();
        // geodetic and Earth-tree values first: frames of the Earth tree, sites, the WGS84 models
        s.put(ReferenceFrame.class, () -> ENU, EARTH::earthFixed, EARTH::inertial);
        s.put(Double.class, () -> 0.5, () -> 1.0, () -> 0.1, () -> 2.0, () -> 10.0, () -> 0.0, () -> -0.5,
                () -> 100.0, () -> 1e-3, () -> 0.9, () -> 6378137.0, () -> 3.986004418e14, () -> 7.292115e-5,
                () -> 298.257223563, () -> 2460000.5);
        s.put(Vector3D.class, () -> Ellipsoid.WGS84.toCartesian(SITE), () -> new Vector3D(3.0, 4.0, 0.0),
                () -> new Vector3D(0.3, -0.2, 0.9), () -> Vector3D.PLUS_K, () -> Vector3D.ZERO);
        s.add(Ellipsoid.class, () -> Ellipsoid.WGS84, () -> Ellipsoid.GRS80);
        s.add(EarthModel.class, () -> EarthModel.WGS84);
        s.add(EarthFrames.class, () -> EARTH);
        s.add(LatLonHeight.class, () -> SITE, () -> LatLonHeight.ofDegrees(-12.0, 130.0, 5.0));
        s.add(Instant.class, () -> Instant.parse("2026-03-20T12:00:00Z"));
        s.add(GeodeticPath.class, () -> GeodeticPath.stationary(SITE));
        // a track of three samples 1 s apart near the site (invented), without and with attitude
        s.add(GeodeticTrack.class, () -> GeodeticTrack.fromArrays(new double[] {0, 1, 2},
                new double[] {0.829, 0.829, 0.829}, new double[] {0.143, 0.1431, 0.1432}, new double[] {420, 421, 422},
                10.0), () -> GeodeticTrack.fromArrays(new double[] {0, 1, 2}, new double[] {0.829, 0.829, 0.829},
                new double[] {0.143, 0.1431, 0.1432}, new double[] {420, 421, 422}, new double[] {0.3, 0.3, 0.3},
                new double[] {0.0, 0.01, 0.02}, new double[] {0, 0, 0}, 10.0), GeodesyApiFuzzTest::surveyLine);
        // a Gaussian of 1 s: the 12-sample line at 1 s spans its kernel (11 samples)
        s.add(SurveyFilter.class, () -> SurveyFilter.ofSigma(1.0));
        // a sounding of three levels (invented)
        s.add(SoundingAtmosphere.class, () -> SoundingAtmosphere.of(new double[] {0.0, 500.0, 1000.0},
                new double[] {1.2, 1.15, 1.1}, new double[] {340.0, 338.0, 336.0}));
        s.add(WindProfile.Layered.class, () -> (WindProfile.Layered) WindProfile.layered(new double[] {0.0, 1000.0},
                new double[] {1.0, 2.0}, new double[] {0.0, 1.0}));
        s.add(FramedState.class, () -> ENU.stateAt(0.0, PointState.stationary(new Vector3D(1.0, 2.0, 3.0))));
        s.add(AttitudeSample.class, () -> AttitudeSample.stationary(0.3, 0.05, -0.02));
        s.add(AttitudeProfile.class, () -> AttitudeProfile.stationary(0.3, 0.05, -0.02));
        // navigation: the work array of the navigator (tried after the core arrays), one step of
        // increments from the state's time (specific force about 1 g up, a small turn)
        s.add(double[].class, () -> NAVIGATOR.newWork(AT_REST));
        s.add(LevelNavigator.class, () -> NAVIGATOR);
        s.add(NavigationState.class, () -> AT_REST);
        s.add(SensorIncrements.class, GeodesyApiFuzzTest::increments);
        s.add(SensorIncrements[].class, () -> new SensorIncrements[] {increments()});
        s.add(IncrementLog.class, () -> IncrementLog.ofUniform(-0.5, 0.5, new double[] {0.0, 0.0, 4.9, 5e-5, 0.0, 0.0}));
        addCalls(s);
        return s;
    }

    /** A survey line of 12 samples 1 s apart near the site (invented), long enough for a 1 s filter. */
    private static GeodeticTrack surveyLine() {
        double[] t = new double[12];
        double[] lat = new double[12];
        double[] lon = new double[12];
        double[] h = new double[12];
        for (int i = 0; i < 12; i++) {
            t[i] = i;
            lat[i] = 0.829;
            lon[i] = 0.143 + 1e-6 * i;
            h[i] = 420.0;
        }
        return GeodeticTrack.fromArrays(t, lat, lon, h, 2.0);
    }

    /** A track log of three samples 1 s apart near the site, with attitude (invented). */
    static final String TRACK = "# demo track near the invented site\n"
            + "t[s], lat[deg], lon[deg], h[m], heading[deg], pitch[deg], roll[deg]\n"
            + "0, 47.5, 8.2, 420, 17, 0, 0\n1, 47.5, 8.2001, 421, 17, 0.5, 0\n2, 47.5, 8.2002, 422, 17, 1, 0\n";

    private static Path trackFile;

    /** The track log as a temporary file, written once. */
    private static synchronized Path trackFile() {
        if (trackFile == null) {
            try {
                trackFile = Files.createTempFile("fuzz-track", ".csv");
                trackFile.toFile().deleteOnExit();
                Files.writeString(trackFile, TRACK, StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return trackFile;
    }

    /**
     * Valid calls whose arguments must agree (see {@link SampleValues#addCall}): arrays of one
     * length, a log in the track format.
     */
    private static void addCalls(SampleValues s) {
        s.addCall("GeodeticTrack.fromArrays(double[],double[],double[],double[],double)", () -> new Object[] {
            new double[] {0, 1, 2}, new double[] {0.829, 0.829, 0.829}, new double[] {0.143, 0.1431, 0.1432},
            new double[] {420, 421, 422}, 10.0});
        s.addCall("GeodeticTrack.fromArrays(double[],double[],double[],double[],double[],double[],double[],double)",
                () -> new Object[] {new double[] {0, 1, 2}, new double[] {0.829, 0.829, 0.829},
                    new double[] {0.143, 0.1431, 0.1432}, new double[] {420, 421, 422}, new double[] {0.3, 0.3, 0.3},
                    new double[] {0.0, 0.01, 0.02}, new double[] {0, 0, 0}, 10.0});
        s.addCall("GeodeticTrack.readCsv(Path,double)", () -> new Object[] {trackFile(), 10.0});
        s.addCall("SoundingAtmosphere.of(double[],double[],double[])", () -> new Object[] {
            new double[] {0.0, 500.0, 1000.0}, new double[] {1.2, 1.15, 1.1}, new double[] {340.0, 338.0, 336.0}});
        s.addCall("SoundingAtmosphere.ofPressureTemperature(double[],double[],double[])", () -> new Object[] {
            new double[] {0.0, 500.0, 1000.0}, new double[] {101325.0, 95461.0, 89876.0},
            new double[] {288.15, 284.9, 281.65}});
        s.addCall("SurveyFilter.applyTo(List)", () -> new Object[] {surveyLine().surveyAtSamples(EARTH)});
        s.addCall("GeodeticTrack.readCsv(Reader,String,double)",
                () -> new Object[] {new StringReader(TRACK), "demo-track.csv", 10.0});
    }

    private static SensorIncrements increments() {
        return new SensorIncrements(-0.5, 0.5, new Vector3D(0.0, 0.0, 9.8), new Vector3D(1e-4, 0.0, 0.0));
    }

    @Test
    void everyPublicCallRefusesOrReturnsFiniteResults() {
        long start = System.nanoTime();
        ApiFuzz.Report report = new ApiFuzz("frames-geodesy", Ellipsoid.class, "dev.noninertial.geodesy", table()).run();
        FuzzReports.write("frames-geodesy", report, (System.nanoTime() - start) * 1e-9);
        assertTrue(report.failures.isEmpty() && report.exposures.isEmpty(), report.details());
        // the valid calls given here are used (the core ones, inherited with its table, are not)
        assertTrue(report.untabled.stream().noneMatch(k -> k.startsWith("GeodeticTrack.") || k.startsWith("SurveyFilter.")
                || k.startsWith("SoundingAtmosphere.")),
                () -> "valid calls given for no executable: " + report.untabled);
    }
}
