package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

import dev.noninertial.frames.units.Units;

/**
 * The Gaussian survey filter against the Fourier transform of the Gaussian (textbook: the normal
 * density of standard deviation sigma has the transform exp(-(2 pi f sigma)^2 / 2)), the exact
 * passage of constants and lines by a symmetric kernel of unit sum, and a noisy heaving survey line
 * (invented) whose filtered vertical acceleration falls to the level the filter's response predicts.
 */
class SurveyFilterTest {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-01T06:00:00Z"));

    private static double[] times(int n, double interval) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = 100.0 + i * interval;
        }
        return t;
    }

    @Test
    void aSinusoidIsScaledByTheGaussiansFourierTransform() {
        SurveyFilter filter = SurveyFilter.ofSigma(20.0);
        double f = 0.01;   // a 100 s period
        // textbook transform of the unit-sum Gaussian at f
        double expected = Math.exp(-0.5 * Math.pow(2 * Math.PI * f * 20.0, 2));
        assertEquals(expected, filter.gainAt(f), 1e-15);
        double[] t = times(1000, 1.0);
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            y[i] = Math.sin(2 * Math.PI * f * t[i] + 0.3);
        }
        double[] out = filter.applyTo(t, y);
        int m = filter.margin(1.0);
        assertEquals(100, m);   // floor(5 * 20 / 1)
        assertEquals(t.length - 2 * m, out.length);
        for (int i = 0; i < out.length; i++) {
            // the cut at 5 sigma leaves a tail of 5.7e-7 of the weight and sampling at 1 s of a
            // 20 s sigma aliases by exp(-2 pi^2 400): 1e-6 on a unit amplitude covers both; no phase
            // shift (the output is compared at its own centre time)
            assertEquals(expected * Math.sin(2 * Math.PI * f * t[i + m] + 0.3), out[i], 1e-6, "sample " + i);
        }
    }

    @Test
    void theHalfGainPeriodHalvesAndConstantsAndLinesPass() {
        SurveyFilter filter = SurveyFilter.ofHalfGainPeriod(120.0);
        // sigma = P sqrt(2 ln 2) / (2 pi), so that exp(-(2 pi sigma / P)^2 / 2) = 1/2
        assertEquals(0.5, filter.gainAt(1.0 / 120.0), 1e-15);
        assertEquals(120.0 * Math.sqrt(2 * Math.log(2)) / (2 * Math.PI), filter.sigma(), 1e-12);
        double[] t = times(2000, 0.5);
        double[] wave = new double[t.length];
        double[] line = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            wave[i] = 3.0 * Math.cos(2 * Math.PI * t[i] / 120.0);
            line[i] = 9.81 + 2e-4 * t[i];
        }
        double[] halved = filter.applyTo(t, wave);
        double[] kept = filter.applyTo(t, line);
        int m = filter.margin(0.5);
        for (int i = 0; i < halved.length; i++) {
            assertEquals(1.5 * Math.cos(2 * Math.PI * t[i + m] / 120.0), halved[i], 3e-6);   // as above, amplitude 3
            // symmetric weights of unit sum: a line passes to rounding (1e-12 of 9.8)
            assertEquals(line[i + m], kept[i], 1e-12);
        }
    }

    @Test
    void aNoisyHeavingLineGetsTheVerticalAccelerationTheResponsePredicts() {
        // invented: 10 kn due east along 60 N at 10 Hz, heave 0.8 m at 0.6 rad/s, 1 cm of white
        // height noise (fixed seed)
        int n = 6001;
        double v = Units.knots(10.0);
        double lonRate = v / (Ellipsoid.WGS84.primeVerticalRadius(Math.toRadians(60.0)) * 0.5);
        double[] t = new double[n];
        double[] lat = new double[n];
        double[] lon = new double[n];
        double[] h = new double[n];
        Random noise = new Random(20261204L);
        for (int k = 0; k < n; k++) {
            t[k] = k / 10.0;
            lat[k] = Math.toRadians(60.0);
            lon[k] = Math.toRadians(4.0) + lonRate * t[k];
            h[k] = 0.8 * Math.sin(0.6 * t[k]) + 0.01 * noise.nextGaussian();
        }
        GeodeticTrack track = GeodeticTrack.fromArrays(t, lat, lon, h, 0.2);
        List<SurveyPoint> raw = track.surveyAtSamples(EARTH);
        SurveyFilter filter = SurveyFilter.ofSigma(10.0);
        List<SurveyPoint> smooth = track.surveyAtSamples(EARTH, filter);
        assertEquals(n - 2 * filter.margin(0.1), smooth.size());
        assertEquals(raw.get(filter.margin(0.1)).time(), smooth.get(0).time(), 0.0);
        double rawRms = 0;
        double smoothRms = 0;
        for (SurveyPoint p : raw) {
            rawRms += p.verticalAcceleration() * p.verticalAcceleration();
        }
        double rule = 7.503 * 10.0 * 0.5 + 0.004154 * 100.0;   // common practice, REFERENCES.md, Gravimetry
        for (SurveyPoint p : smooth) {
            smoothRms += p.verticalAcceleration() * p.verticalAcceleration();
            // positions are exact in latitude and longitude: the filtered Eotvos keeps the rule of thumb
            assertEquals(rule, Units.toMilligals(p.eotvosCorrection()), 0.01);
        }
        rawRms = Math.sqrt(rawRms / raw.size());
        smoothRms = Math.sqrt(smoothRms / smooth.size());
        System.out.printf("MEASURED survey filter, sigma 10 s on 10 Hz with 1 cm height noise: vertical acceleration"
                + " RMS %.3g m/s^2 raw, %.3g mGal filtered%n", rawRms, Units.toMilligals(smoothRms));
        // unfiltered, the noise reaches d2h/dt2 amplified by about 1/h^2 = 100 s^-2: metres per s^2
        assertTrue(rawRms > 1.0, "raw RMS " + rawRms);
        // filtered: the heave (gain exp(-(0.6 * 10)^2 / 2) = 1.5e-8 on 0.29 m/s^2) is gone, and white
        // noise of s = 1 cm at interval h through the second derivative of the Gaussian keeps an RMS
        // of s sqrt(h) sqrt(3 / (8 sqrt(pi) sigma^5)) = 4.6e-6 m/s^2 = 0.46 mGal (derived here from
        // the integral of the squared second derivative); the interpolant's own differentiator
        // differs from the exact one mostly above the filter's band: allow 3x
        assertTrue(Units.toMilligals(smoothRms) < 1.4, "filtered RMS " + Units.toMilligals(smoothRms) + " mGal");
    }

    @Test
    void refusesWhatItCannotFilter() {
        SurveyFilter filter = SurveyFilter.ofSigma(2.0);
        assertThrows(IllegalArgumentException.class, () -> SurveyFilter.ofSigma(0.0));
        assertThrows(IllegalArgumentException.class, () -> SurveyFilter.ofHalfGainPeriod(Double.NaN));
        double[] t = times(100, 1.0);
        double[] y = new double[100];
        IllegalArgumentException mismatch = assertThrows(IllegalArgumentException.class,
                () -> filter.applyTo(t, new double[99]));
        assertTrue(mismatch.getMessage().contains("one value per time (100), got 99"), mismatch.getMessage());
        double[] uneven = t.clone();
        uneven[40] += 0.01;
        IllegalArgumentException step = assertThrows(IllegalArgumentException.class, () -> filter.applyTo(uneven, y));
        assertTrue(step.getMessage().contains("step 40"), step.getMessage());
        IllegalArgumentException coarse = assertThrows(IllegalArgumentException.class,
                () -> SurveyFilter.ofSigma(0.5).applyTo(t, y));
        assertTrue(coarse.getMessage().contains("at most the filter's sigma"), coarse.getMessage());
        IllegalArgumentException shortSeries = assertThrows(IllegalArgumentException.class,
                () -> SurveyFilter.ofSigma(20.0).applyTo(t, y));
        assertTrue(shortSeries.getMessage().contains("201 samples"), shortSeries.getMessage());
        double[] bad = y.clone();
        bad[7] = Double.NaN;
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class, () -> filter.applyTo(t, bad));
        assertTrue(nan.getMessage().contains("values[7]"), nan.getMessage());
        assertTrue(filter.toString().contains("sigma 2 s"), filter.toString());
    }
}
