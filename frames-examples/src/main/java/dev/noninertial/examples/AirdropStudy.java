package dev.noninertial.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dispersion.DispersionCase;
import dev.noninertial.frames.dispersion.DispersionModel;
import dev.noninertial.frames.dispersion.DispersionResult;
import dev.noninertial.frames.dispersion.DispersionStudy;
import dev.noninertial.frames.dispersion.InputDistribution;
import dev.noninertial.frames.dynamics.Trajectory;
import dev.noninertial.frames.dynamics.TrajectoryEvent;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;
import dev.noninertial.geodesy.air.Atmosphere1976;
import dev.noninertial.geodesy.air.WindProfile;

/**
 * An invented dispersion study: the footprint of relief-cargo bundles dropped under round
 * parachutes over the (invented) Tollan Heath drop zone, inland of the demo's Kelvaro Point. Each
 * bundle leaves an aircraft flying about due east at 1000 m above the zone, descends under its
 * canopy (opened at release, a simplification) through the U.S. Standard Atmosphere 1976 in a
 * steady wind, on the rotating WGS84 Earth (gravitation, drag relative to the air turning with
 * the Earth, and the local-level frame's Coriolis, centrifugal and Euler terms), and lands after
 * about 100 s. Inputs are the release point's errors, height, ground speed and heading, the
 * bundle's ballistic coefficient and the wind's two components; outcomes are the landing point
 * east and north of the zone's marker and the descent time.
 *
 * <p>Usage: {@code AirdropStudy [--cases N] [--seed S] [--threads T] [--out DIR]}: prints the
 * footprint and, with {@code --out}, writes {@code DIR/airdrop-cases.csv}. The Spark module
 * runs the same study on Spark with {@code AirdropCommand --spark}.
 *
 * <p>Invented place and numbers, for demonstration only: not for planning drops or safety areas;
 * defer to local codes, standards and licensed practice.
 */
public final class AirdropStudy {

    /** Printed before the footprint. */
    public static final String CAUTION = "CAUTION: simulation and analysis only, not for planning drops, "
            + "safety or hazard areas;\n         defer to local codes, standards and licensed practice. "
            + "The drop zone and all numbers are invented.";

    /** Epoch of t = 0 (read as UT1). */
    public static final Instant EPOCH = Instant.parse("2026-06-21T09:30:00Z");

    /** The drop zone's marker (invented place): the origin of the study's east-north-up axes. */
    public static final LatLonHeight TOLLAN_HEATH = LatLonHeight.ofDegrees(57.71, 11.52, 48.0);

    /** Outcome names: landing point east and north of the marker (m), descent time (s). */
    public static final String EAST = "east_m";
    /** Landing point north of the marker (m). */
    public static final String NORTH = "north_m";
    /** Descent time (s). */
    public static final String DESCENT = "descent_s";

    /** Planned release point east of the marker (m): upwind of the forecast wind. */
    public static final double PLANNED_EAST = -425.0;

    /** Integration tolerance of each descent (m on position, m/s on velocity, and relative). */
    public static final double TOLERANCE = 1e-3;

    /**
     * Largest integration step (s): the drag's time constant near terminal speed is about 1 s, and
     * longer explicit steps leave the stability region (trial stages then probe far below ground).
     */
    public static final double MAX_STEP = 2.0;

    /** Interval between checks of the ground crossing (s); the crossing is then located to 1e-10 s. */
    public static final double CHECK_INTERVAL = 5.0;

    private AirdropStudy() {
    }

    /**
     * The study with its invented input distributions.
     *
     * @param cases number of cases
     * @param seed master seed
     * @return the study
     */
    public static DispersionStudy study(int cases, long seed) {
        return DispersionStudy.of(new DescentModel(), EAST, NORTH, DESCENT)
                .withInput("alongTrack_m", InputDistribution.normal(0.0, 30.0))
                .withInput("crossTrack_m", InputDistribution.normal(0.0, 15.0))
                .withInput("releaseHeight_m", InputDistribution.normal(1000.0, 15.0))
                .withInput("groundSpeed_mps", InputDistribution.normal(65.0, 2.0))
                .withInput("heading_deg", InputDistribution.normal(90.0, 1.5))
                .withInput("ballistic_kgm2", InputDistribution.truncatedNormal(6.5, 0.5, 5.0, 8.0))
                .withInput("windEast_mps", InputDistribution.normal(4.0, 1.5))
                .withInput("windNorth_mps", InputDistribution.normal(-1.0, 1.5))
                .withCases(cases).withSeed(seed);
    }

    /**
     * The study's Earth: WGS84, rotating, epoch {@link #EPOCH}.
     *
     * @return the Earth frames
     */
    public static EarthFrames earth() {
        return EarthFrames.of(EarthModel.WGS84, EPOCH);
    }

    /**
     * The drop zone's east-north-up frame, origin at the marker {@link #TOLLAN_HEATH}.
     *
     * @param earth the study's Earth frames
     * @return the frame
     */
    public static ReferenceFrame zone(EarthFrames earth) {
        return earth.localLevel("Tollan Heath ENU", TOLLAN_HEATH, LocalAxes.ENU);
    }

    /**
     * The model: one bundle's descent, integrated in the drop zone's east-north-up frame.
     * Serializable (it travels to Spark executors): it holds only the Earth frames and rebuilds
     * the per-case drag force and solver for each case.
     */
    static final class DescentModel implements DispersionModel {

        private static final long serialVersionUID = 1L;

        private final EarthFrames earth = earth();
        private final ReferenceFrame zone = zone(earth);
        private final Atmosphere1976 air = Atmosphere1976.standard();

        @Override
        public double[] outcome(DispersionCase c) {
            double heading = Math.toRadians(c.value(4));
            double alongE = Math.sin(heading);   // heading clockwise from north
            double alongN = Math.cos(heading);
            double x = PLANNED_EAST + c.value(0) * alongE + c.value(1) * alongN;   // cross track: to the right
            double y = c.value(0) * alongN - c.value(1) * alongE;
            double speed = c.value(3);
            TrajectorySolver solver = TrajectorySolver.of(zone)
                    .plusForce(earth.gravitationIn(zone))
                    .plusForce(earth.dragIn(zone, air, c.value(5), WindProfile.steady(c.value(6), c.value(7))))
                    .plusEvent(TrajectoryEvent.groundImpact(Vector3D.PLUS_K, 0.0).withCheckInterval(CHECK_INTERVAL))
                    .withTolerance(TOLERANCE)
                    .withMaxStep(MAX_STEP);
            Trajectory descent = solver.solve(PointState.of(new Vector3D(x, y, c.value(2)),
                    new Vector3D(speed * alongE, speed * alongN, 0.0)), 0.0, 600.0);
            if (descent.stopEvent().isEmpty()) {
                throw new IllegalStateException("the bundle did not land within 600 s");
            }
            Vector3D landing = descent.finalState().state().position();
            return new double[] {landing.getX(), landing.getY(), descent.endTime()};
        }

        @Override
        public String toString() {
            return "airdrop descent over " + TOLLAN_HEATH + " in " + zone.path();
        }
    }

    /**
     * The printed report: caution, the study, the runner and its time, the footprint.
     *
     * @param study the study that ran
     * @param result its result
     * @param runner how it ran (for example "local runner, 2 threads")
     * @param seconds wall time of the run (s)
     * @return readable text
     */
    public static String report(DispersionStudy study, DispersionResult result, String runner, double seconds) {
        StringBuilder text = new StringBuilder();
        text.append(CAUTION).append("\n\n");
        text.append("Airdrop footprint, Tollan Heath drop zone (invented), marker at ").append(TOLLAN_HEATH).append('\n');
        text.append("release planned ").append(-PLANNED_EAST).append(" m west of the marker, 1000 m above it, heading 090\n");
        text.append(study.cases()).append(" cases, master seed ").append(study.seed()).append(", ").append(runner)
                .append(String.format(java.util.Locale.ROOT, ", %.2f s (%.3f ms per case)%n", seconds,
                        1e3 * seconds / study.cases()));
        text.append(result.footprint(EAST, NORTH));
        text.append(String.format(java.util.Locale.ROOT, "descent time          median %.1f s, 5th-95th percentile %.1f - %.1f s%n",
                result.percentile(DESCENT, 50), result.percentile(DESCENT, 5), result.percentile(DESCENT, 95)));
        return text.toString();
    }

    /**
     * Entry point: runs the study with the local runner.
     *
     * @param args {@code [--cases N] [--seed S] [--threads T] [--out DIR]}
     * @throws IOException if the CSV file cannot be written
     */
    public static void main(String[] args) throws IOException {
        int cases = 2000;
        long seed = 20261202L;
        int threads = Runtime.getRuntime().availableProcessors();
        Path out = null;
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            if ("--cases".equals(a) && i + 1 < args.length) {
                cases = Integer.parseInt(args[++i]);
            } else if ("--seed".equals(a) && i + 1 < args.length) {
                seed = Long.parseLong(args[++i]);
            } else if ("--threads".equals(a) && i + 1 < args.length) {
                threads = Integer.parseInt(args[++i]);
            } else if ("--out".equals(a) && i + 1 < args.length) {
                out = Path.of(args[++i]);
            } else {
                System.err.println("unknown or incomplete argument '" + a
                        + "'; usage: AirdropStudy [--cases N] [--seed S] [--threads T] [--out DIR]");
                System.exit(2);
                return;
            }
        }
        DispersionStudy study = study(cases, seed);
        long t0 = System.nanoTime();
        DispersionResult result = study.run(threads);
        double seconds = (System.nanoTime() - t0) * 1e-9;
        print(System.out, study, result, "local runner, " + threads + " threads", seconds, out);
    }

    /**
     * Prints the report and writes the CSV table if a directory is given.
     *
     * @param print where to print
     * @param study the study that ran
     * @param result its result
     * @param runner how it ran
     * @param seconds wall time of the run (s)
     * @param out directory for {@code airdrop-cases.csv}, or null
     * @throws IOException if the directory cannot be created
     */
    public static void print(PrintStream print, DispersionStudy study, DispersionResult result, String runner,
            double seconds, Path out) throws IOException {
        print.print(report(study, result, runner, seconds));
        if (out != null) {
            Files.createDirectories(out);
            Path csv = out.resolve("airdrop-cases.csv");
            result.writeCsv(csv);
            print.println("table of all cases (inputs and outcomes): " + csv);
        }
    }
}
