/**
 * Ready-made frame motions and motions read from recordings.
 *
 * <p>{@link dev.noninertial.frames.motion.Motions} makes the common
 * {@link dev.noninertial.frames.Motion}s by name: a fixed offset, a steady spin, a spin-up, a
 * polynomial translation, an angle oscillation, heave, and the composition of two motions. Each
 * returns placements whose rates are the exact derivatives of its origin and orientation.
 *
 * <p>{@link dev.noninertial.frames.motion.SampledMotion} turns a recorded platform motion (times,
 * positions, attitudes as quaternions or yaw-pitch-roll, optionally measured velocities and
 * angular rates) into a motion with C2 quintic Hermite interpolation, so that the interpolated
 * rates agree with each other. It refuses gaps longer than its limit, bad samples (named by index
 * or file line) and queries outside the record, rather than extrapolating.
 * {@link dev.noninertial.frames.motion.MotionLogFile} reads and writes the project's own CSV motion
 * log (a {@code name[unit]} header, {@code #} comments).
 *
 * <h2>Conventions</h2>
 * Those of {@link dev.noninertial.frames.Placement}: SI units; the orientation {@code R} maps
 * parent components to frame components ({@code v_F = R v_B}); origin terms are seen from the
 * parent and resolved in parent axes; angular velocity and acceleration of the frame relative to
 * its parent are resolved in the frame.
 *
 * <p>Interpolated accelerations from recorded data amplify sensor noise: check a recording against
 * an independent reference before relying on it. Results are for simulation and analysis only.
 */
package dev.noninertial.frames.motion;
