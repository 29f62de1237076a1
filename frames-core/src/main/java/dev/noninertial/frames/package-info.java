/**
 * Frames chained by translations and time-varying rotations, and the kinematics between them.
 *
 * <p>A {@link dev.noninertial.frames.ReferenceFrame} is a node of a tree whose root is inertial;
 * each other frame is attached to its parent by a {@link dev.noninertial.frames.Motion}, which
 * gives, for any time, the frame's {@link dev.noninertial.frames.Placement} in that parent: origin,
 * orientation and their first and second rates, mutually consistent. A
 * {@link dev.noninertial.frames.PointState} (position, velocity, acceleration) converts through a
 * placement in either direction with every kinematic term, and a
 * {@link dev.noninertial.frames.FramedState} carries its frame and time so that it converts
 * through the whole tree. {@link dev.noninertial.frames.FictitiousAccelerations} names the four
 * inertial terms one by one: frame acceleration, Euler, Coriolis and centrifugal.
 *
 * <h2>Conventions</h2>
 * SI units, right-handed axes. For the placement of a frame F in its base B: the orientation
 * {@code R} maps B components to F components ({@code v_F = R v_B}); the origin {@code o} and
 * its rates are seen from B and resolved in B; the angular velocity {@code w} and acceleration
 * {@code al} of F relative to B are resolved in F. Converting from F to B ({@code toBase}):
 * <pre>
 *   r_B = o + R^T r
 *   v_B = o' + R^T (v + w x r)
 *   a_B = o'' + R^T (a + al x r + 2 w x v + w x (w x r))
 * </pre>
 * and {@code fromBase} is the exact inverse. Every method whose result depends on these
 * conventions states them again.
 *
 * <h2>Values and threads</h2>
 * Every type is an immutable value or a stateless helper, safe to share between threads. Bad
 * arguments are refused at once with a message that names the argument, its value and the allowed
 * range; nothing is clamped or extrapolated silently. Arrays of states convert in bulk without
 * allocating per state ({@code PointState.COMPONENTS} doubles per state).
 *
 * <p>Related packages: ready-made motions in {@link dev.noninertial.frames.motion}, integration of
 * a point mass in any frame in {@link dev.noninertial.frames.dynamics}, covariances through frames
 * in {@link dev.noninertial.frames.uncertainty}.
 *
 * <p>Results are for simulation and analysis; they are not fit for aiming weapons, planning lifts
 * or any decision on which safety depends. Defer to local codes and licensed practice.
 */
package dev.noninertial.frames;
