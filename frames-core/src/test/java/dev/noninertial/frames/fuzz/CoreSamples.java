package dev.noninertial.frames.fuzz;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.function.Supplier;

import org.hipparchus.distribution.RealDistribution;
import org.hipparchus.distribution.continuous.NormalDistribution;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.RotationOrder;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.ode.nonstiff.ClassicalRungeKuttaIntegrator;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dispersion.DispersionCase;
import dev.noninertial.frames.dispersion.DispersionModel;
import dev.noninertial.frames.dispersion.DispersionResult;
import dev.noninertial.frames.dispersion.DispersionStudy;
import dev.noninertial.frames.dispersion.InputDistribution;
import dev.noninertial.frames.dynamics.CrossingFunction;
import dev.noninertial.frames.dynamics.InertialTerm;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.frames.dynamics.TrajectoryFailure;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.frames.sensing.IncrementLog;
import dev.noninertial.frames.motion.LogTable;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.motion.SampledMotion;

/**
 * Valid values of the frames-core types for {@link ApiFuzz} (demo values, invented). Frames
 * come from one small tree so that conversions between them are defined. Other modules start
 * from {@link #table()} and add their own types.
 */
public final class CoreSamples {

    /** Root of the sample tree. */
    public static final ReferenceFrame ROOT = ReferenceFrame.inertialRoot("yard");
    /** A spinning frame in the root. */
    public static final ReferenceFrame DISK = ROOT.attach("disk", Motions.spin(new Vector3D(0, 0.1, 1), 0.2, 0.3));
    /** A frame on the disk. */
    public static final ReferenceFrame ARM = DISK.attach("arm", Motions.stationary(new Vector3D(1, 0, 0)));

    /** A motion log of three samples over [0, 2] s. */
    public static final String LOG = "t[s], x[m], y[m], z[m], q0[1], q1[1], q2[1], q3[1]\n"
            + "0, 0, 0, 0, 1, 0, 0, 0\n1, 1, 0, 0, 1, 0, 0, 0\n2, 2, 0, 0, 1, 0, 0, 0\n";

    private CoreSamples() {
    }

    private static Rotation turn() {
        return new Rotation(RotationOrder.ZYX, RotationConvention.FRAME_TRANSFORM, 0.3, -0.2, 0.1);
    }

    private static Path logFile() {
        return textFile(LOG);
    }

    /** A temporary file holding {@code text}, deleted when the JVM exits. */
    private static Path textFile(String text) {
        try {
            Path p = Files.createTempFile("fuzz-log", ".csv");
            p.toFile().deleteOnExit();
            Files.writeString(p, text, StandardCharsets.UTF_8);
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static SampledMotion sampled() {
        return SampledMotion.fromArrays(new double[] {0, 1, 2}, new double[] {0, 0, 0, 1, 0, 0, 2, 0, 0},
                new double[] {1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0});
    }

    private static double[] ramp(int n) {
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = 0.1 * i;
        }
        return r;
    }

    private static double[] identityPlacement() {
        double[] p = new double[Placement.COMPONENTS];
        Placement.identity().toArray(p, 0);
        return p;
    }

    private static DispersionStudy study() {
        return DispersionStudy.of(c -> new double[] {c.value(0) * 2.0}, "y")
                .withInput("x", InputDistribution.normal(0.0, 1.0)).withCases(8);
    }

    /** A failure of a run whose force refuses every call. */
    private static TrajectoryFailure failure() {
        try {
            TrajectorySolver.of(ROOT).plusForce((t, state) -> {
                throw new IllegalArgumentException("the demo force refuses t = " + t);
            }).solve(PointState.stationary(Vector3D.PLUS_I), 0.0, 1.0);
        } catch (TrajectoryFailure f) {
            return f;
        }
        throw new IllegalStateException("the refusing force did not fail the run");
    }

    /** @return a new table of the core types */
    public static SampleValues table() {
        SampleValues s = new SampleValues();
        s.add(Double.class, () -> 0.5, () -> 1.0, () -> 0.1, () -> 2.0, () -> 10.0, () -> 0.0, () -> -0.5,
                () -> 100.0, () -> 1e-3, () -> 0.9);
        s.add(Float.class, () -> 0.5f);
        s.add(Integer.class, () -> 1, () -> 2, () -> 0, () -> 3, () -> 9, () -> 24, () -> 10);
        s.add(Long.class, () -> 1L, () -> 0L, () -> 42L);
        s.add(Boolean.class, () -> true, () -> false);
        s.add(String.class, () -> "x", () -> "alpha", () -> "t", () -> "y");
        s.add(double[].class, () -> new double[] {0, 1, 2}, () -> ramp(48), () -> new double[] {0, 0, 0, 1, 0, 0, 2, 0, 0},
                () -> new double[] {1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0}, CoreSamples::identityPlacement,
                () -> new double[] {0.5, 1, 2, 0, 0.1, 0, 0, 0, -9.8},
                () -> new double[] {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18});
        s.add(Vector3D.class, () -> new Vector3D(0.3, -0.2, 0.9), () -> Vector3D.PLUS_K, () -> new Vector3D(1, 2, 3),
                () -> Vector3D.ZERO);
        s.add(Rotation.class, CoreSamples::turn, () -> Rotation.IDENTITY);
        s.add(Placement.class, () -> Placement.of(new Vector3D(1, 2, 3), new Vector3D(0.1, 0, 0), Vector3D.ZERO, turn(),
                new Vector3D(0, 0, 0.3), new Vector3D(0.01, 0, 0)), Placement::identity);
        s.add(PointState.class, () -> PointState.of(new Vector3D(1, 2, 3), new Vector3D(0.5, 0, 0),
                new Vector3D(0, 0, -9.8)));
        s.add(ReferenceFrame.class, () -> DISK, () -> ROOT, () -> ARM);
        s.add(FramedState.class, () -> DISK.stateAt(0.5, PointState.stationary(new Vector3D(1, 0, 0))));
        s.add(Motion.class, () -> Motions.spin(Vector3D.PLUS_K, 0.1, 0.2), () -> Motions.stationary(Vector3D.PLUS_I),
                CoreSamples::sampled);
        s.add(SampledMotion.class, CoreSamples::sampled);
        s.add(SpecificForce.class, () -> (SpecificForce) (t, state) -> new Vector3D(0, 0, -9.8));
        s.add(CrossingFunction.class, () -> (CrossingFunction) (t, state) -> state.position().getZ() + 100.0);
        s.add(Trajectory.class, () -> TrajectorySolver.of(DISK).solve(PointState.stationary(new Vector3D(1, 0, 0)),
                0.0, 2.0));
        s.add(TrajectorySolver.class, () -> TrajectorySolver.of(DISK).withMaxEvaluations(20_000),
                () -> TrajectorySolver.of(ROOT).withMaxEvaluations(20_000));
        s.add(String[].class, () -> new String[] {"y"});
        s.add(Vector3D[].class, () -> new Vector3D[] {new Vector3D(1, 2, 3), new Vector3D(0.1, 0, 0)});
        // logs: a two-column table (invented) and the increments of two 10 ms intervals
        s.add(LogTable.Column.class, () -> LogTable.Column.of("t", new String[] {"s"}, new double[] {1.0}));
        s.add(LogTable.class, CoreSamples::table2);
        s.add(IncrementLog.class, () -> IncrementLog.ofUniform(0.0, 0.01, ramp(12)));
        s.add(DispersionStudy.class, CoreSamples::study);
        s.add(DispersionResult.class, () -> study().run());
        s.add(DispersionCase.class, () -> study().drawCase(3));
        s.add(RealDistribution.class, () -> new NormalDistribution(1.0, 2.0));
        s.add(TrajectoryFailure.class, CoreSamples::failure);
        s.add(Set.class, () -> EnumSet.noneOf(InertialTerm.class), () -> EnumSet.allOf(InertialTerm.class));
        s.add(Motion[].class, () -> new Motion[] {Motions.stationary(Vector3D.PLUS_I), Motions.stationary(Vector3D.PLUS_J),
            Motions.stationary(Vector3D.PLUS_K), Motions.stationary(Vector3D.ZERO)});
        s.add(double[][].class, () -> new double[3][3], () -> new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}});
        s.add(Class.class, () -> Placement.class);
        s.add(RuntimeException.class, () -> new IllegalArgumentException("demo refusal"));
        s.add(DispersionModel.class, () -> (DispersionModel) c -> new double[] {
            Arguments.nonNull("inputs", c).index() + 0.5});
        s.add(RealMatrix.class, () -> MatrixUtils.createRealIdentityMatrix(6), () -> MatrixUtils.createRealIdentityMatrix(3),
                () -> MatrixUtils.createRealIdentityMatrix(9));
        s.add(Path.class, CoreSamples::logFile);
        s.add(Reader.class, () -> new StringReader(LOG));
        s.add(Writer.class, StringWriter::new);
        s.add(Supplier.class, () -> (Supplier<?>) () -> new ClassicalRungeKuttaIntegrator(0.01));
        s.add(List.class, () -> List.of("x"), () -> List.of("x", "y"));
        addCalls(s);
        return s;
    }

    /** A placement with every part non-zero (demo values), in the matrix layout from index 0. */
    private static double[] placementArray(int length) {
        double[] p = new double[length];
        Placement.of(new Vector3D(1, 2, 3), new Vector3D(0.1, 0, 0), new Vector3D(0, 0.2, 0), turn(),
                new Vector3D(0, 0, 0.3), new Vector3D(0.01, 0, 0)).toArray(p, 0);
        return p;
    }

    /** {@code count} states of 9 doubles (position, velocity, acceleration), all non-zero. */
    private static double[] states(int count) {
        double[] s = new double[PointState.COMPONENTS * count];
        for (int i = 0; i < s.length; i++) {
            s[i] = 0.5 + 0.25 * i;
        }
        return s;
    }

    /** The table of the invented two-column log {@code t[s], x[m]}. */
    private static LogTable table2() {
        try {
            return LogTable.readCsv(new StringReader(TABLE_LOG), "demo-table.csv", TABLE_COLUMNS, "t[s], x[m]");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static final String TABLE_LOG = "t[s], x[m]\n0, 1.5\n1, 2.5\n";
    private static final List<LogTable.Column> TABLE_COLUMNS = List.of(
            LogTable.Column.of("t", new String[] {"s"}, new double[] {1.0}),
            LogTable.Column.of("x", new String[] {"m", "km"}, new double[] {1.0, 1e3}));
    private static final String INCREMENT_LOG = IncrementLog.HEADER + "\n0, 0.01, 0, 0, 0.098, 0, 0, 1e-4\n";

    /**
     * Valid calls whose arguments must agree with each other (see {@link SampleValues#addCall}):
     * offsets and counts that fit the arrays, times inside every sample motion's span [0, 2] s,
     * motions continuous at their join, a field inside its line.
     */
    private static void addCalls(SampleValues s) {
        s.addCall("LogTable.Column.of(String,String[],double[])",
                () -> new Object[] {"h", new String[] {"m", "ft"}, new double[] {1.0, 0.3048}});
        s.addCall("LogTable.readCsv(Reader,String,List,String)",
                () -> new Object[] {new StringReader(TABLE_LOG), "demo-table.csv", TABLE_COLUMNS, "t[s], x[m]"});
        s.addCall("LogTable.readCsv(Path,List,String)", () -> new Object[] {textFile(TABLE_LOG), TABLE_COLUMNS, "t[s], x[m]"});
        s.addCall("IncrementLog.of(double,double[],double[],double[])",
                () -> new Object[] {0.0, new double[] {0.01, 0.02}, ramp(6), ramp(6)});
        s.addCall("IncrementLog.readCsv(Reader,String)",
                () -> new Object[] {new StringReader(INCREMENT_LOG), "demo-imu.csv"});
        s.addCall("IncrementLog.readCsv(Path)", () -> new Object[] {textFile(INCREMENT_LOG)});
        // two states from index 0 of the times and the source, written from index 9 of the target
        // (room for one more state before them), the times inside [0, 2] s
        for (String direction : new String[] {"toBase", "fromBase"}) {
            s.addCall("Motion." + direction + "(double[],int,double[],int,double[],int,int)",
                    () -> new Object[] {new double[] {0.5, 1.5}, 0, states(2), 0,
                        new double[PointState.COMPONENTS * 3], PointState.COMPONENTS, 2});
        }
        // the same for one placement at many states: two states from index 0, written from index 9
        for (String direction : new String[] {"toBase", "fromBase"}) {
            s.addCall("Placement." + direction + "(double[],int,double[],int,int)", () -> new Object[] {states(2), 0,
                new double[PointState.COMPONENTS * 3], PointState.COMPONENTS, 2});
        }
        s.addCall("Placement.fromArray(double[],int)", () -> new Object[] {placementArray(Placement.COMPONENTS), 0});
        // the placement in the root, written from index 0 of a work array of exactly 2 x 24 doubles
        s.addCall("ReferenceFrame.placementIn(ReferenceFrame,double,double[],int)",
                () -> new Object[] {ROOT, 0.5, new double[2 * Placement.COMPONENTS], 0});
        // the field "1.25" of a data row (characters 3 to 7)
        s.addCall("LogText.number(String,int,int,String,int,String)",
                () -> new Object[] {"0, 1.25, 2", 3, 7, "demo.csv", 2, "x"});
        // a spin at 0.2 rad/s, then from 1 s a spin-up continuous with it at the join: the angle
        // 0.05 + 0.1 t + 0.05 t^2 and the rate 0.1 + 0.1 t equal 0.2 and 0.2 at t = 1
        s.addCall("Motions.sequence(double[],Motion[])", () -> new Object[] {new double[] {1.0},
            new Motion[] {Motions.spin(Vector3D.PLUS_K, 0.0, 0.2), Motions.spinUp(Vector3D.PLUS_K, 0.05, 0.1, 0.1)}});
    }
}
