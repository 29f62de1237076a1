package dev.noninertial.geodesy.air;

import java.util.Arrays;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * An atmosphere measured on the day: a sounding's levels (geometric heights above the ellipsoid
 * with the density and speed of sound there, or the pressure and temperature they follow from)
 * interpolated between levels, for {@link AirDrag} in place of the standard day.
 *
 * <pre>{@code
 * Atmosphere today = SoundingAtmosphere.ofPressureTemperature(
 *         new double[] {12, 500, 1000, 2000},                  // m
 *         new double[] {100900, 95180, 89550, 79120},          // Pa
 *         new double[] {281.4, 278.9, 276.0, 270.2});          // K
 * }</pre>
 *
 * <h2>Interpolation</h2>
 * Between two levels the density is interpolated linearly in its logarithm (exact for an
 * isothermal layer, where the density falls exponentially with height), the speed of sound
 * linearly in its square (exact where the temperature is linear in height, since {@code a^2} is
 * proportional to the temperature). At a level the values are the level's. Heights outside the
 * lowest and highest level are refused, never extrapolated.
 *
 * <h2>From pressure and temperature</h2>
 * {@link #ofPressureTemperature} uses the constants of the U.S. Standard Atmosphere 1976 for dry
 * air ({@link Atmosphere1976#GAS_CONSTANT}, {@link Atmosphere1976#MOLAR_MASS},
 * {@link Atmosphere1976#GAMMA}): {@code rho = p M0 / (R* T)}, {@code a = sqrt(gamma R* T / M0)}.
 * For moist air pass the virtual temperature for the density (common practice; the speed of sound
 * then comes out slightly high, by about 0.1 % in warm humid air).
 *
 * <p>Immutable, thread-safe and serializable; each call computes on primitives and allocates
 * nothing. Results are for simulation and analysis only, not for aiming, firing or safety-area
 * decisions; defer to local codes, standards and licensed practice.
 */
public final class SoundingAtmosphere implements Atmosphere {

    private static final long serialVersionUID = 1L;

    /** Level heights (m), strictly increasing. */
    private final double[] heights;
    /** Natural logarithm of the density at each level. */
    private final double[] logDensities;
    /** Square of the speed of sound at each level (m^2/s^2). */
    private final double[] squaredSpeeds;

    private SoundingAtmosphere(double[] heights, double[] logDensities, double[] squaredSpeeds) {
        this.heights = heights;
        this.logDensities = logDensities;
        this.squaredSpeeds = squaredSpeeds;
    }

    /**
     * A sounding of densities and speeds of sound.
     *
     * @param heights geometric heights of the levels above the ellipsoid (m), at least 2,
     *        strictly increasing, finite
     * @param densities density at each level (kg/m^3), positive and finite
     * @param speedsOfSound speed of sound at each level (m/s), positive and finite
     * @return the atmosphere
     * @throws IllegalArgumentException if the lengths differ, there are fewer than 2 levels, or a
     *         value is out of range (the message names the level)
     */
    public static SoundingAtmosphere of(double[] heights, double[] densities, double[] speedsOfSound) {
        checkLevels(heights, densities, "densities", speedsOfSound, "speedsOfSound");
        int n = heights.length;
        double[] logRho = new double[n];
        double[] a2 = new double[n];
        for (int i = 0; i < n; i++) {
            Arguments.positive("densities[" + i + "] (kg/m^3)", densities[i]);
            Arguments.positive("speedsOfSound[" + i + "] (m/s)", speedsOfSound[i]);
            logRho[i] = Math.log(densities[i]);
            a2[i] = speedsOfSound[i] * speedsOfSound[i];
        }
        return new SoundingAtmosphere(heights.clone(), logRho, a2);
    }

    /**
     * A sounding of pressures and temperatures, dry air with the 1976 standard's constants.
     *
     * @param heights geometric heights of the levels above the ellipsoid (m), at least 2,
     *        strictly increasing, finite
     * @param pressures pressure at each level (Pa), positive and finite
     * @param temperatures temperature at each level (K), positive and finite
     * @return the atmosphere
     * @throws IllegalArgumentException if the lengths differ, there are fewer than 2 levels, or a
     *         value is out of range (the message names the level)
     */
    public static SoundingAtmosphere ofPressureTemperature(double[] heights, double[] pressures,
                                                           double[] temperatures) {
        checkLevels(heights, pressures, "pressures", temperatures, "temperatures");
        int n = heights.length;
        double[] rho = new double[n];
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            Arguments.positive("pressures[" + i + "] (Pa)", pressures[i]);
            Arguments.positive("temperatures[" + i + "] (K)", temperatures[i]);
            rho[i] = pressures[i] * Atmosphere1976.MOLAR_MASS / (Atmosphere1976.GAS_CONSTANT * temperatures[i]);
            a[i] = Math.sqrt(Atmosphere1976.GAMMA * Atmosphere1976.GAS_CONSTANT * temperatures[i]
                    / Atmosphere1976.MOLAR_MASS);
        }
        return of(heights, rho, a);
    }

    private static void checkLevels(double[] heights, double[] first, String firstName, double[] second,
                                    String secondName) {
        Arguments.nonNull("heights", heights);
        Arguments.nonNull(firstName, first);
        Arguments.nonNull(secondName, second);
        if (heights.length < 2) {
            throw new IllegalArgumentException("heights must hold at least 2 levels, got " + heights.length);
        }
        if (first.length != heights.length || second.length != heights.length) {
            throw new IllegalArgumentException(firstName + " and " + secondName + " must hold one value per height ("
                    + heights.length + "), got " + first.length + " and " + second.length);
        }
        for (int i = 0; i < heights.length; i++) {
            Arguments.finite("heights[" + i + "] (m)", heights[i]);
            if (i > 0 && !(heights[i] > heights[i - 1])) {
                throw new IllegalArgumentException("heights must increase strictly: heights[" + i + "] = "
                        + heights[i] + " m after heights[" + (i - 1) + "] = " + heights[i - 1] + " m");
            }
        }
    }

    /**
     * Returns the lowest level's height (m).
     *
     * @return the lowest level's height (m)
     */
    public double minHeight() {
        return heights[0];
    }

    /**
     * Returns the highest level's height (m).
     *
     * @return the highest level's height (m)
     */
    public double maxHeight() {
        return heights[heights.length - 1];
    }

    /**
     * Returns the number of levels.
     *
     * @return the number of levels
     */
    public int size() {
        return heights.length;
    }

    /**
     * Density, interpolated linearly in its logarithm between the levels around {@code height}.
     *
     * @param height geometric height (m), within the sounding's levels
     * @return density (kg/m^3)
     * @throws IllegalArgumentException if {@code height} is outside the levels or NaN
     */
    @Override
    public double density(double height) {
        int i = level(height);
        return Math.exp(between(logDensities, i, height));
    }

    /**
     * Speed of sound, interpolated linearly in its square between the levels around {@code height}.
     *
     * @param height geometric height (m), within the sounding's levels
     * @return speed of sound (m/s)
     * @throws IllegalArgumentException if {@code height} is outside the levels or NaN
     */
    @Override
    public double speedOfSound(double height) {
        int i = level(height);
        return Math.sqrt(between(squaredSpeeds, i, height));
    }

    /** Index of the level at or below {@code height}, the last interval's start for the top level. */
    private int level(double height) {
        if (!(height >= heights[0] && height <= heights[heights.length - 1])) {
            throw new IllegalArgumentException("height must be within the sounding's levels [" + heights[0] + ", "
                    + heights[heights.length - 1] + "] m, got " + height + " m");
        }
        int i = Arrays.binarySearch(heights, height);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.min(i, heights.length - 2);
    }

    private double between(double[] values, int i, double height) {
        double u = (height - heights[i]) / (heights[i + 1] - heights[i]);
        return u == 0.0 ? values[i] : u == 1.0 ? values[i + 1] : values[i] + u * (values[i + 1] - values[i]);
    }

    /**
     * A stream is untrusted input: the levels are checked again.
     *
     * @param in the stream
     * @throws java.io.IOException if the stream cannot be read or holds invalid levels
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            checkLevels(heights, logDensities, "logDensities", squaredSpeeds, "squaredSpeeds");
            for (int i = 0; i < heights.length; i++) {
                Arguments.finite("logDensities[" + i + "]", logDensities[i]);
                Arguments.positive("squaredSpeeds[" + i + "]", squaredSpeeds[i]);
            }
        } catch (RuntimeException e) {
            throw Arguments.refusedStream(SoundingAtmosphere.class, e);
        }
    }

    @Override
    public String toString() {
        return "SoundingAtmosphere{" + heights.length + " levels, " + Formats.number(heights[0]) + " to "
                + Formats.number(heights[heights.length - 1]) + " m}";
    }
}
