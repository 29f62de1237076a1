package dev.noninertial.geodesy.air;

import java.io.Serializable;

/**
 * The air at a geometric height: the two properties {@link AirDrag} reads, density and speed of
 * sound. {@link Atmosphere1976} is the standard day and {@link SoundingAtmosphere} a sounding
 * measured on the day; implement this interface for another model (a hot or cold day of a local
 * standard) and pass it where an atmosphere is asked for.
 *
 * <pre>{@code
 * Atmosphere hotDay = new Atmosphere() {        // a model of the user's own
 *     public double density(double height) { return model.densityAt(height); }
 *     public double speedOfSound(double height) { return model.speedOfSoundAt(height); }
 * };
 * }</pre>
 *
 * <p>An implementation refuses a height outside the range it knows (NaN included) with an
 * exception that names the height and the range, never extrapolating; it is immutable and
 * thread-safe, allocates nothing per call (the drag calls it at every evaluation of the equations
 * of motion) and is serializable, as the forces that hold it are. {@link AirDrag} refuses, naming
 * the atmosphere and the height, a density that is negative or not finite and a speed of sound
 * that is not positive and finite.
 */
public interface Atmosphere extends Serializable {

    /**
     * Density of the air.
     *
     * @param height geometric height above the ellipsoid (m)
     * @return density (kg/m^3), finite and not negative
     * @throws IllegalArgumentException if {@code height} is outside the range of the model or NaN
     */
    double density(double height);

    /**
     * Speed of sound in the air.
     *
     * @param height geometric height above the ellipsoid (m)
     * @return speed of sound (m/s), positive and finite
     * @throws IllegalArgumentException if {@code height} is outside the range of the model or NaN
     */
    double speedOfSound(double height);
}
