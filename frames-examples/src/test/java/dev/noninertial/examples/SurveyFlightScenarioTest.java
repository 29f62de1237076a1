package dev.noninertial.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The navigation scenario: ideal increments close on the truth, and the error budget's Earth-rate
 * row is the level frame's turn with the Earth that was left out.
 */
class SurveyFlightScenarioTest {

    @Test
    void idealSensorClosesAndTheBudgetMatchesTheEarthRate() {
        ScenarioTable[] t = SurveyFlightScenario.run(new DemoSetting());
        Object[] last = t[0].rows().get(t[0].rows().size() - 1);
        double horizontal = (Double) last[2];
        double vertical = (Double) last[3];
        double attitude = (Double) last[4];
        // bar of issue 13 (1 cm, 1e-6 rad at 100 Hz); this gentler leg closes far inside it
        assertTrue(Math.hypot(horizontal, vertical) < 0.01, "ideal closure " + horizontal + ", " + vertical + " m");
        assertTrue(attitude < 1e-6, "ideal attitude " + attitude + " rad");
        // Earth rate left out of the attitude update: |w_ie| T with w_ie = 7.292115e-5 rad/s
        // (NIMA TR8350.2, Table 3.1) and T = 300 s; 5 %: over 300 s the Schuler loop (84 min)
        // bends the tilt part by up to (w_s T)^2 / 6 = 2.3 % and the turns couple heading and tilt
        // (measured 2026-12-02: 2.3 % below w T)
        Object[] earthRate = t[1].rows().get(0);
        assertEquals(7.292115e-5 * SurveyFlightScenario.DURATION, (Double) earthRate[3],
                0.05 * 7.292115e-5 * SurveyFlightScenario.DURATION);
        // the biased sensor drifts far beyond the ideal one
        assertTrue((Double) last[5] > 1.0, "biased sensor error " + last[5] + " m");
    }
}
