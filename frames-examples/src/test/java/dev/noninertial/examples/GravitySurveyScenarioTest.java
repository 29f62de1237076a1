package dev.noninertial.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The gravity-survey line of the worked example against the gravimetry rule of thumb, the
 * first-order reading of an ideal gravimeter, and the noise the filter's response predicts.
 */
class GravitySurveyScenarioTest {

    @Test
    void theSurveyLineKeepsTheRuleOfThumbAndTheFilterRemovesHeaveAndNoise() {
        ScenarioTable t = GravitySurveyScenario.run(new DemoSetting());
        assertTrue(t.rows().size() >= 9, "rows " + t.rows().size());
        double rawSquares = 0;
        for (Object[] row : t.rows()) {
            double eotvos = (Double) row[1];
            double rule = (Double) row[2];
            double raw = (Double) row[3];
            double filtered = (Double) row[4];
            double readingLessNormal = (Double) row[5];
            // common practice (REFERENCES.md, Gravimetry): the rule of thumb within 0.01 mGal
            assertEquals(rule, eotvos, 0.01, "t " + row[0]);
            // filtered: the heave (gain exp(-(0.6 sigma)^2 / 2) = 1e-10 for sigma = 11.2 s) is gone and
            // 1 cm of white height noise at 0.1 s keeps an RMS of s sqrt(h) sqrt(3 / (8 sqrt(pi) sigma^5))
            // = 0.34 mGal (the derivation is in SurveyFilterTest of frames-geodesy); 5 times that per row
            assertTrue(Math.abs(filtered) < 1.7, "filtered d2h/dt2 " + filtered + " mGal at t " + row[0]);
            rawSquares += raw * raw;
            // physical invariant, first order: reading = normal - Eotvos + d2h/dt2, 0.01 mGal
            assertEquals(-eotvos + filtered, readingLessNormal, 0.01, "t " + row[0]);
        }
        // unfiltered, the noise reaches d2h/dt2 amplified by about 1/h^2 = 100 s^-2: 1 cm gives an RMS
        // of the order of 1 m/s^2 (1e5 mGal); the heave alone is 0.22 m/s^2 at most
        double rawRms = Math.sqrt(rawSquares / t.rows().size());
        assertTrue(rawRms > 3e4, "raw RMS " + rawRms + " mGal");
    }
}
