package dev.noninertial.frames.dynamics;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * Something to watch for while integrating: the zero crossing of a {@link CrossingFunction}, in
 * one direction or both, that either stops the run or is only recorded. Located with the event
 * machinery of Hipparchus (sign checks at least every {@link #checkInterval()} seconds of the
 * dense output, then a bracketing root solver to {@link #timeAccuracy()} seconds).
 *
 * <p><b>Conventions.</b> Vectors given to the factories (up directions, reference points) are
 * resolved in the integration frame of the solver that receives the event; lengths in m, times in
 * s. A crossing is "rising" when the function goes from negative to positive.
 *
 * <p>Ready-made events: {@link #groundImpact(Vector3D, double)} (stops),
 * {@link #heightCrossing(String, Vector3D, double)} and
 * {@link #rangeReached(String, Vector3D, Vector3D, double)} (recorded), and
 * {@link #of(String, CrossingFunction)} for anything else. Change the behaviour with
 * {@link #stopping()}, {@link #recording()}, {@link #risingOnly()}, {@link #fallingOnly()}.
 *
 * <p>Caution: an impact time or point computed here holds for the modelled forces only (no drag
 * unless supplied, no terrain). It is not fit for aiming or safety-area decisions; defer to local
 * codes and licensed practice.
 *
 * <p>Immutable and thread-safe when its crossing function is.
 */
public final class TrajectoryEvent {

    /** Which sign changes of the crossing function count as an occurrence. */
    public enum Direction {
        /** Negative to positive only. */
        RISING,
        /** Positive to negative only. */
        FALLING,
        /** Both. */
        EITHER
    }

    /** Default largest time between two sign checks (s). */
    public static final double DEFAULT_CHECK_INTERVAL = 0.1;

    /** Default accuracy of located event times (s). */
    public static final double DEFAULT_TIME_ACCURACY = 1e-10;

    private final String name;
    private final CrossingFunction function;
    private final Direction direction;
    private final boolean stops;
    private final double checkInterval;
    private final double timeAccuracy;

    private TrajectoryEvent(String name, CrossingFunction function, Direction direction, boolean stops,
                            double checkInterval, double timeAccuracy) {
        this.name = name;
        this.function = function;
        this.direction = direction;
        this.stops = stops;
        this.checkInterval = checkInterval;
        this.timeAccuracy = timeAccuracy;
    }

    /**
     * A user event: every zero crossing of {@code function}, in either direction, recorded
     * without stopping.
     *
     * @param name name reported in {@link EventMark#eventName()}, not blank
     * @param function the crossing function
     * @return the event
     * @throws IllegalArgumentException if {@code name} is blank
     * @throws NullPointerException if an argument is null
     */
    public static TrajectoryEvent of(String name, CrossingFunction function) {
        return new TrajectoryEvent(checkName(name), Arguments.nonNull("function", function), Direction.EITHER,
                false, DEFAULT_CHECK_INTERVAL, DEFAULT_TIME_ACCURACY);
    }

    /**
     * Ground impact: the point comes down through the plane at {@code groundHeight} along
     * {@code up} (function {@code r . up/|up| - groundHeight}, falling crossings only). Stops the
     * run; named "ground impact".
     *
     * @param up upward direction, in the integration frame (any non-zero length)
     * @param groundHeight height of the ground plane along {@code up}, from the frame origin (m)
     * @return the event
     * @throws IllegalArgumentException if {@code up} is zero or not finite, or the height not finite
     */
    public static TrajectoryEvent groundImpact(Vector3D up, double groundHeight) {
        Arguments.finite("groundHeight", groundHeight);
        return heightCrossing("ground impact", up, groundHeight).fallingOnly().stopping();
    }

    /**
     * Height crossing: the point passes the plane at {@code height} along {@code up} in either
     * direction (function {@code r . up/|up| - height}). Recorded without stopping.
     *
     * @param name name reported in {@link EventMark#eventName()}, not blank
     * @param up upward direction, in the integration frame (any non-zero length)
     * @param height height of the plane along {@code up}, from the frame origin (m)
     * @return the event
     * @throws IllegalArgumentException if {@code up} is zero or not finite, the height not finite,
     *         or the name blank
     */
    public static TrajectoryEvent heightCrossing(String name, Vector3D up, double height) {
        Vector3D u = Arguments.unitAxis("up", up);
        double h = Arguments.finite("height", height);
        double ux = u.getX();
        double uy = u.getY();
        double uz = u.getZ();
        return of(name, (time, s) -> {
            Vector3D r = s.position();
            return ux * r.getX() + uy * r.getY() + uz * r.getZ() - h;
        });
    }

    /**
     * Range reached: the horizontal distance (measured in the plane normal to {@code up}) from
     * {@code from} to the point passes {@code range}, in either direction. Recorded without
     * stopping.
     *
     * @param name name reported in {@link EventMark#eventName()}, not blank
     * @param up upward direction, in the integration frame (any non-zero length)
     * @param from reference point, in the integration frame (m)
     * @param range horizontal distance (m), positive
     * @return the event
     * @throws IllegalArgumentException if {@code up} is zero or not finite, {@code from} not
     *         finite, {@code range} not positive, or the name blank
     */
    public static TrajectoryEvent rangeReached(String name, Vector3D up, Vector3D from, double range) {
        Vector3D u = Arguments.unitAxis("up", up);
        Vector3D o = Arguments.finite("from", from);
        double d = Arguments.positive("range", range);
        return of(name, (time, s) -> {
            Vector3D r = s.position().subtract(o);
            double along = r.dotProduct(u);
            Vector3D horizontal = r.subtract(along, u);
            return horizontal.getNorm() - d;
        });
    }

    private static String checkName(String name) {
        Arguments.nonNull("name", name);
        if (name.isBlank()) {
            throw new IllegalArgumentException("name must not be blank");
        }
        return name;
    }

    /**
     * Returns a copy that ends the integration at its first counted occurrence.
     *
     * @return a copy that ends the integration at its first counted occurrence
     */
    public TrajectoryEvent stopping() {
        return new TrajectoryEvent(name, function, direction, true, checkInterval, timeAccuracy);
    }

    /**
     * Returns a copy that records every counted occurrence and lets the integration go on.
     *
     * @return a copy that records every counted occurrence and lets the integration go on
     */
    public TrajectoryEvent recording() {
        return new TrajectoryEvent(name, function, direction, false, checkInterval, timeAccuracy);
    }

    /**
     * Returns a copy counting only negative-to-positive crossings.
     *
     * @return a copy counting only negative-to-positive crossings
     */
    public TrajectoryEvent risingOnly() {
        return withDirection(Direction.RISING);
    }

    /**
     * Returns a copy counting only positive-to-negative crossings.
     *
     * @return a copy counting only positive-to-negative crossings
     */
    public TrajectoryEvent fallingOnly() {
        return withDirection(Direction.FALLING);
    }

    /**
     * A copy counting the given crossing directions.
     *
     * @param newDirection which sign changes count
     * @return the copy
     * @throws NullPointerException if {@code newDirection} is null
     */
    public TrajectoryEvent withDirection(Direction newDirection) {
        return new TrajectoryEvent(name, function, Arguments.nonNull("newDirection", newDirection), stops,
                checkInterval, timeAccuracy);
    }

    /**
     * A copy with another largest time between sign checks. Two crossings closer together than
     * this may be missed; smaller values cost more evaluations of the crossing function.
     *
     * @param seconds largest check interval (s), positive and finite
     * @return the copy
     * @throws IllegalArgumentException if {@code seconds} is not in (0, +inf)
     */
    public TrajectoryEvent withCheckInterval(double seconds) {
        return new TrajectoryEvent(name, function, direction, stops, Arguments.positive("seconds", seconds),
                timeAccuracy);
    }

    /**
     * A copy with another accuracy of the located event time.
     *
     * @param seconds time accuracy (s), positive and finite
     * @return the copy
     * @throws IllegalArgumentException if {@code seconds} is not in (0, +inf)
     */
    public TrajectoryEvent withTimeAccuracy(double seconds) {
        return new TrajectoryEvent(name, function, direction, stops, checkInterval,
                Arguments.positive("seconds", seconds));
    }

    /**
     * Returns the name reported in {@link EventMark#eventName()}.
     *
     * @return the name reported in {@link EventMark#eventName()}
     */
    public String name() {
        return name;
    }

    /**
     * Returns the crossing function.
     *
     * @return the crossing function
     */
    public CrossingFunction function() {
        return function;
    }

    /**
     * Returns which crossing directions count.
     *
     * @return which crossing directions count
     */
    public Direction direction() {
        return direction;
    }

    /**
     * Returns true if the first counted occurrence ends the integration.
     *
     * @return true if the first counted occurrence ends the integration
     */
    public boolean stops() {
        return stops;
    }

    /**
     * Returns largest time between sign checks (s).
     *
     * @return largest time between sign checks (s)
     */
    public double checkInterval() {
        return checkInterval;
    }

    /**
     * Returns accuracy of located event times (s).
     *
     * @return accuracy of located event times (s)
     */
    public double timeAccuracy() {
        return timeAccuracy;
    }

    @Override
    public String toString() {
        return "TrajectoryEvent{" + name + ", " + direction + (stops ? ", stops" : ", records")
                + ", checkInterval=" + Formats.number(checkInterval) + " s, timeAccuracy="
                + Formats.number(timeAccuracy) + " s}";
    }
}
