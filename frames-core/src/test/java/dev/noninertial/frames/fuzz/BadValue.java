package dev.noninertial.frames.fuzz;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * One bad value for a parameter: its kind (used in report keys and the allow-list) and the value.
 *
 * @param kind short name of the kind: null, NaN, +Inf, -Inf, huge, -huge, subnormal, empty, NaN[0],
 *        +Inf[0], -1, MIN, MAX
 * @param value the value passed
 */
public record BadValue(String kind, Object value) {

    /** Magnitude used for "huge": near the top of the double range, products overflow. */
    static final double HUGE = 1e300;

    /**
     * The bad values for a parameter type.
     *
     * @param type the parameter type
     * @param valid a valid value of that type (arrays are derived from it)
     * @return the bad values to try, one call each
     */
    public static List<BadValue> forType(Class<?> type, Object valid) {
        List<BadValue> out = new ArrayList<>();
        if (type == double.class || type == Double.class) {
            out.add(new BadValue("NaN", Double.NaN));
            out.add(new BadValue("+Inf", Double.POSITIVE_INFINITY));
            out.add(new BadValue("-Inf", Double.NEGATIVE_INFINITY));
            out.add(new BadValue("huge", HUGE));
            out.add(new BadValue("-huge", -HUGE));
            out.add(new BadValue("subnormal", Double.MIN_VALUE));
        } else if (type == float.class) {
            out.add(new BadValue("NaN", Float.NaN));
            out.add(new BadValue("+Inf", Float.POSITIVE_INFINITY));
            out.add(new BadValue("huge", Float.MAX_VALUE));
        } else if (type == int.class || type == Integer.class) {
            out.add(new BadValue("-1", -1));
            out.add(new BadValue("MIN", Integer.MIN_VALUE));
            out.add(new BadValue("MAX", Integer.MAX_VALUE));
        } else if (type == long.class || type == Long.class) {
            out.add(new BadValue("-1", -1L));
            out.add(new BadValue("MIN", Long.MIN_VALUE));
            out.add(new BadValue("MAX", Long.MAX_VALUE));
        } else if (type.isPrimitive()) {
            return out; // boolean, char, byte, short: every value is valid
        } else {
            out.add(new BadValue("null", null));
            if (type == double[].class) {
                out.add(new BadValue("empty", new double[0]));
                double[] v = (double[]) valid;
                if (v != null && v.length > 0) {
                    double[] nan = v.clone();
                    nan[0] = Double.NaN;
                    out.add(new BadValue("NaN[0]", nan));
                    double[] inf = v.clone();
                    inf[0] = Double.POSITIVE_INFINITY;
                    out.add(new BadValue("+Inf[0]", inf));
                }
            } else if (type.isArray()) {
                out.add(new BadValue("empty", java.lang.reflect.Array.newInstance(type.getComponentType(), 0)));
            } else if (type == Vector3D.class) {
                out.add(new BadValue("NaN", new Vector3D(Double.NaN, 0, 0)));
                out.add(new BadValue("+Inf", new Vector3D(0, Double.POSITIVE_INFINITY, 0)));
                out.add(new BadValue("huge", new Vector3D(HUGE, HUGE, HUGE)));
            } else if (type == Rotation.class) {
                out.add(new BadValue("NaN", new Rotation(Double.NaN, 0, 0, 0, false)));
            }
        }
        return out;
    }
}
