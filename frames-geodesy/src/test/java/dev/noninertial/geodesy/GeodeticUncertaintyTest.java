package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.random.CorrelatedRandomVectorGenerator;
import org.hipparchus.random.GaussianRandomGenerator;
import org.hipparchus.random.Well19937c;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.uncertainty.UncertainState;

/**
 * Geodetic Jacobians against central finite differences of {@link Ellipsoid#toCartesian} and
 * {@link Ellipsoid#toGeodetic} (source: the definition of the derivative), and covariance
 * conversions against Monte Carlo of 100,000 samples (Hipparchus {@link Well19937c}, fixed seeds)
 * pushed through the same conversions. Statistical tolerance: 5 standard errors of a sample
 * covariance element, sqrt((P_ij^2 + P_ii P_jj) / (N - 1)) (Wishart distribution, e.g. Anderson,
 * An Introduction to Multivariate Statistical Analysis, ch. 7).
 */
class GeodeticUncertaintyTest {

    private static final Ellipsoid WGS84 = Ellipsoid.WGS84;
    private static final int SAMPLES = 100_000;
    private static final double SIGMAS = 5.0;
    private static final double EPS = Math.ulp(1.0);

    // invented positions spread over both hemispheres, both sides of Greenwich, high latitude, altitude
    private static final LatLonHeight[] SITES = {
        LatLonHeight.ofDegrees(47.5, 8.2, 420.0),
        LatLonHeight.ofDegrees(-36.4, -71.9, 1250.0),
        LatLonHeight.ofDegrees(78.2, 15.6, 10.0),
        LatLonHeight.ofDegrees(3.1, -160.0, -45.0),
        LatLonHeight.ofDegrees(62.0, 120.0, 10_000.0),
    };

    private static double[] geodetic(LatLonHeight p) {
        return new double[] {p.latitude(), p.longitude(), p.height()};
    }

    private static double[] cartesian(Vector3D x) {
        return x.toArray();
    }

    @Test
    void toCartesianJacobianMatchesCentralDifferences() {
        // h = 1e-5 rad: truncation h^2/6 * |f'''| with |f'''| <= RN + h ~ 6.4e6 m gives 1.1e-4 m/rad,
        // rounding eps * 6.4e6 m / h gives 1.4e-4 m/rad: allow 1e-3 m/rad (entries ~6.4e6 m/rad).
        // Height column: affine in h, rounding only, eps * 6.4e6 / 1 m: allow 1e-8.
        double[] steps = {1e-5, 1e-5, 1.0};
        double[] tolerance = {1e-3, 1e-3, 1e-8};
        double[] worst = new double[3];
        for (LatLonHeight site : SITES) {
            RealMatrix j = GeodeticJacobians.toCartesian(WGS84, site);
            for (int col = 0; col < 3; col++) {
                double[] plus = geodetic(site);
                double[] minus = geodetic(site);
                plus[col] += steps[col];
                minus[col] -= steps[col];
                double[] fp = cartesian(WGS84.toCartesian(LatLonHeight.of(plus[0], plus[1], plus[2])));
                double[] fm = cartesian(WGS84.toCartesian(LatLonHeight.of(minus[0], minus[1], minus[2])));
                for (int row = 0; row < 3; row++) {
                    double numeric = (fp[row] - fm[row]) / (2 * steps[col]);
                    double diff = Math.abs(j.getEntry(row, col) - numeric);
                    worst[col] = Math.max(worst[col], diff);
                    assertTrue(diff <= tolerance[col], site + " column " + col + " row " + row + " off by " + diff);
                }
            }
        }
        System.out.printf("uncertainty FD geodetic->ECEF: worst %.2e m/rad, %.2e m/rad, %.2e%n",
                worst[0], worst[1], worst[2]);
    }

    @Test
    void toGeodeticJacobianMatchesCentralDifferences() {
        // h = 1 m in x, y, z: truncation h^2/6 * |f'''| ~ 1/R^3, negligible; rounding of the inversion
        // (accurate to a few ulps: ~1e-16 rad in angles, ~1e-9 m in height) over 2 h. Allow 1e-8 of
        // the row scale: 1/(RM + h) rad/m for latitude, 1/((RN + h) cos lat) for longitude, 1 for height.
        double h = 1.0;
        double worstRelative = 0;
        for (LatLonHeight site : SITES) {
            RealMatrix j = GeodeticJacobians.toGeodetic(WGS84, site);
            double[] rowScale = {1.0 / (WGS84.meridianRadius(site.latitude()) + site.height()),
                1.0 / ((WGS84.primeVerticalRadius(site.latitude()) + site.height()) * Math.cos(site.latitude())), 1.0};
            Vector3D x = WGS84.toCartesian(site);
            for (int col = 0; col < 3; col++) {
                Vector3D step = new Vector3D(col == 0 ? h : 0, col == 1 ? h : 0, col == 2 ? h : 0);
                double[] fp = geodetic(WGS84.toGeodetic(x.add(step)));
                double[] fm = geodetic(WGS84.toGeodetic(x.subtract(step)));
                for (int row = 0; row < 3; row++) {
                    double numeric = (fp[row] - fm[row]) / (2 * h);
                    double relative = Math.abs(j.getEntry(row, col) - numeric) / rowScale[row];
                    worstRelative = Math.max(worstRelative, relative);
                    assertTrue(relative <= 1e-8, site + " row " + row + " column " + col + " off by " + relative
                            + " of the row scale");
                }
            }
            // inverse function theorem: the two Jacobians are inverse matrices; entry (r, c) is a dot
            // product of a row of scale |row r| and a column of scale |column c|, rounded to a few ulps
            RealMatrix forward = GeodeticJacobians.toCartesian(WGS84, site);
            RealMatrix product = j.multiply(forward);
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    double scale = j.getRowVector(r).getNorm() * forward.getColumnVector(c).getNorm();
                    assertEquals(r == c ? 1.0 : 0.0, product.getEntry(r, c), 10 * EPS * scale);
                }
            }
        }
        System.out.printf("uncertainty FD ECEF->geodetic: worst %.2e of the row scale%n", worstRelative);
    }

    @Test
    void localCovarianceOfIndependentGeodeticErrorsIsTheTextbookScaling() {
        // Curvilinear position: dN = (RM + h) dlat, dE = (RN + h) cos lat dlon, dU = dh (REFERENCES.md,
        // Inertial navigation; recalled from memory, so the two scale factors are recomputed below
        // by finite differences of toCartesian).
        LatLonHeight site = SITES[1];
        double sLat = 4e-7;
        double sLon = 6e-7;
        double sH = 3.0;
        GeodeticUncertainty g = GeodeticUncertainty.of(WGS84, site,
                MatrixUtils.createRealDiagonalMatrix(new double[] {sLat * sLat, sLon * sLon, sH * sH}));
        RealMatrix enu = g.localCovariance(LocalAxes.ENU);
        double east = (WGS84.primeVerticalRadius(site.latitude()) + site.height()) * Math.cos(site.latitude()) * sLon;
        double north = (WGS84.meridianRadius(site.latitude()) + site.height()) * sLat;
        double[] expected = {east * east, north * north, sH * sH};
        // independent: |dX/dlat| and |dX/dlon| by central differences, step 1e-6 rad (truncation
        // ~ h^2/6 relative, 2e-13; rounding ~ ulp(6.4e6)/(6.4e6 * 1e-6), 2e-10 relative)
        double step = 1e-6;
        double lat = site.latitude();
        double lon = site.longitude();
        double perLat = WGS84.toCartesian(LatLonHeight.of(lat + step, lon, site.height()))
                .distance(WGS84.toCartesian(LatLonHeight.of(lat - step, lon, site.height()))) / (2 * step);
        double perLon = WGS84.toCartesian(LatLonHeight.of(lat, lon + step, site.height()))
                .distance(WGS84.toCartesian(LatLonHeight.of(lat, lon - step, site.height()))) / (2 * step);
        assertEquals(perLat * sLat, north, 1e-9 * north);
        assertEquals(perLon * sLon, east, 1e-9 * east);
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                // rounding of two 3x3 products: a few ulps of the largest entry (about 10 m^2)
                assertEquals(i == k ? expected[i] : 0.0, enu.getEntry(i, k), 1e-12 * expected[0]);
            }
        }
    }

    @Test
    void geodeticToEarthFixedCovarianceMatchesMonteCarlo() {
        LatLonHeight site = SITES[0];
        // errors of a few metres: second-order terms are sigma / R ~ 1e-6 relative, far below the bound
        RealMatrix p = correlated(new double[] {8e-7, 1.1e-6, 6.0}, new double[][] {{1, 0.3, -0.4}, {0.3, 1, 0.2},
            {-0.4, 0.2, 1}});
        GeodeticUncertainty g = GeodeticUncertainty.of(WGS84, site, p);
        CorrelatedRandomVectorGenerator draw = gaussian(geodetic(site), p, 21);
        Vector3D centre = WGS84.toCartesian(site);
        double[][] sample = sampleCovariance(centre.toArray(), () -> {
            double[] q = draw.nextVector();
            return WGS84.toCartesian(LatLonHeight.of(q[0], q[1], q[2])).toArray();
        });
        double worst = worstStandardErrors(sample, g.earthFixedCovariance());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");
        System.out.printf("uncertainty MC geodetic->ECEF: worst %.2f SE%n", worst);
    }

    @Test
    void earthFixedToGeodeticCovarianceMatchesMonteCarlo() {
        LatLonHeight site = SITES[2];
        Vector3D centre = WGS84.toCartesian(site);
        RealMatrix p = correlated(new double[] {4.0, 2.5, 7.0}, new double[][] {{1, -0.5, 0.3}, {-0.5, 1, 0.1},
            {0.3, 0.1, 1}});
        GeodeticUncertainty g = GeodeticUncertainty.fromEarthFixed(WGS84, centre, p);
        CorrelatedRandomVectorGenerator draw = gaussian(centre.toArray(), p, 22);
        double[][] sample = sampleCovariance(geodetic(g.position()),
            () -> geodetic(WGS84.toGeodetic(new Vector3D(draw.nextVector()))));
        double worst = worstStandardErrors(sample, g.covariance());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");
        System.out.printf("uncertainty MC ECEF->geodetic: worst %.2f SE%n", worst);
    }

    @Test
    void localToGeodeticCovarianceMatchesMonteCarlo() {
        LatLonHeight site = SITES[4];
        RealMatrix ned = correlated(new double[] {3.0, 5.0, 9.0}, new double[][] {{1, 0.6, 0}, {0.6, 1, -0.2},
            {0, -0.2, 1}});
        GeodeticUncertainty g = GeodeticUncertainty.fromLocal(WGS84, site, LocalAxes.NED, ned);
        // local NED error -> ECEF with the rows of Ellipsoid.localOrientation (ECEF to local), then geodetic
        double[][] rows = WGS84.localOrientation(site, LocalAxes.NED).getMatrix();
        Vector3D centre = WGS84.toCartesian(site);
        CorrelatedRandomVectorGenerator draw = gaussian(new double[3], ned, 23);
        double[][] sample = sampleCovariance(geodetic(site), () -> {
            double[] d = draw.nextVector();
            Vector3D offset = new Vector3D(
                    rows[0][0] * d[0] + rows[1][0] * d[1] + rows[2][0] * d[2],
                    rows[0][1] * d[0] + rows[1][1] * d[1] + rows[2][1] * d[2],
                    rows[0][2] * d[0] + rows[1][2] * d[1] + rows[2][2] * d[2]);
            return geodetic(WGS84.toGeodetic(centre.add(offset)));
        });
        double worst = worstStandardErrors(sample, g.covariance());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");
        // and back: the local covariance is recovered (rotation and the exact inverse Jacobian)
        RealMatrix back = g.localCovariance(LocalAxes.NED);
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                assertEquals(ned.getEntry(i, k), back.getEntry(i, k), 1e-9);
            }
        }
        System.out.printf("uncertainty MC NED->geodetic: worst %.2f SE%n", worst);
    }

    @Test
    void earthFixedStateToLocalLevelFrameMatchesMonteCarlo() {
        // full position-velocity state through the frame tree of EarthFrames, ECEF -> ENU at an invented site
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-06-01T00:00:00Z"));
        ReferenceFrame ecef = earth.earthFixed();
        LatLonHeight site = SITES[3];
        ReferenceFrame enu = earth.localLevel("survey pad", site, LocalAxes.ENU);
        double t = 40.0;
        Vector3D position = WGS84.toCartesian(LatLonHeight.ofDegrees(3.11, -160.02, 300.0));
        PointState mean = PointState.of(position, new Vector3D(20.0, -35.0, 4.0));
        RealMatrix p = correlated(new double[] {5, 4, 6, 0.5, 0.4, 0.6}, new double[][] {
            {1, 0.2, 0.1, 0.3, 0, 0}, {0.2, 1, 0, 0, 0.3, 0}, {0.1, 0, 1, 0, 0, 0.3},
            {0.3, 0, 0, 1, 0.1, 0}, {0, 0.3, 0, 0.1, 1, 0}, {0, 0, 0.3, 0, 0, 1}});
        UncertainState inEnu = UncertainState.of(FramedState.of(ecef, t, mean), p).in(enu);
        double[] full = new double[PointState.COMPONENTS];
        mean.toArray(full, 0);
        CorrelatedRandomVectorGenerator draw = gaussian(java.util.Arrays.copyOf(full, 6), p, 24);
        double[] centre = new double[PointState.COMPONENTS];
        inEnu.mean().state().toArray(centre, 0);
        double[][] sample = sampleCovariance(java.util.Arrays.copyOf(centre, 6), () -> {
            double[] x = java.util.Arrays.copyOf(draw.nextVector(), PointState.COMPONENTS);
            double[] out = new double[PointState.COMPONENTS];
            FramedState.of(ecef, t, PointState.fromArray(x, 0)).in(enu).state().toArray(out, 0);
            return java.util.Arrays.copyOf(out, 6);
        });
        double worst = worstStandardErrors(sample, inEnu.covariance());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");
        System.out.printf("uncertainty MC ECEF->ENU state 6x6: worst %.2f SE%n", worst);
    }

    @Test
    void badInputIsRefused() {
        IllegalArgumentException pole = assertThrows(IllegalArgumentException.class,
            () -> GeodeticJacobians.toGeodetic(WGS84, LatLonHeight.ofDegrees(90.0, 0.0, 0.0)));
        assertTrue(pole.getMessage().contains("from the polar axis"), pole.getMessage());
        IllegalArgumentException evolute = assertThrows(IllegalArgumentException.class,
            () -> GeodeticJacobians.toGeodetic(WGS84, LatLonHeight.ofDegrees(0.0, 10.0, -6.36e6)));
        assertTrue(evolute.getMessage().contains("RM + h = "), evolute.getMessage());
        IllegalArgumentException size = assertThrows(IllegalArgumentException.class,
            () -> GeodeticUncertainty.of(WGS84, SITES[0], MatrixUtils.createRealIdentityMatrix(2)));
        assertTrue(size.getMessage().contains("covariance must be 3x3, got 2x2"), size.getMessage());
        RealMatrix nan = MatrixUtils.createRealIdentityMatrix(3);
        nan.setEntry(0, 2, Double.NaN);
        IllegalArgumentException finite = assertThrows(IllegalArgumentException.class,
            () -> GeodeticUncertainty.fromEarthFixed(WGS84, Vector3D.PLUS_I.scalarMultiply(7e6), nan));
        assertTrue(finite.getMessage().contains("earthFixedCovariance[0][2] must be finite, got NaN"),
                finite.getMessage());
    }

    // ------------------------------------------------------------------ Monte Carlo machinery

    private static RealMatrix correlated(double[] sigmas, double[][] correlation) {
        int n = sigmas.length;
        double[][] p = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                p[i][k] = correlation[i][k] * sigmas[i] * sigmas[k];
            }
        }
        return MatrixUtils.createRealMatrix(p);
    }

    private static CorrelatedRandomVectorGenerator gaussian(double[] mean, RealMatrix covariance, int seed) {
        // small = 1e-30: the rank threshold must sit below the smallest variance (rad^2 ~ 1e-13)
        return new CorrelatedRandomVectorGenerator(mean, covariance, 1e-30,
                new GaussianRandomGenerator(new Well19937c(seed)));
    }

    /** Unbiased sample covariance of SAMPLES draws, accumulated about a reference near the mean. */
    private static double[][] sampleCovariance(double[] reference, java.util.function.Supplier<double[]> draw) {
        int n = reference.length;
        double[] sum = new double[n];
        double[][] products = new double[n][n];
        for (int s = 0; s < SAMPLES; s++) {
            double[] x = draw.get();
            double[] d = new double[n];
            for (int i = 0; i < n; i++) {
                d[i] = x[i] - reference[i];
                sum[i] += d[i];
            }
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < n; k++) {
                    products[i][k] += d[i] * d[k];
                }
            }
        }
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                c[i][k] = (products[i][k] - sum[i] * sum[k] / SAMPLES) / (SAMPLES - 1);
            }
        }
        return c;
    }

    private static double worstStandardErrors(double[][] sample, RealMatrix expected) {
        double worst = 0;
        for (int i = 0; i < sample.length; i++) {
            for (int k = 0; k < sample.length; k++) {
                double pik = expected.getEntry(i, k);
                double se = Math.sqrt((pik * pik + expected.getEntry(i, i) * expected.getEntry(k, k)) / (SAMPLES - 1));
                worst = Math.max(worst, Math.abs(sample[i][k] - pik) / se);
            }
        }
        return worst;
    }
}
