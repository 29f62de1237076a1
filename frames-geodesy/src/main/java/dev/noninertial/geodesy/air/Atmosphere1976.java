package dev.noninertial.geodesy.air;

/**
 * The U.S. Standard Atmosphere, 1976 (NOAA/NASA/USAF, 1976), lower part: temperature, pressure,
 * density and speed of sound from -5 km to 86 km geometric height, computed from the standard's
 * defining constants (REFERENCES.md, Air).
 *
 * <pre>{@code
 * Atmosphere1976 air = Atmosphere1976.standard();
 * double rho = air.density(1500.0);          // kg/m^3 at 1,500 m
 * }</pre>
 *
 * <h2>Model</h2>
 * The geometric height {@code z} is turned into geopotential height
 * {@code H = r0 z / (r0 + z)}, {@code r0 = 6356766 m}. In {@code H} the molecular-scale
 * temperature is piecewise linear with the standard's lapse rates (K/km): -6.5 from 0 km, 0.0
 * from 11, +1.0 from 20, +2.8 from 32, 0.0 from 47, -2.8 from 51, -2.0 from 71 up to 86 km
 * geometric (84.852 km geopotential); the first layer also serves from -5 km. Each layer's base
 * temperature and pressure are computed once, at class initialisation, from the sea-level values
 * {@code T0 = 288.15 K}, {@code p0 = 101325 Pa} and the constants {@code g0 = 9.80665 m/s^2},
 * {@code R* = 8.31432 J/(mol K)}, {@code M0 = 0.0289644 kg/mol}, by the hydrostatic law:
 * {@code p = pb (Tb / (Tb + L (H - Hb)))^(g0 M0 / (R* L))} in a layer with lapse {@code L},
 * {@code p = pb exp(-g0 M0 (H - Hb) / (R* Tb))} where {@code L = 0}. Density is
 * {@code rho = p M0 / (R* T)}, speed of sound {@code sqrt(gamma R* T / M0)} with
 * {@code gamma = 1.4}.
 *
 * <h2>Temperature above 80 km</h2>
 * {@link #temperature(double)} is the molecular-scale temperature {@code T_M}. Below 80 km it is
 * the kinetic temperature. From 80 to 86 km the standard's kinetic temperature is
 * {@code T_M M/M0}, with a mean molecular weight ratio {@code M/M0} falling from 1 to 0.999579
 * at 86 km (the standard's table, from memory), so this method reads up to 0.042 % (0.08 K)
 * high there. Pressure, density and speed of sound depend on {@code T_M / M} only and are the
 * standard's values at every height of the range.
 *
 * <p>Heights outside [-5 km, 86 km] are refused, never extrapolated. Immutable and
 * thread-safe; every method computes on primitives and allocates nothing.
 */
public final class Atmosphere1976 implements Atmosphere {

    private static final long serialVersionUID = 1L;

    /** Lowest geometric height of the model (m): the standard's tables start at -5 km. */
    public static final double MIN_HEIGHT = -5000.0;
    /** Highest geometric height of the model (m): the top of the standard's lower atmosphere. */
    public static final double MAX_HEIGHT = 86000.0;

    /** Sea-level temperature T0 (K), the standard's definition. */
    public static final double SEA_LEVEL_TEMPERATURE = 288.15;
    /** Sea-level pressure p0 (Pa), the standard's definition. */
    public static final double SEA_LEVEL_PRESSURE = 101325.0;
    /** Standard acceleration of gravity g0 (m/s^2) of the geopotential. */
    public static final double G0 = 9.80665;
    /** Universal gas constant R* (J/(mol K)) as the 1976 standard defines it. */
    public static final double GAS_CONSTANT = 8.31432;
    /** Sea-level mean molecular weight M0 (kg/mol). */
    public static final double MOLAR_MASS = 0.0289644;
    /** Effective Earth radius r0 (m) of the geopotential height. */
    public static final double EARTH_RADIUS = 6356766.0;
    /** Ratio of specific heats gamma of air. */
    public static final double GAMMA = 1.4;

    /** Layer bases, geopotential height (m). */
    private static final double[] BASE_HEIGHT = {0.0, 11000.0, 20000.0, 32000.0, 47000.0, 51000.0, 71000.0};
    /** Lapse rate of each layer (K/m). */
    private static final double[] LAPSE = {-0.0065, 0.0, 0.0010, 0.0028, 0.0, -0.0028, -0.0020};
    /** Base temperature of each layer (K), computed from T0 and the lapse rates. */
    private static final double[] BASE_TEMPERATURE = new double[LAPSE.length];
    /** Base pressure of each layer (Pa), computed from p0 by the hydrostatic law. */
    private static final double[] BASE_PRESSURE = new double[LAPSE.length];
    /** g0 M0 / R* (K/m). */
    private static final double GMR = G0 * MOLAR_MASS / GAS_CONSTANT;

    static {
        BASE_TEMPERATURE[0] = SEA_LEVEL_TEMPERATURE;
        BASE_PRESSURE[0] = SEA_LEVEL_PRESSURE;
        for (int i = 1; i < LAPSE.length; i++) {
            BASE_TEMPERATURE[i] = layerTemperature(i - 1, BASE_HEIGHT[i]);
            BASE_PRESSURE[i] = layerPressure(i - 1, BASE_HEIGHT[i]);
        }
    }

    private static final Atmosphere1976 STANDARD = new Atmosphere1976();

    private Atmosphere1976() {
    }

    /**
     * Returns the standard atmosphere (one shared, immutable instance).
     *
     * @return the standard atmosphere (one shared, immutable instance)
     */
    public static Atmosphere1976 standard() {
        return STANDARD;
    }

    /**
     * Geopotential height of a geometric height, {@code H = r0 z / (r0 + z)} with
     * {@code r0 = 6356766 m}.
     *
     * @param height geometric height z (m), in [-5 km, 86 km]
     * @return geopotential height H (m')
     * @throws IllegalArgumentException if {@code height} is outside [-5 km, 86 km] or NaN
     */
    public double geopotentialHeight(double height) {
        check(height);
        return geopotential(height);
    }

    /**
     * Molecular-scale temperature, the kinetic temperature below 80 km (see the class comment
     * for 80 to 86 km).
     *
     * @param height geometric height (m), in [-5 km, 86 km]
     * @return temperature (K)
     * @throws IllegalArgumentException if {@code height} is outside [-5 km, 86 km] or NaN
     */
    public double temperature(double height) {
        check(height);
        double h = geopotential(height);
        return layerTemperature(layer(h), h);
    }

    /**
     * Static pressure.
     *
     * @param height geometric height (m), in [-5 km, 86 km]
     * @return pressure (Pa)
     * @throws IllegalArgumentException if {@code height} is outside [-5 km, 86 km] or NaN
     */
    public double pressure(double height) {
        check(height);
        double h = geopotential(height);
        return layerPressure(layer(h), h);
    }

    /**
     * Density {@code rho = p M0 / (R* T)}.
     *
     * @param height geometric height (m), in [-5 km, 86 km]
     * @return density (kg/m^3)
     * @throws IllegalArgumentException if {@code height} is outside [-5 km, 86 km] or NaN
     */
    @Override
    public double density(double height) {
        check(height);
        double h = geopotential(height);
        int i = layer(h);
        return layerPressure(i, h) * MOLAR_MASS / (GAS_CONSTANT * layerTemperature(i, h));
    }

    /**
     * Speed of sound {@code sqrt(gamma R* T / M0)}.
     *
     * @param height geometric height (m), in [-5 km, 86 km]
     * @return speed of sound (m/s)
     * @throws IllegalArgumentException if {@code height} is outside [-5 km, 86 km] or NaN
     */
    @Override
    public double speedOfSound(double height) {
        check(height);
        double h = geopotential(height);
        return Math.sqrt(GAMMA * GAS_CONSTANT * layerTemperature(layer(h), h) / MOLAR_MASS);
    }

    private static void check(double height) {
        if (!(height >= MIN_HEIGHT && height <= MAX_HEIGHT)) {
            throw new IllegalArgumentException("height must be in [" + MIN_HEIGHT + ", " + MAX_HEIGHT
                    + "] m (geometric height of the U.S. Standard Atmosphere 1976), got " + height + " m");
        }
    }

    private static double geopotential(double z) {
        return EARTH_RADIUS * z / (EARTH_RADIUS + z);
    }

    /** Index of the layer holding geopotential height h (the first one also below 0). */
    private static int layer(double h) {
        int i = BASE_HEIGHT.length - 1;
        while (i > 0 && h < BASE_HEIGHT[i]) {
            i--;
        }
        return i;
    }

    private static double layerTemperature(int i, double h) {
        return BASE_TEMPERATURE[i] + LAPSE[i] * (h - BASE_HEIGHT[i]);
    }

    private static double layerPressure(int i, double h) {
        double tb = BASE_TEMPERATURE[i];
        double l = LAPSE[i];
        if (l == 0.0) {
            return BASE_PRESSURE[i] * Math.exp(-GMR * (h - BASE_HEIGHT[i]) / tb);
        }
        return BASE_PRESSURE[i] * Math.pow(tb / (tb + l * (h - BASE_HEIGHT[i])), GMR / l);
    }

    /**
     * Keeps the one shared instance on deserialization.
     *
     * @return the shared instance
     */
    private Object readResolve() {
        return STANDARD;
    }

    @Override
    public String toString() {
        return "U.S. Standard Atmosphere 1976 (geometric height " + MIN_HEIGHT + " m to " + MAX_HEIGHT + " m)";
    }
}
