package dev.noninertial.geodesy.air;

import java.io.Serializable;
import java.util.Arrays;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;

/**
 * The wind: the velocity of the air relative to the Earth, in local-level east-north-up axes at
 * the point, as a function of geodetic height and time. "Relative to the Earth" means the air at
 * rest in a calm turns with the Earth; {@link AirDrag} adds that turning itself.
 *
 * <p><b>Conventions.</b> The result is (east, north, up) in m/s: the direction the air moves
 * toward (a "west wind" blowing from the west toward the east has a positive east component).
 * {@code height} is the geodetic (ellipsoidal) height in m, {@code time} in s from the epoch of
 * the Earth frames.
 *
 * <p>Implementations must be thread-safe, return finite components and should allocate nothing
 * on their own when the wind does not vary (return a stored vector): drag calls them at every
 * evaluation of the equations of motion.
 */
@FunctionalInterface
public interface WindProfile extends Serializable {

    /**
     * The wind at a height and time.
     *
     * @param height geodetic height (m)
     * @param time time (s from the epoch of the Earth frames)
     * @return air velocity relative to the Earth (m/s), east-north-up axes
     */
    Vector3D velocityAt(double height, double time);

    /**
     * Whether this is the calm (zero everywhere); drag then skips the wind entirely.
     *
     * @return true only for {@link #calm()}
     */
    default boolean isCalm() {
        return false;
    }

    /**
     * Returns no wind at any height and time.
     *
     * @return no wind at any height and time
     */
    static WindProfile calm() {
        return Calm.INSTANCE;
    }

    /**
     * The same horizontal wind at every height and time.
     *
     * @param east east component (m/s), the direction the air moves toward
     * @param north north component (m/s)
     * @return the wind
     * @throws IllegalArgumentException if a component is not finite
     */
    static WindProfile steady(double east, double north) {
        return new Steady(new Vector3D(Arguments.finite("east", east), Arguments.finite("north", north), 0.0));
    }

    /**
     * A horizontal wind that varies with height, linearly between tabulated heights, steady in
     * time. Heights outside the table are refused by {@link #velocityAt(double, double)}.
     *
     * @param heights at least two geodetic heights (m), finite, strictly increasing
     * @param east east components (m/s) at those heights
     * @param north north components (m/s) at those heights
     * @return the wind
     * @throws IllegalArgumentException if the table is too short, the lengths differ, a height is
     *         not above its predecessor, or a value is not finite
     * @throws NullPointerException if an array is null
     */
    static WindProfile layered(double[] heights, double[] east, double[] north) {
        return Layered.of(heights, east, north);
    }

    /** No wind. */
    enum Calm implements WindProfile {
        /** The one calm. */
        INSTANCE;

        @Override
        public Vector3D velocityAt(double height, double time) {
            return Vector3D.ZERO;
        }

        @Override
        public boolean isCalm() {
            return true;
        }

        @Override
        public String toString() {
            return "calm";
        }
    }

    /**
     * A steady, uniform wind.
     *
     * @param enu the wind (m/s), east-north-up axes
     */
    record Steady(Vector3D enu) implements WindProfile {

        private static final long serialVersionUID = 1L;

        /**
         * Validates the wind.
         *
         * @param enu the wind (m/s), east-north-up axes, finite
         */
        public Steady {
            Arguments.finite("enu", enu);
        }

        @Override
        public Vector3D velocityAt(double height, double time) {
            return enu;
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "steady wind east %s m/s, north %s m/s", enu.getX(), enu.getY());
        }
    }

    /** A wind tabulated in height, linear between the heights. */
    final class Layered implements WindProfile {

        private static final long serialVersionUID = 1L;

        /** Heights (m), increasing. */
        private final double[] heights;
        /** East components (m/s). */
        private final double[] east;
        /** North components (m/s). */
        private final double[] north;

        private Layered(double[] heights, double[] east, double[] north) {
            this.heights = heights;
            this.east = east;
            this.north = north;
        }

        static Layered of(double[] heights, double[] east, double[] north) {
            Arguments.nonNull("heights", heights);
            Arguments.nonNull("east", east);
            Arguments.nonNull("north", north);
            if (heights.length < 2) {
                throw new IllegalArgumentException("heights must hold at least 2 values, got " + heights.length);
            }
            if (east.length != heights.length || north.length != heights.length) {
                throw new IllegalArgumentException("east and north must hold as many values as heights ("
                        + heights.length + "), got " + east.length + " and " + north.length);
            }
            for (int i = 0; i < heights.length; i++) {
                Arguments.finite("heights[" + i + "]", heights[i]);
                Arguments.finite("east[" + i + "]", east[i]);
                Arguments.finite("north[" + i + "]", north[i]);
                if (i > 0 && !(heights[i] > heights[i - 1])) {
                    throw new IllegalArgumentException("heights must be strictly increasing: heights[" + i + "] = "
                            + heights[i] + " m is not above heights[" + (i - 1) + "] = " + heights[i - 1] + " m");
                }
            }
            return new Layered(heights.clone(), east.clone(), north.clone());
        }

        /**
         * {@inheritDoc}
         *
         * @throws IllegalArgumentException if {@code height} is outside the table
         */
        @Override
        public Vector3D velocityAt(double height, double time) {
            if (!(height >= heights[0] && height <= heights[heights.length - 1])) {
                throw new IllegalArgumentException("height must be in [" + heights[0] + ", "
                        + heights[heights.length - 1] + "] m (the wind table), got " + height + " m");
            }
            int k = Arrays.binarySearch(heights, height);
            if (k >= 0) {
                return new Vector3D(east[k], north[k], 0.0);
            }
            k = -k - 2;
            double s = (height - heights[k]) / (heights[k + 1] - heights[k]);
            return new Vector3D(east[k] + s * (east[k + 1] - east[k]), north[k] + s * (north[k + 1] - north[k]), 0.0);
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "layered wind, %d heights from %s m to %s m", heights.length,
                    heights[0], heights[heights.length - 1]);
        }
    }
}
