package dev.noninertial.geodesy.navigation;

/**
 * A term of the local-level mechanization that a {@link LevelNavigator} can leave out, so that an
 * {@link ErrorBudget} shows what each one is worth for a given run.
 *
 * <p>An enum constant: immutable and thread-safe.
 */
public enum NavigationTerm {
    /** Earth rate {@code w_ie} in the attitude update (the level frame's turn with the Earth). */
    EARTH_RATE("Earth rate (attitude)"),
    /**
     * Transport rate {@code w_en}: in the attitude update and as the velocity equation's
     * transport-rate term {@code -w_en x v}.
     */
    TRANSPORT_RATE("transport rate (attitude, velocity)"),
    /** Coriolis term {@code -2 w_ie x v} of the velocity equation. */
    CORIOLIS("Coriolis (velocity)"),
    /**
     * Height dependence of normal gravity: left out, gravity is evaluated at the navigator's
     * gravity reference height ({@link LevelNavigator#withGravityReference}).
     */
    GRAVITY_HEIGHT("gravity height dependence"),
    /**
     * Latitude dependence of normal gravity: left out, gravity is evaluated at the navigator's
     * gravity reference latitude.
     */
    GRAVITY_LATITUDE("gravity latitude dependence"),
    /** Coning correction of the attitude update (the non-commutativity of rotations). */
    CONING("coning correction"),
    /** Sculling correction of the velocity update. */
    SCULLING("sculling correction"),
    /**
     * Size effect: the accelerometers' offsets from the navigation centre
     * ({@link LevelNavigator#withAccelerometerOffsets}); no effect while all offsets are zero.
     */
    SIZE_EFFECT("size effect");

    private final String label;

    NavigationTerm(String label) {
        this.label = label;
    }

    /**
     * Returns a short readable label, as printed in the error-budget table.
     *
     * @return a short readable label, as printed in the error-budget table
     */
    public String label() {
        return label;
    }
}
