package dev.noninertial.frames.dispersion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.distribution.continuous.NormalDistribution;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.MatrixUtils;
import org.junit.jupiter.api.Test;

/**
 * Statistics of a study against analytic results. Every check with random cases uses a fixed seed
 * and a tolerance of a few standard errors (stated beside it), so it is deterministic and fails
 * only if the computation is wrong.
 */
class DispersionStatisticsTest {

    private static final double MU_A = 3.0;
    private static final double SIGMA_A = 2.0;
    private static final double MU_B = -1.0;
    private static final double SIGMA_B = 0.5;
    private static final double LOW_C = 10.0;
    private static final double HIGH_C = 14.0;

    /** y1 = 2a + 3b + c, y2 = a - b: a linear model with known input distributions. */
    private static DispersionStudy linearStudy(int cases) {
        DispersionModel linear = c -> new double[] {
            2 * c.value("a") + 3 * c.value("b") + c.value("c"), c.value("a") - c.value("b")};
        return DispersionStudy.of(linear, "y1", "y2")
                .withInput("a", InputDistribution.normal(MU_A, SIGMA_A))
                .withInput("b", InputDistribution.normal(MU_B, SIGMA_B))
                .withInput("c", InputDistribution.uniform(LOW_C, HIGH_C))
                .withCases(cases).withSeed(20261202L);
    }

    @Test
    void linearModelGivesTheAnalyticMeanAndCovariance() {
        int n = 50_000;
        DispersionResult r = linearStudy(n).run();
        // Analytic moments of linear combinations of independent inputs (any probability text):
        // E[y1] = 2 muA + 3 muB + (lo + hi)/2; Var y1 = 4 sA^2 + 9 sB^2 + (hi - lo)^2/12;
        // Var y2 = sA^2 + sB^2; Cov(y1, y2) = 2 sA^2 - 3 sB^2.
        double var1 = 4 * SIGMA_A * SIGMA_A + 9 * SIGMA_B * SIGMA_B + (HIGH_C - LOW_C) * (HIGH_C - LOW_C) / 12;
        double var2 = SIGMA_A * SIGMA_A + SIGMA_B * SIGMA_B;
        double cov12 = 2 * SIGMA_A * SIGMA_A - 3 * SIGMA_B * SIGMA_B;
        double[] mean = r.mean();
        double[][] cov = r.covariance();
        // Bound: 4 standard errors. Mean: sqrt(var / n). Variance: sqrt(2 / n) var (normal
        // fourth moment; y1's uniform part has a lighter tail, so this is conservative).
        // Covariance: sqrt((var1 var2 + cov12^2) / n) (bivariate normal).
        assertEquals(2 * MU_A + 3 * MU_B + 0.5 * (LOW_C + HIGH_C), mean[0], 4 * Math.sqrt(var1 / n));
        assertEquals(MU_A - MU_B, mean[1], 4 * Math.sqrt(var2 / n));
        assertEquals(var1, cov[0][0], 4 * Math.sqrt(2.0 / n) * var1);
        assertEquals(var2, cov[1][1], 4 * Math.sqrt(2.0 / n) * var2);
        assertEquals(cov12, cov[0][1], 4 * Math.sqrt((var1 * var2 + cov12 * cov12) / n));
        assertEquals(cov[0][1], cov[1][0], 0.0);
        // Inputs themselves: mean of the uniform input (lo + hi)/2 within 4 sqrt((hi-lo)^2/12/n).
        assertEquals(0.5 * (LOW_C + HIGH_C), r.mean("c"), 4 * (HIGH_C - LOW_C) / Math.sqrt(12.0 * n));
    }

    private static DispersionStudy circularNormal(double sigma, int cases) {
        return DispersionStudy.of(c -> new double[] {c.value(0), c.value(1)}, "east", "north")
                .withInput("e", InputDistribution.normal(100.0, sigma))
                .withInput("n", InputDistribution.normal(-50.0, sigma))
                .withCases(cases).withSeed(99L);
    }

    @Test
    void cepOfACircularNormalIsSqrtTwoLnTwoSigma() {
        double sigma = 10.0;
        int n = 40_000;
        DispersionResult r = circularNormal(sigma, n).run();
        // REFERENCES.md, Statistics of dispersion: CEP = sqrt(2 ln 2) sigma = 1.1774 sigma.
        double cep = Math.sqrt(2 * Math.log(2)) * sigma;
        assertEquals(1.1774, cep / sigma, 1e-4);
        // Standard error of a sample median: 1 / (2 f(m) sqrt(n)), with the Rayleigh density at
        // its median f(m) = (m / sigma^2) exp(-m^2 / (2 sigma^2)) = sqrt(2 ln 2) / (2 sigma).
        // Bound: 4 standard errors (the mean point's own error adds O(sigma^2/(n m)), negligible).
        double density = cep / (sigma * sigma) * 0.5;
        double standardError = 1.0 / (2 * density * Math.sqrt(n));
        assertEquals(cep, r.cep("east", "north"), 4 * standardError);
        // About the true centre, the same value within the same bound.
        assertEquals(cep, r.cepAbout("east", "north", 100.0, -50.0), 4 * standardError);
    }

    @Test
    void ellipseRadiusAxesAndCoverage() {
        // REFERENCES.md, Statistics of dispersion: Mahalanobis radius sqrt(-2 ln(1 - P)),
        // 2.4477 at 95 % (published to 4 decimals); 1.1774 at 50 %.
        assertEquals(2.4477, ConfidenceEllipse.mahalanobisRadius(0.95), 1e-4);
        assertEquals(1.1774, ConfidenceEllipse.mahalanobisRadius(0.50), 1e-4);
        // A correlated bivariate normal: x = a, y = 0.6 a + 0.8 b (a, b standard normal, scaled).
        int n = 40_000;
        DispersionStudy study = DispersionStudy.of(c -> new double[] {
            30.0 * c.value(0), 30.0 * 0.6 * c.value(0) + 10.0 * 0.8 * c.value(1)}, "x", "y")
                .withInput("a", InputDistribution.normal(0.0, 1.0))
                .withInput("b", InputDistribution.normal(0.0, 1.0))
                .withCases(n).withSeed(5L);
        DispersionResult r = study.run();
        for (double p : new double[] {0.5, 0.9, 0.95, 0.99}) {
            ConfidenceEllipse e = r.ellipse("x", "y", p);
            // Coverage: the fraction inside equals P within 4 binomial standard errors
            // sqrt(P (1 - P) / n) (plus the fitted covariance's own error, below 1e-3 here).
            assertEquals(p, r.fractionInside(e), 4 * Math.sqrt(p * (1 - p) / n) + 1e-3, "P = " + p);
            // Axes against an independent eigen-decomposition (Hipparchus): k sqrt(lambda).
            EigenDecompositionSymmetric eig = new EigenDecompositionSymmetric(MatrixUtils.createRealMatrix(
                    new double[][] {{e.covXX(), e.covXY()}, {e.covXY(), e.covYY()}}));
            double[] lambda = eig.getEigenvalues();   // decreasing order
            double k = Math.sqrt(-2 * Math.log(1 - p));
            assertEquals(k * Math.sqrt(lambda[0]), e.semiMajor(), 1e-9 * e.semiMajor());
            assertEquals(k * Math.sqrt(lambda[1]), e.semiMinor(), 1e-9 * e.semiMajor());
            // Major axis direction is the first eigenvector (up to sign).
            double vx = eig.getEigenvector(0).getEntry(0);
            double vy = eig.getEigenvector(0).getEntry(1);
            assertEquals(1.0, Math.abs(Math.cos(e.orientation()) * vx + Math.sin(e.orientation()) * vy), 1e-9);
            // Boundary points lie at Mahalanobis distance k (on the ellipse, to rounding).
            for (double[] q : e.boundary(16)) {
                double dx = q[0] - e.centreX();
                double dy = q[1] - e.centreY();
                double det = e.covXX() * e.covYY() - e.covXY() * e.covXY();
                double d2 = (e.covYY() * dx * dx - 2 * e.covXY() * dx * dy + e.covXX() * dy * dy) / det;
                assertEquals(k, Math.sqrt(d2), 1e-9 * k);
            }
        }
    }

    @Test
    void percentilesFollowTheTextbookDefinitionAndTheNormalQuantiles() {
        // Hyndman and Fan definition 7 on the values 1..n: the p-quantile is 1 + p (n - 1).
        int n = 101;
        DispersionStudy ramp = DispersionStudy.of(c -> new double[] {c.index() + 1.0}, "v")
                .withInput("unused", InputDistribution.uniform(0, 1)).withCases(n);
        DispersionResult r = ramp.run();
        assertEquals(1.0, r.percentile("v", 0), 0.0);
        assertEquals(101.0, r.percentile("v", 100), 0.0);
        assertEquals(1 + 0.5 * 100, r.percentile("v", 50), 1e-12);
        assertEquals(1 + 0.123 * 100, r.percentile("v", 12.3), 1e-12);
        // Normal input: the 97.5th percentile is mu + 1.959964 sigma (normal table). Standard
        // error of a sample quantile: sqrt(p (1 - p) / n) / f(x_p); bound 4 standard errors.
        int m = 40_000;
        DispersionResult normal = circularNormal(10.0, m).run();
        NormalDistribution law = new NormalDistribution(100.0, 10.0);
        double x = 100.0 + 1.959964 * 10.0;
        double se = Math.sqrt(0.975 * 0.025 / m) / law.density(x);
        assertEquals(x, normal.percentile("east", 97.5), 4 * se);
        assertEquals(100.0, normal.percentile("east", 50), 4 * Math.sqrt(0.25 / m) / law.density(100.0));
    }

    @Test
    void truncatedNormalStaysInsideAndHasTheTextbookMean() {
        // Mean of a normal truncated to [a, b] (standardized alpha, beta): mu + sigma
        // (phi(alpha) - phi(beta)) / (Phi(beta) - Phi(alpha)) (Johnson, Kotz, Balakrishnan,
        // Continuous Univariate Distributions vol. 1, ch. 13). Checked below and above the mean
        // (the second uses the mirrored inversion). Bound: 4 standard errors s / sqrt(n).
        NormalDistribution std = new NormalDistribution(0, 1);
        double[][] intervals = {{-1.0, 0.5}, {1.0, 2.5}, {-3.0, -2.0}};
        for (double[] ab : intervals) {
            double mu = 7.0;
            double sigma = 3.0;
            double lo = mu + sigma * ab[0];
            double hi = mu + sigma * ab[1];
            int n = 20_000;
            DispersionResult r = DispersionStudy.of(c -> new double[] {c.value(0)}, "x")
                    .withInput("t", InputDistribution.truncatedNormal(mu, sigma, lo, hi))
                    .withCases(n).withSeed(11L).run();
            double[] x = r.column("x");
            for (double v : x) {
                assertTrue(v >= lo - 1e-9 && v <= hi + 1e-9, "inside [" + lo + ", " + hi + "]: " + v);
            }
            double mass = std.cumulativeProbability(ab[1]) - std.cumulativeProbability(ab[0]);
            double expected = mu + sigma * (std.density(ab[0]) - std.density(ab[1])) / mass;
            assertEquals(expected, r.mean("x"), 4 * r.standardDeviation("x") / Math.sqrt(n), "interval " + ab[0] + ", " + ab[1]);
        }
    }
}
