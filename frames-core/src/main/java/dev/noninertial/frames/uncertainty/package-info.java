/**
 * Uncertainty through frames: exact Jacobians of every state conversion of a
 * {@link dev.noninertial.frames.Placement}, covariance conversion between any two frames of a tree
 * ({@link dev.noninertial.frames.uncertainty.UncertainState}), and the first-order contribution of
 * an uncertain placement ({@link dev.noninertial.frames.uncertainty.PlacementUncertainty}).
 *
 * <p>Conventions are those of {@link dev.noninertial.frames.Placement}: {@code v_F = R v_B};
 * origin in B axes; angular velocity and acceleration of F relative to B in F axes. The derivation
 * of every Jacobian is in {@link dev.noninertial.frames.uncertainty.StateJacobians}. Input
 * covariances are checked by {@link dev.noninertial.frames.uncertainty.CovarianceCheck}.
 */
package dev.noninertial.frames.uncertainty;
