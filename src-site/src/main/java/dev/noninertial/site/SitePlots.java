package dev.noninertial.site;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.examples.chart.Curve;
import dev.noninertial.examples.chart.CurveSheet;
import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.units.Units;

/**
 * The plots of the site, computed by calling the library when the site is built, so that a
 * change of the library shows in the pictures.
 */
public final class SitePlots {

    /** Roll amplitude of the demonstration deck (rad): 12 degrees. */
    static final double ROLL_AMPLITUDE = Units.degrees(12.0);
    /** Roll and heave period of the demonstration deck (s). */
    static final double PERIOD = 9.0;
    /** Heave amplitude of the demonstration deck (m). */
    static final double HEAVE_AMPLITUDE = 1.2;
    /** Height of the point on the mast above the deck origin (m). */
    static final double MAST_HEIGHT = 25.0;
    /** Speed of the point up the mast as it passes that height (m/s). */
    static final double CLIMB_SPEED = 0.5;

    private SitePlots() {
    }

    /**
     * Writes every plot into {@code folder}.
     *
     * @param folder output folder, created if missing
     * @return the file names written
     * @throws IOException if a file cannot be written
     */
    public static List<String> writeAll(Path folder) throws IOException {
        Files.createDirectories(folder);
        List<String> written = new ArrayList<>();
        CurveSheet[] roll = rollCycle();
        write(folder, "roll-cycle-transverse.svg", roll[0], written);
        write(folder, "roll-cycle-vertical.svg", roll[1], written);
        CurveSheet[] shot = TrajectoryPlots.deflection();
        write(folder, "shot-deflection-cross-range.svg", shot[0], written);
        write(folder, "shot-deflection-range.svg", shot[1], written);
        CurveSheet[] pendulum = TrajectoryPlots.foucault();
        write(folder, "foucault-swing-plane.svg", pendulum[0], written);
        write(folder, "foucault-difference.svg", pendulum[1], written);
        CurveSheet[] sensors = SensorPlots.survey();
        write(folder, "sensor-survey-line.svg", sensors[0], written);
        write(folder, "sensor-triads-track.svg", sensors[1], written);
        write(folder, "airdrop-footprint.svg", DispersionPlots.footprint(), written);
        return written;
    }

    private static void write(Path folder, String name, CurveSheet sheet, List<String> written) throws IOException {
        Files.writeString(folder.resolve(name), sheet.toSvg(), StandardCharsets.UTF_8);
        written.add(name);
    }

    /**
     * The deck of the (invented) survey vessel Kestrel Bay rolls about its forward x axis and
     * heaves along the vertical with the same period; a point 25 m up the mast climbs at 0.5 m/s.
     * Plots the transverse (deck y) and vertical (deck z) components of the four inertial terms
     * over one roll cycle.
     *
     * @return the transverse and the vertical sheet
     */
    static CurveSheet[] rollCycle() {
        double omega = 2 * Math.PI / PERIOD;
        // heave first (moves the intermediate frame), then roll of the deck about its x axis;
        // heave leads the roll by a quarter period, as on a beam sea (invented demonstration)
        Motion deckMotion = Motions.heave(Vector3D.PLUS_K, HEAVE_AMPLITUDE, omega, Math.PI / 2)
                .then(Motions.oscillation(Vector3D.PLUS_I, ROLL_AMPLITUDE, omega, 0.0));
        ReferenceFrame sea = ReferenceFrame.inertialRoot("sea");
        ReferenceFrame deck = sea.attach("deck", deckMotion);
        PointState point = PointState.of(new Vector3D(0, 0, MAST_HEIGHT), new Vector3D(0, 0, CLIMB_SPEED));

        int n = 181;
        double[] t = new double[n];
        double[][] y = new double[4][n];
        double[][] z = new double[4][n];
        for (int i = 0; i < n; i++) {
            t[i] = PERIOD * i / (n - 1);
            FictitiousAccelerations f = deck.stateAt(t[i], point).fictitious();
            Vector3D[] terms = {f.frameAcceleration(), f.euler(), f.coriolis(), f.centrifugal()};
            for (int k = 0; k < 4; k++) {
                y[k][i] = terms[k].getY();
                z[k][i] = terms[k].getZ();
            }
        }
        String[] names = {"frame acceleration  -R o''", "Euler  -al x r", "Coriolis  -2 w x v",
            "centrifugal  -w x (w x r)"};
        CurveSheet transverse = CurveSheet.titled("Kestrel Bay deck: transverse inertial terms, point 25 m up the mast")
                .withHorizontalAxis("time t", "s").withVerticalAxis("deck y component", "m/s^2");
        CurveSheet vertical = CurveSheet.titled("Kestrel Bay deck: vertical inertial terms, point 25 m up the mast")
                .withHorizontalAxis("time t", "s").withVerticalAxis("deck z component", "m/s^2");
        for (int k = 0; k < 4; k++) {
            transverse = transverse.withCurve(Curve.of(names[k], t, y[k]));
            vertical = vertical.withCurve(Curve.of(names[k], t, z[k]));
        }
        return new CurveSheet[] {transverse, vertical};
    }
}
