package dev.noninertial.examples;

import java.util.List;
import java.util.Random;

import dev.noninertial.frames.units.Units;
import dev.noninertial.geodesy.GeodeticTrack;
import dev.noninertial.geodesy.SurveyFilter;
import dev.noninertial.geodesy.SurveyPoint;

/**
 * Scenario 6: a marine gravity-survey line off Kelvaro Point (invented): the survey vessel RV
 * Brannoch Wake (invented) steams due east at 10 kn along the range's latitude for 20 minutes,
 * heaving 0.6 m at 0.6 rad/s; its GNSS track is logged at 10 Hz with 1 cm of height noise (fixed
 * seed). The table gives, every two minutes, the Eotvos correction against the gravimetry rule of
 * thumb, the platform's vertical acceleration straight from the log and through a Gaussian filter
 * of 60 s half-gain period, and what an ideal gravimeter on a level platform reads, filtered,
 * against normal gravity.
 */
final class GravitySurveyScenario {

    /** Sample interval of the log (s). */
    static final double INTERVAL = 0.1;
    /** Length of the line (s). */
    static final double DURATION = 1200.0;
    /** Speed (kn). */
    static final double KNOTS = 10.0;
    /** Height noise of the log (m), one standard deviation. */
    static final double NOISE = 0.01;
    /** The filter: half the amplitude at a 60 s period. */
    static final SurveyFilter FILTER = SurveyFilter.ofHalfGainPeriod(60.0);

    private GravitySurveyScenario() {
    }

    /** The logged track: due east at constant latitude and speed, heave and noise on the height. */
    static GeodeticTrack track(DemoSetting s) {
        int n = (int) Math.round(DURATION / INTERVAL) + 1;
        double lat = DemoSetting.KELVARO_POINT.latitude();
        double east = Units.knots(KNOTS)
                / (s.model.ellipsoid().primeVerticalRadius(lat) * Math.cos(lat));   // rad/s of longitude at h = 0
        Random noise = new Random(20261204L);
        double[] t = new double[n];
        double[] lats = new double[n];
        double[] lons = new double[n];
        double[] h = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * INTERVAL;
            lats[k] = lat;
            lons[k] = DemoSetting.KELVARO_POINT.longitude() + east * t[k];
            h[k] = 0.6 * Math.sin(0.6 * t[k]) + NOISE * noise.nextGaussian();
        }
        return GeodeticTrack.fromArrays(t, lats, lons, h, 2 * INTERVAL);
    }

    static ScenarioTable run(DemoSetting s) {
        GeodeticTrack track = track(s);
        List<SurveyPoint> raw = track.surveyAtSamples(s.earth);
        List<SurveyPoint> filtered = track.surveyAtSamples(s.earth, FILTER);
        int margin = FILTER.margin(INTERVAL);
        double lat = DemoSetting.KELVARO_POINT.latitude();
        // common practice (gravimetry texts): 7.503 V cos(lat) sin(course) + 0.004154 V^2 mGal, V in knots
        double rule = 7.503 * KNOTS * Math.cos(lat) + 0.004154 * KNOTS * KNOTS;
        ScenarioTable table = new ScenarioTable("gravity-survey",
                "RV Brannoch Wake (invented) survey line east of Kelvaro Point, 10 kn due east, 10 Hz log")
                .column("t", "s", "%.0f")
                .column("Eotvos", "mGal", "%.3f")
                .column("rule of thumb", "mGal", "%.3f")
                .column("d2h/dt2 raw", "mGal", "%.0f")
                .column("d2h/dt2 filtered", "mGal", "%.3f")
                .column("reading - normal, filtered", "mGal", "%.3f");
        for (int i = 0; i < filtered.size(); i += (int) Math.round(120.0 / INTERVAL)) {
            SurveyPoint f = filtered.get(i);
            SurveyPoint r = raw.get(i + margin);
            table.row(f.time(), Units.toMilligals(f.eotvosCorrection()), rule,
                    Units.toMilligals(r.verticalAcceleration()), Units.toMilligals(f.verticalAcceleration()),
                    Units.toMilligals(f.gravimeterReading() - f.normalGravity()));
        }
        table.note(FILTER + ": the first and last " + margin * INTERVAL + " s of the line have no filtered value");
        table.note("the ideal reading is normal gravity lowered by the Eotvos effect and raised by the vertical "
                + "acceleration; unfiltered, 1 cm of height noise makes d2h/dt2 useless");
        table.note("for survey processing and analysis only, not for primary navigation");
        return table;
    }
}
