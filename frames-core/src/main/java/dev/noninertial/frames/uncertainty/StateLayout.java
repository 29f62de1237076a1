package dev.noninertial.frames.uncertainty;

/**
 * Which components of a point state a covariance matrix covers, and in which order.
 *
 * <p>Both layouts follow the order of {@link dev.noninertial.frames.PointState#toArray(double[], int)}:
 * position x, y, z (m), then velocity x, y, z (m/s), then, for the nine-component layout,
 * acceleration x, y, z (m/s^2). All components are seen in and resolved in the frame the
 * covariance is tagged with.
 *
 * <p>An enum constant: immutable and thread-safe.
 */
public enum StateLayout {

    /** Position and velocity: six components, covariance in m^2, m^2/s, m^2/s^2. */
    POSITION_VELOCITY(6),

    /** Position, velocity and acceleration: nine components. */
    POSITION_VELOCITY_ACCELERATION(9);

    private final int size;

    StateLayout(int size) {
        this.size = size;
    }

    /**
     * Returns number of state components (6 or 9), the row and column count of the covariance.
     *
     * @return number of state components (6 or 9), the row and column count of the covariance
     */
    public int size() {
        return size;
    }

    /**
     * The layout with a given number of components.
     *
     * @param size 6 or 9
     * @param name argument name used in the message
     * @return the layout
     * @throws IllegalArgumentException for any other size
     */
    static StateLayout ofSize(String name, int size) {
        for (StateLayout layout : values()) {
            if (layout.size == size) {
                return layout;
            }
        }
        throw new IllegalArgumentException(name + " must be 6x6 (position, velocity) or 9x9 "
                + "(position, velocity, acceleration), got " + size + " rows");
    }
}
