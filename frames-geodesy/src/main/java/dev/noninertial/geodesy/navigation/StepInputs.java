package dev.noninertial.geodesy.navigation;

/**
 * How one public entry point of {@link LevelNavigator} or {@link ErrorBudget} names the inputs of
 * a step, so that the single check of {@link LevelKernel} refuses with the caller's parameter
 * names: the end time, and each component of the delta-velocity and the delta-angle. The names
 * are only built when a step is refused (nothing is allocated per step).
 */
final class StepInputs {

    private static final int VECTORS = 0;
    private static final int PRIMITIVE = 1;
    private static final int ARRAYS = 2;
    private static final int GRID = 3;
    private static final int INCREMENTS = 4;

    private static final String[] AXES = {"x", "y", "z"};
    private static final String[] PRIMITIVE_VELOCITY = {"dvx", "dvy", "dvz"};
    private static final String[] PRIMITIVE_ANGLE = {"dax", "day", "daz"};

    /** {@code (state, end, deltaVelocity, deltaAngle)}. */
    static final StepInputs OF_VECTORS = new StepInputs(VECTORS, 0);
    /** {@code (work, end, dvx, dvy, dvz, dax, day, daz)}. */
    static final StepInputs OF_PRIMITIVES = new StepInputs(PRIMITIVE, 0);
    /** {@code (start, ends, deltaVelocities, deltaAngles)}, step k from index 3 k. */
    static final StepInputs OF_ARRAYS = new StepInputs(ARRAYS, 0);
    /** {@code (start, increments...)} of {@code SensorIncrements}, step k from {@code increments[k]}. */
    static final StepInputs OF_INCREMENTS = new StepInputs(INCREMENTS, 0);

    private final int kind;
    private final int offset;

    private StepInputs(int kind, int offset) {
        this.kind = kind;
        this.offset = offset;
    }

    /**
     * {@code (start, interval, count, increments, offset)}: step k ends at
     * {@code start.time() + (k + 1) interval}, its increments from {@code offset + 6 k}.
     */
    static StepInputs ofGrid(int offset) {
        return new StepInputs(GRID, offset);
    }

    /** The end time of step {@code k} of the call. */
    String end(int k) {
        switch (kind) {
            case ARRAYS:
                return "ends[" + k + "]";
            case GRID:
                return "end time start.time() + " + (k + 1L) + " x interval";
            case INCREMENTS:
                return "increments[" + k + "].end()";
            default:
                return "end";
        }
    }

    /** Component {@code j} (0, 1, 2 for x, y, z) of the delta-velocity of step {@code k}. */
    String velocity(int k, int j) {
        return component(k, j, 0, "deltaVelocity", PRIMITIVE_VELOCITY);
    }

    /** Component {@code j} of the delta-angle of step {@code k}. */
    String angle(int k, int j) {
        return component(k, j, 3, "deltaAngle", PRIMITIVE_ANGLE);
    }

    /** The delta-velocity of step {@code k} as a whole. */
    String velocity(int k) {
        return group(k, 0, "deltaVelocity", PRIMITIVE_VELOCITY);
    }

    /** The delta-angle of step {@code k} as a whole. */
    String angle(int k) {
        return group(k, 3, "deltaAngle", PRIMITIVE_ANGLE);
    }

    private String component(int k, int j, int gridShift, String vector, String[] primitive) {
        String plain = vector + " " + AXES[j];
        switch (kind) {
            case PRIMITIVE:
                return primitive[j] + " (" + plain + ")";
            case ARRAYS:
                return (vector.equals("deltaVelocity") ? "deltaVelocities[" : "deltaAngles[") + (3L * k + j) + "] ("
                        + plain + ")";
            case GRID:
                return "increments[" + (offset + 6L * k + gridShift + j) + "] (" + plain + ")";
            case INCREMENTS:
                return "increments[" + k + "]." + vector + "() " + AXES[j];
            default:
                return plain;
        }
    }

    private String group(int k, int gridShift, String vector, String[] primitive) {
        switch (kind) {
            case PRIMITIVE:
                return vector + " (" + primitive[0] + ", " + primitive[1] + ", " + primitive[2] + ")";
            case ARRAYS:
                return (vector.equals("deltaVelocity") ? "deltaVelocities[" : "deltaAngles[") + 3L * k + ".."
                        + (3L * k + 2) + "] (" + vector + ")";
            case GRID:
                return "increments[" + (offset + 6L * k + gridShift) + ".." + (offset + 6L * k + gridShift + 2)
                        + "] (" + vector + ")";
            case INCREMENTS:
                return "increments[" + k + "]." + vector + "()";
            default:
                return vector;
        }
    }
}
