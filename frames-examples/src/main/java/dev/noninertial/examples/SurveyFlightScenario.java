package dev.noninertial.examples;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.geodesy.AttitudeProfile;
import dev.noninertial.geodesy.AttitudeSample;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.GeodeticPath;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;
import dev.noninertial.geodesy.PathSample;
import dev.noninertial.geodesy.navigation.ErrorBudget;
import dev.noninertial.geodesy.navigation.LevelNavigator;
import dev.noninertial.geodesy.navigation.NavigationState;

/**
 * Scenario 4: strapdown navigation of an invented survey drone, Corvel-3, flying a 300 s survey
 * leg from Kelvaro Point: turns, a climb, speed changes. The truth is the frame tree (the drone's
 * body frame on a level frame carried along its track); an ideal sensor fixed in the body gives
 * exact increments at 100 Hz; the drone's own sensor adds errors; a {@code LevelNavigator}
 * navigates both from the true start; the error budget shows which inertial terms the leg needs.
 * For simulation and analysis only, not for primary navigation.
 */
final class SurveyFlightScenario {

    /** Step of the increments (s): 100 Hz. */
    static final double STEP = 0.01;
    /** Length of the leg (s). */
    static final double DURATION = 300.0;

    private static final double TWO_PI = 2.0 * Math.PI;

    private SurveyFlightScenario() {
    }

    /** The drone's track: 40 m/s north-east with S-turns, a 150 m climb and a speed pulse. */
    static GeodeticPath track() {
        LatLonHeight start = DemoSetting.KELVARO_POINT.withHeight(120.0);
        double rm = Ellipsoid.WGS84.meridianRadius(start.latitude());
        double rn = Ellipsoid.WGS84.primeVerticalRadius(start.latitude()) * Math.cos(start.latitude());
        double a = TWO_PI / 120.0;
        double b = TWO_PI / 300.0;
        return t -> {
            double n = 28.0 * t + 300.0 * Math.sin(a * t);
            double dn = 28.0 + 300.0 * a * Math.cos(a * t);
            double ddn = -300.0 * a * a * Math.sin(a * t);
            double e = 28.0 * t + 400.0 * (1.0 - Math.cos(b * t));
            double de = 28.0 + 400.0 * b * Math.sin(b * t);
            double dde = 400.0 * b * b * Math.cos(b * t);
            double h = start.height() + 75.0 * (1.0 - Math.cos(b * t));
            double dh = 75.0 * b * Math.sin(b * t);
            double ddh = 75.0 * b * b * Math.cos(b * t);
            return new PathSample(start.latitude() + n / rm, start.longitude() + e / rn, h,
                    dn / rm, de / rn, dh, ddn / rm, dde / rn, ddh);
        };
    }

    /** The drone's attitude over NED: banking in the turns, a gentle pitch, a heading swing. */
    static AttitudeProfile attitude() {
        double a = TWO_PI / 120.0;
        return t -> new AttitudeSample(Math.toRadians(45.0) + 0.5 * Math.sin(a * t), 0.03 * Math.sin(a * t),
                0.35 * Math.cos(a * t), 0.5 * a * Math.cos(a * t), 0.03 * a * Math.cos(a * t),
                -0.35 * a * Math.sin(a * t), -0.5 * a * a * Math.sin(a * t), -0.03 * a * a * Math.sin(a * t),
                -0.35 * a * a * Math.cos(a * t));
    }

    /** The true navigation state at t (NED). */
    static NavigationState truth(double t) {
        PathSample p = track().at(t);
        Ellipsoid e = Ellipsoid.WGS84;
        double rm = e.meridianRadius(p.latitude()) + p.height();
        double rn = e.primeVerticalRadius(p.latitude()) + p.height();
        Vector3D v = new Vector3D(rm * p.latitudeRate(), rn * Math.cos(p.latitude()) * p.longitudeRate(),
                -p.heightRate());
        AttitudeSample s = attitude().at(t);
        Rotation r = Orientations.fromYawPitchRoll(s.heading(), s.pitch(), s.roll());
        return NavigationState.of(t, p.position(), v, LocalAxes.NED, r);
    }

    static ScenarioTable[] run(DemoSetting s) {
        ReferenceFrame level = s.earth.carriedLevel("Corvel-3 level", track(), LocalAxes.NED);
        ReferenceFrame body = s.earth.body("Corvel-3 body", level, attitude(), LocalAxes.NED);
        IdealSensor sensor = IdealSensor.of(body, s.earth.gravitationIn(body));
        int n = (int) Math.round(DURATION / STEP);
        double[] ideal = new double[6 * n];
        sensor.incrementsOver(0.0, STEP, n, ideal, 0);
        double[] imperfect = SurveySensorErrors.apply(ideal, STEP, n);
        LevelNavigator nav = LevelNavigator.of(s.model, LocalAxes.NED);
        NavigationState start = truth(0.0);
        double[] idealTrace = new double[LevelNavigator.TRACE_VALUES * n];
        double[] imperfectTrace = new double[LevelNavigator.TRACE_VALUES * n];
        nav.run(start, STEP, n, ideal, 0, idealTrace);
        nav.run(start, STEP, n, imperfect, 0, imperfectTrace);

        ScenarioTable table = new ScenarioTable("survey-navigation",
                "Corvel-3 survey leg (invented drone) from Kelvaro Point, 100 Hz increments, navigated from the true start")
                .column("t", "s", "%.0f")
                .column("true height", "m", "%.1f")
                .column("ideal: horizontal error", "m", "%.2e")
                .column("ideal: vertical error", "m", "%.2e")
                .column("ideal: attitude error", "rad", "%.2e")
                .column(SurveySensorErrors.LABEL + ": horizontal error", "m", "%.3f")
                .column(SurveySensorErrors.LABEL + ": vertical error", "m", "%.3f")
                .column(SurveySensorErrors.LABEL + ": attitude error", "rad", "%.2e");
        for (int k = 5999; k < n; k += 6000) {
            NavigationState truth = truth((k + 1) * STEP);
            double[] a = errors(idealTrace, k, truth);
            double[] b = errors(imperfectTrace, k, truth);
            table.row((k + 1) * STEP, truth.position().height(), a[0], a[1], a[2], b[0], b[1], b[2]);
        }
        table.note("ideal sensor: what the mechanization itself costs; " + SurveySensorErrors.LABEL + ": "
                + SurveySensorErrors.DESCRIPTION);
        table.note("for simulation and analysis only, not for primary navigation");

        ErrorBudget budget = ErrorBudget.of(nav, start, STEP, n, ideal, 0);
        ScenarioTable terms = new ScenarioTable("survey-budget",
                "Corvel-3 error budget: each term left out in turn, deviation from the full mechanization after "
                        + (int) DURATION + " s")
                .column("term left out", "", "%s")
                .column("horizontal at end", "m", "%.3e")
                .column("vertical at end", "m", "%.3e")
                .column("attitude at end", "rad", "%.3e")
                .column("peak position", "m", "%.3e")
                .column("peak attitude", "rad", "%.3e");
        for (ErrorBudget.TermEffect e : budget.effects()) {
            terms.row(e.term().label(), e.horizontalAtEnd(), e.verticalAtEnd(), e.attitudeAtEnd(), e.peakPosition(),
                    e.peakAttitude());
        }
        terms.note("a term whose row stays below the accuracy the job needs can be dropped for this leg");
        return new ScenarioTable[] {table, terms};
    }

    /** Horizontal and vertical position error (m) and attitude error (rad) of trace record k. */
    private static double[] errors(double[] trace, int k, NavigationState truth) {
        int o = LevelNavigator.TRACE_VALUES * k;
        Ellipsoid e = Ellipsoid.WGS84;
        LatLonHeight p = LatLonHeight.of(trace[o + 1], trace[o + 2], trace[o + 3]);
        Vector3D d = e.toCartesian(p).subtract(e.toCartesian(truth.position()));
        double vertical = d.dotProduct(e.normal(truth.position()));
        double horizontal = Math.sqrt(Math.max(0.0, d.getNormSq() - vertical * vertical));
        Rotation r = Orientations.fromQuaternion(trace[o + 7], trace[o + 8], trace[o + 9], trace[o + 10]);
        return new double[] {horizontal, vertical, Rotation.distance(r, truth.attitude())};
    }
}
