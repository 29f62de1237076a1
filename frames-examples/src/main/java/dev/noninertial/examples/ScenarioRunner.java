package dev.noninertial.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Runs the worked scenarios (invented places and vessels) and prints readable tables with units:
 * the Earth's rotation at a site and the gravity-versus-gravitation pitfall, the inertial
 * accelerations at the crane hook of a rolling, pitching, heaving ship under way, a long-range
 * drag-free trajectory with and without the Earth's rotation, ideal sensor triads, a survey
 * drone's navigation and a marine gravity-survey line.
 *
 * <p>Usage: {@code ScenarioRunner [--out DIR]}; with {@code --out} every table is also written as
 * {@code DIR/NAME.csv} (the directory is created if needed), and the inertial terms at the crane
 * hook are plotted in {@code DIR/ship-crane.svg}.
 */
public final class ScenarioRunner {

    /** Printed first, before any figure. */
    static final String CAUTION = "CAUTION: results are for simulation and analysis only, not for aiming, lifting "
            + "or medical decisions;\n         defer to local codes and licensed practice. Places and vessels "
            + "below are invented.";

    private ScenarioRunner() {
    }

    /**
     * Entry point.
     *
     * @param args {@code --out DIR} to also write CSV files, {@code --help} for usage
     * @throws IOException if a CSV file cannot be written
     */
    public static void main(String[] args) throws IOException {
        Path out = null;
        for (int i = 0; i < args.length; i++) {
            if ("--out".equals(args[i]) && i + 1 < args.length) {
                out = Path.of(args[++i]);
            } else if ("--help".equals(args[i])) {
                System.out.println("usage: ScenarioRunner [--out DIR]   (DIR receives one CSV file per table and an SVG plot)");
                return;
            } else {
                System.err.println("unknown or incomplete argument '" + args[i]
                        + "'; usage: ScenarioRunner [--out DIR]");
                System.exit(2);
                return;
            }
        }
        run(System.out, out);
    }

    static void run(PrintStream print, Path out) throws IOException {
        print.println(CAUTION);
        print.println();
        DemoSetting setting = new DemoSetting();
        List<ScenarioTable> tables = new java.util.ArrayList<>(List.of(SiteRotationScenario.run(setting),
                ShipCraneScenario.run(setting), LongRangeScenario.run(setting)));
        tables.addAll(SensorTruthScenario.run(setting));
        tables.addAll(List.of(SurveyFlightScenario.run(setting)));
        tables.add(GravitySurveyScenario.run(setting));
        if (out != null) {
            Files.createDirectories(out);
        }
        for (ScenarioTable t : tables) {
            print.println(t.toText());
            if (out != null) {
                print.println("  written: " + t.writeCsv(out));
                if ("ship-crane".equals(t.id())) {
                    // the four inertial terms over the roll cycle (columns 3 to 6 of the table)
                    print.println("  written: " + t.writeSvg(out, "inertial term magnitude", 0, 3, 4, 5, 6));
                }
                print.println();
            }
        }
    }
}
