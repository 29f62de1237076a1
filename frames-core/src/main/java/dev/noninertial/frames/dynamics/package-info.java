/**
 * Motion of a point mass integrated directly in any frame of a tree, rotating and accelerating
 * ones included: the user supplies only the real specific forces, the solver adds the frame's
 * fictitious accelerations (frame acceleration, Euler, Coriolis, centrifugal) itself.
 *
 * <h2>Conventions</h2>
 * SI units (m, s, m/s, m/s^2). Time in seconds from the user's epoch, the same time scale as the
 * frame motions. Every vector of this package (positions, velocities, accelerations, forces) is
 * <em>seen in</em> and <em>resolved in</em> the integration frame unless its Javadoc says
 * otherwise. The equation integrated is
 * <pre>
 *   r'' = f_real(t, r, r') + frameAcceleration + euler + coriolis + centrifugal
 *       = f_real - R o'' - al x r - 2 w x r' - w x (w x r)
 * </pre>
 * with o'', R, w and al the placement of the integration frame in the tree's inertial root (see
 * {@link dev.noninertial.frames.Placement}).
 *
 * <h2>Gravity or gravitation</h2>
 * In a frame fixed to a rotating body (an Earth-fixed or local-level frame) pass
 * <b>gravitation</b>, not gravity: normal gravity already holds the centrifugal term, which the
 * solver adds again. See {@link dev.noninertial.frames.dynamics.SpecificForce}.
 *
 * <p>Results are for simulation and analysis; they are not fit for aiming weapons, planning lifts
 * or any decision on which safety depends. Defer to local codes and licensed practice.
 */
package dev.noninertial.frames.dynamics;
