package dev.noninertial.frames.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.random.CorrelatedRandomVectorGenerator;
import org.hipparchus.random.GaussianRandomGenerator;
import org.hipparchus.random.Well19937c;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * Covariance conversion against Monte Carlo: states (and placements) drawn with Hipparchus
 * {@link CorrelatedRandomVectorGenerator} over {@link Well19937c} (fixed seeds), each sample
 * converted by the library's own state conversion, the sample covariance compared element by
 * element with the propagated one.
 *
 * <p>Statistical tolerance: for N Gaussian samples the element S_ij of the sample covariance has
 * standard error sqrt((P_ij^2 + P_ii P_jj) / (N - 1)) (Wishart distribution, e.g. Anderson, An
 * Introduction to Multivariate Statistical Analysis, ch. 7). Every element must lie within
 * {@value #SIGMAS} standard errors; over 81 elements a correct propagation exceeds that with
 * probability below 1e-4. Each test also shows that a plausible wrong propagation (rotation only,
 * or placement uncertainty ignored) is rejected by the same criterion.
 */
class UncertainStateTest {

    private static final int SAMPLES = 100_000;
    private static final double SIGMAS = 5.0;
    private static final double T = 7.3;

    // invented tree: a survey boat and a carrier with a sensor mast on an inertial "harbour" root
    private final ReferenceFrame harbour = ReferenceFrame.inertialRoot("harbour");
    private final ReferenceFrame carrier = harbour.attach("carrier", Motions.translation(new Vector3D(300, -150, 0), new Vector3D(4.0, 1.5, 0), new Vector3D(0.02, -0.01, 0))
            .then(Motions.spinUp(Vector3D.PLUS_K, 0.4, 0.03, 0.004)));
    private final ReferenceFrame mast = carrier.attach("mast", Motions.stationary(new Vector3D(12.0, -3.0, 25.0), Orientations.fromYawPitchRoll(0.3, 0.1, -0.2))
            .then(Motions.oscillation(Vector3D.PLUS_I, 0.08, 0.9, 0.5)));
    private final ReferenceFrame boat = harbour.attach("boat", Motions.translation(new Vector3D(-200, 400, 0), new Vector3D(-2.0, 3.0, 0))
            .then(Motions.spin(new Vector3D(0.1, 0.0, 1.0), -0.8, -0.06)));

    private final PointState buoyInMast = Fixtures.buoy();
    private final double[] sigmas9 = {0.5, 0.8, 0.3, 0.05, 0.08, 0.03, 0.01, 0.02, 0.015};

    private static double[] array(PointState s) {
        double[] x = new double[PointState.COMPONENTS];
        s.toArray(x, 0);
        return x;
    }

    private static PointState state(double[] x, int n) {
        double[] full = new double[PointState.COMPONENTS];
        System.arraycopy(x, 0, full, 0, n);
        return PointState.fromArray(full, 0);
    }

    private static CorrelatedRandomVectorGenerator gaussian(double[] mean, RealMatrix covariance, int seed) {
        return new CorrelatedRandomVectorGenerator(mean, covariance, 1e-12,
                new GaussianRandomGenerator(new Well19937c(seed)));
    }

    private static double[] head(double[] x, int n) {
        double[] h = new double[n];
        System.arraycopy(x, 0, h, 0, n);
        return h;
    }

    @Test
    void treeConversionMatchesMonteCarlo() {
        RealMatrix p = Fixtures.randomCovariance(new Well19937c(11), sigmas9);
        UncertainState inMast = UncertainState.of(mast.stateAt(T, buoyInMast), p);
        UncertainState inBoat = inMast.in(boat);
        assertSame(boat, inBoat.frame());

        CorrelatedRandomVectorGenerator draw = gaussian(array(buoyInMast), p, 1);
        Fixtures.SampleStatistics stats = new Fixtures.SampleStatistics(array(inBoat.mean().state()));
        for (int k = 0; k < SAMPLES; k++) {
            // each sample goes through the tree by the library's state conversion, not the Jacobian
            stats.add(array(mast.stateAt(T, PointState.fromArray(draw.nextVector(), 0)).in(boat).state()));
        }
        double worst = Fixtures.worstStandardErrors(stats.covariance(), inBoat.covariance(), stats.count());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");

        // power check: rotating the covariance without the rate terms must be rejected
        Placement mastInBoat = mast.placementIn(boat, T);
        RealMatrix rotationOnly = rotationOnly(mastInBoat, 9);
        double naive = Fixtures.worstStandardErrors(stats.covariance(),
                rotationOnly.multiply(p).multiplyTransposed(rotationOnly), stats.count());
        assertTrue(naive > 10 * SIGMAS, "rotation-only propagation should be rejected, got " + naive);
        System.out.printf("uncertainty MC tree 9x9: worst %.2f SE (rotation-only %.0f SE)%n", worst, naive);
    }

    @Test
    void positionVelocityConversionMatchesMonteCarloBothWays() {
        RealMatrix p = Fixtures.randomCovariance(new Well19937c(12), head(sigmas9, 6));
        FramedState meanInBoat = mast.stateAt(T, buoyInMast).in(boat);
        UncertainState inBoat = UncertainState.of(meanInBoat, p);
        UncertainState inMast = inBoat.in(mast);
        assertEquals(StateLayout.POSITION_VELOCITY, inMast.layout());

        CorrelatedRandomVectorGenerator draw = gaussian(head(array(meanInBoat.state()), 6), p, 2);
        Fixtures.SampleStatistics stats = new Fixtures.SampleStatistics(head(array(inMast.mean().state()), 6));
        for (int k = 0; k < SAMPLES; k++) {
            stats.add(head(array(boat.stateAt(T, state(draw.nextVector(), 6)).in(mast).state()), 6));
        }
        double worst = Fixtures.worstStandardErrors(stats.covariance(), inMast.covariance(), stats.count());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");
        System.out.printf("uncertainty MC tree 6x6: worst %.2f SE%n", worst);
    }

    @Test
    void placementUncertaintyToParentMatchesMonteCarlo() {
        RealMatrix p = Fixtures.randomCovariance(new Well19937c(13), sigmas9);
        RealMatrix attitude = Fixtures.randomCovariance(new Well19937c(14), new double[] {2e-3, 1e-3, 3e-3});
        RealMatrix origin = Fixtures.randomCovariance(new Well19937c(15), new double[] {0.3, 0.2, 0.4});
        PlacementUncertainty u = PlacementUncertainty.of(attitude, origin);
        UncertainState inCarrier = UncertainState.of(mast.stateAt(T, buoyInMast), p).toParent(u);
        assertSame(carrier, inCarrier.frame());

        Placement nominal = mast.placementIn(carrier, T);
        CorrelatedRandomVectorGenerator drawState = gaussian(array(buoyInMast), p, 3);
        CorrelatedRandomVectorGenerator drawAttitude = gaussian(new double[3], attitude, 4);
        CorrelatedRandomVectorGenerator drawOrigin = gaussian(new double[3], origin, 5);
        Fixtures.SampleStatistics stats = new Fixtures.SampleStatistics(array(inCarrier.mean().state()));
        for (int k = 0; k < SAMPLES; k++) {
            Placement actual = Fixtures.perturbed(nominal, new Vector3D(drawAttitude.nextVector()),
                    new Vector3D(drawOrigin.nextVector()));
            stats.add(array(actual.toBase(PointState.fromArray(drawState.nextVector(), 0))));
        }
        // first order: neglected terms ~ sigma_e^2 ~ 1e-5 relative, far below the 2e-2 statistical bound
        double worst = Fixtures.worstStandardErrors(stats.covariance(), inCarrier.covariance(), stats.count());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");
        double ignored = Fixtures.worstStandardErrors(stats.covariance(),
                UncertainState.of(mast.stateAt(T, buoyInMast), p).in(carrier).covariance(), stats.count());
        assertTrue(ignored > 10 * SIGMAS, "ignoring the placement uncertainty should be rejected, got " + ignored);
        System.out.printf("uncertainty MC toParent 9x9: worst %.2f SE (placement ignored %.0f SE)%n", worst, ignored);
    }

    @Test
    void placementUncertaintyToChildMatchesMonteCarlo() {
        RealMatrix p = Fixtures.randomCovariance(new Well19937c(16), sigmas9);
        RealMatrix attitude = Fixtures.randomCovariance(new Well19937c(17), new double[] {1.5e-3, 2.5e-3, 1e-3});
        RealMatrix origin = Fixtures.randomCovariance(new Well19937c(18), new double[] {0.25, 0.35, 0.15});
        PlacementUncertainty u = PlacementUncertainty.of(attitude, origin);
        FramedState meanInCarrier = mast.stateAt(T, buoyInMast).in(carrier);
        UncertainState inMast = UncertainState.of(meanInCarrier, p).toChild(mast, u);
        assertSame(mast, inMast.frame());

        Placement nominal = mast.placementIn(carrier, T);
        CorrelatedRandomVectorGenerator drawState = gaussian(array(meanInCarrier.state()), p, 6);
        CorrelatedRandomVectorGenerator drawAttitude = gaussian(new double[3], attitude, 7);
        CorrelatedRandomVectorGenerator drawOrigin = gaussian(new double[3], origin, 8);
        Fixtures.SampleStatistics stats = new Fixtures.SampleStatistics(array(inMast.mean().state()));
        for (int k = 0; k < SAMPLES; k++) {
            Placement actual = Fixtures.perturbed(nominal, new Vector3D(drawAttitude.nextVector()),
                    new Vector3D(drawOrigin.nextVector()));
            stats.add(array(actual.fromBase(PointState.fromArray(drawState.nextVector(), 0))));
        }
        double worst = Fixtures.worstStandardErrors(stats.covariance(), inMast.covariance(), stats.count());
        assertTrue(worst <= SIGMAS, "worst element off by " + worst + " standard errors");
        double ignored = Fixtures.worstStandardErrors(stats.covariance(),
                UncertainState.of(meanInCarrier, p).in(mast).covariance(), stats.count());
        assertTrue(ignored > 10 * SIGMAS, "ignoring the placement uncertainty should be rejected, got " + ignored);
        System.out.printf("uncertainty MC toChild 9x9: worst %.2f SE (placement ignored %.0f SE)%n", worst, ignored);
    }

    @Test
    void positiveDefiniteInputStaysPositiveDefiniteAndSymmetric() {
        // Sylvester's law of inertia: J P J^T with J invertible keeps all eigenvalues positive.
        Well19937c random = new Well19937c(19);
        for (int trial = 0; trial < 50; trial++) {
            RealMatrix p = Fixtures.randomCovariance(random, sigmas9);
            RealMatrix out = UncertainState.of(mast.stateAt(T, buoyInMast), p).in(boat)
                    .toParent(PlacementUncertainty.ofSigmas(1e-3, 0.1)).covariance();
            for (int i = 0; i < 9; i++) {
                for (int k = 0; k < 9; k++) {
                    assertEquals(out.getEntry(i, k), out.getEntry(k, i), 0.0, "exactly symmetric");
                }
            }
            double[] eigenvalues = new EigenDecompositionSymmetric(out).getEigenvalues();
            double smallest = eigenvalues[eigenvalues.length - 1];
            assertTrue(smallest > 0, "smallest eigenvalue " + smallest);
            new CholeskyDecomposition(out); // throws if not positive definite
        }
    }

    @Test
    void convertingThereAndBackRestoresTheCovariance() {
        // Invariant: the conversion back is the inverse map, J_back = J^-1, so P is recovered.
        RealMatrix p = Fixtures.randomCovariance(new Well19937c(20), sigmas9);
        UncertainState start = UncertainState.of(mast.stateAt(T, buoyInMast), p);
        RealMatrix back = start.in(boat).in(mast).covariance();
        for (int i = 0; i < 9; i++) {
            for (int k = 0; k < 9; k++) {
                // relative to the scale of the element; rounding of two 9x9 congruences
                double scale = Math.sqrt(p.getEntry(i, i) * p.getEntry(k, k));
                assertEquals(p.getEntry(i, k), back.getEntry(i, k), 1e-10 * scale);
            }
        }
    }

    private static RealMatrix rotationOnly(Placement placement, int n) {
        double[][] r = placement.orientationMatrix();
        RealMatrix m = MatrixUtils.createRealMatrix(n, n);
        for (int b = 0; b < n / 3; b++) {
            for (int i = 0; i < 3; i++) {
                for (int k = 0; k < 3; k++) {
                    m.setEntry(3 * b + i, 3 * b + k, r[k][i]);
                }
            }
        }
        return m;
    }
}
