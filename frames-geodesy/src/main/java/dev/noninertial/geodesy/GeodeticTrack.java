package dev.noninertial.geodesy;

import java.io.IOException;
import java.io.Reader;
import java.io.Serializable;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.LogTable;
import dev.noninertial.frames.motion.SampledMotion;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.frames.units.Units;

/**
 * A logged track of a ship, aircraft or vehicle: time, geodetic latitude, longitude and height,
 * optionally heading, pitch and roll, interpolated with consistent rates. It is a
 * {@link GeodeticPath} (so {@link EarthFrames#carriedLevel(String, GeodeticPath, LocalAxes)}
 * carries a level frame along it, transport rate included) and its attitude is an
 * {@link AttitudeProfile} ({@link #attitude()}) for {@link EarthFrames#body}.
 *
 * <h2>Interpolation</h2>
 * Latitude, longitude (unwrapped across the antimeridian) and height, and heading (unwrapped),
 * pitch and roll, are interpolated by the library's one piecewise quintic Hermite scheme, that of
 * {@link SampledMotion} (derivatives at each sample from the local quartic, C2 across samples), so
 * rates and accelerations are the exact derivatives of the reported positions and angles. The
 * interpolant does not filter: noise in the log reaches rates amplified by about {@code 1/h} and
 * accelerations by {@code 1/h^2} ({@code h} the sample interval).
 *
 * <h2>Refusals</h2>
 * Construction refuses, naming the sample (and, for files, the source and line): fewer than two
 * samples, non-finite values, times that do not increase strictly, a gap between samples longer
 * than the stated {@code maxGap}, a latitude within {@value #POLE_MARGIN_DEGREES} degrees of a
 * pole or beyond it (the north-aligned level frame and the transport rate are undefined at a pole),
 * and a longitude or heading step of more than 90 degrees between consecutive samples after
 * unwrapping (a pole crossing, or a track too coarsely sampled to interpolate). Queries before the
 * first or after the last sample are refused: nothing is extrapolated.
 *
 * <h2>File format</h2>
 * Comment lines start with {@code #}; blank lines are skipped; the first other line is the header
 * naming each column as {@code name[unit]}, comma-separated, as in the motion-log format: columns
 * {@code t} (s, ms), {@code lat} and {@code lon} (deg, rad), {@code h} (m, km, ft) are required;
 * {@code heading}, {@code pitch}, {@code roll} (deg, rad) are optional as a group. Heading is
 * clockwise from north, pitch nose up, roll right side down (see {@link AttitudeSample}).
 *
 * <p>Immutable, thread-safe and serializable. Results are for simulation and analysis, not for
 * primary navigation.
 */
public final class GeodeticTrack implements GeodeticPath, Serializable {

    /** Samples within this many degrees of a pole are refused. */
    public static final double POLE_MARGIN_DEGREES = 0.01;
    /** Largest step of longitude or heading between consecutive samples (rad), after unwrapping. */
    public static final double MAX_ANGLE_STEP = 0.5 * Math.PI;

    /** The header line of {@link #writeSurveyCsv(EarthFrames, Writer)}. */
    public static final String SURVEY_HEADER = "t[s],lat[deg],lon[deg],h[m],eotvos[mGal],vertical_acceleration[mGal],"
            + "reading[m/s^2],normal_gravity[m/s^2]";

    private static final long serialVersionUID = 1L;

    /** Interpolant of (lat, lon, h) as the origin of a sampled motion. */
    private final SampledMotion position;
    /** Interpolant of (heading, pitch, roll), or null. */
    private final SampledMotion angles;
    /** Stated largest gap between samples (s). */
    private final double maxGap;

    private GeodeticTrack(SampledMotion position, SampledMotion angles, double maxGap) {
        this.position = position;
        this.angles = angles;
        this.maxGap = maxGap;
    }

    /**
     * A track without attitude from arrays (radians, metres).
     *
     * @param times sample times (s), strictly increasing
     * @param latitudes geodetic latitudes (rad)
     * @param longitudes longitudes (rad)
     * @param heights ellipsoidal heights (m)
     * @param maxGap largest allowed gap between consecutive samples (s), positive
     * @return the track
     * @throws IllegalArgumentException if a sample is refused (see the class comment)
     */
    public static GeodeticTrack fromArrays(double[] times, double[] latitudes, double[] longitudes, double[] heights,
                                           double maxGap) {
        return build(times, latitudes, longitudes, heights, null, null, null, maxGap, ARRAY_NAMES, "times",
                i -> "sample " + i);
    }

    /**
     * A track with attitude from arrays (radians, metres).
     *
     * @param times sample times (s), strictly increasing
     * @param latitudes geodetic latitudes (rad)
     * @param longitudes longitudes (rad)
     * @param heights ellipsoidal heights (m)
     * @param headings headings, clockwise from north (rad)
     * @param pitches pitch angles, nose up (rad)
     * @param rolls roll angles, right side down (rad)
     * @param maxGap largest allowed gap between consecutive samples (s), positive
     * @return the track
     * @throws IllegalArgumentException if a sample is refused (see the class comment)
     */
    @SuppressWarnings("checkstyle:ParameterNumber")
    public static GeodeticTrack fromArrays(double[] times, double[] latitudes, double[] longitudes, double[] heights,
                                           double[] headings, double[] pitches, double[] rolls, double maxGap) {
        Arguments.nonNull("headings", headings);
        Arguments.nonNull("pitches", pitches);
        Arguments.nonNull("rolls", rolls);
        return build(times, latitudes, longitudes, heights, headings, pitches, rolls, maxGap, ARRAY_NAMES, "times",
                i -> "sample " + i);
    }

    /**
     * Reads a track file (format in the class comment), UTF-8.
     *
     * @param file the file
     * @param maxGap largest allowed gap between consecutive samples (s), positive
     * @return the track
     * @throws IOException if the file cannot be read
     * @throws IllegalArgumentException if the header or a row is refused; the message names the
     *         file and the line
     */
    public static GeodeticTrack readCsv(Path file, double maxGap) throws IOException {
        return fromLog(LogTable.readCsv(file, LOG_COLUMNS, LOG_EXAMPLE), maxGap);
    }

    /**
     * Reads a track in the file format from a character stream.
     *
     * @param source the text
     * @param sourceName name used in messages (a file name, for example)
     * @param maxGap largest allowed gap between consecutive samples (s), positive
     * @return the track
     * @throws IOException if the stream fails
     * @throws IllegalArgumentException if the header or a row is refused; the message names the
     *         source and the line
     */
    public static GeodeticTrack readCsv(Reader source, String sourceName, double maxGap) throws IOException {
        return fromLog(LogTable.readCsv(source, sourceName, LOG_COLUMNS, LOG_EXAMPLE), maxGap);
    }

    /** The columns of the track log and their units (foot: 0.3048 m exactly, the international foot). */
    private static final List<LogTable.Column> LOG_COLUMNS = List.of(
            LogTable.Column.of("t", new String[] {"s", "ms"}, new double[] {1, 1e-3}),
            LogTable.Column.of("lat", new String[] {"deg", "rad"}, new double[] {Math.PI / 180, 1}),
            LogTable.Column.of("lon", new String[] {"deg", "rad"}, new double[] {Math.PI / 180, 1}),
            LogTable.Column.of("h", new String[] {"m", "km", "ft"}, new double[] {1, 1e3, 0.3048}),
            LogTable.Column.of("heading", new String[] {"deg", "rad"}, new double[] {Math.PI / 180, 1}),
            LogTable.Column.of("pitch", new String[] {"deg", "rad"}, new double[] {Math.PI / 180, 1}),
            LogTable.Column.of("roll", new String[] {"deg", "rad"}, new double[] {Math.PI / 180, 1}));
    private static final String LOG_EXAMPLE = "t[s], lat[deg], lon[deg], h[m]";

    private static GeodeticTrack fromLog(LogTable log, double maxGap) {
        log.requireGroup("track", true, "t", "lat", "lon", "h");
        log.requireGroup("attitude", false, "heading", "pitch", "roll");
        boolean attitude = log.has("heading");
        String name = log.source();
        return build(log.values("t"), log.values("lat"), log.values("lon"), log.values("h"),
                attitude ? log.values("heading") : null, attitude ? log.values("pitch") : null,
                attitude ? log.values("roll") : null, maxGap, FILE_NAMES, name, i -> name + " line " + log.line(i));
    }

    /** The columns of the file, named in refusals of its rows. */
    private static final String[] FILE_NAMES = LOG_COLUMNS.stream().map(LogTable.Column::name).toArray(String[]::new);

    /** The parameters of the array factories, in the order of the file columns, named in refusals. */
    private static final String[] ARRAY_NAMES = {"times", "latitudes", "longitudes", "heights", "headings", "pitches",
        "rolls"};

    @SuppressWarnings("checkstyle:ParameterNumber")
    private static GeodeticTrack build(double[] times, double[] lat, double[] lon, double[] h, double[] heading,
                                       double[] pitch, double[] roll, double maxGap, String[] names,
                                       String samplesOf, java.util.function.IntFunction<String> label) {
        Arguments.nonNull("times", times);
        Arguments.nonNull("latitudes", lat);
        Arguments.nonNull("longitudes", lon);
        Arguments.nonNull("heights", h);
        Arguments.positive("maxGap", maxGap);
        int n = times.length;
        if (n < 2) {
            throw new IllegalArgumentException(samplesOf + " must hold at least 2 samples (a track needs two), got "
                    + n);
        }
        checkLength("latitudes", lat, n);
        checkLength("longitudes", lon, n);
        checkLength("heights", h, n);
        if (heading != null) {
            checkLength("headings", heading, n);
            checkLength("pitches", pitch, n);
            checkLength("rolls", roll, n);
        }
        double limit = Math.toRadians(90.0 - POLE_MARGIN_DEGREES);
        double[] t = new double[n];
        double[] xyz = new double[3 * n];
        double[] hpr = heading == null ? null : new double[3 * n];
        for (int i = 0; i < n; i++) {
            String at = label.apply(i);
            t[i] = finite(at, names[0], times[i]);
            if (i > 0) {
                double gap = t[i] - t[i - 1];
                if (!(gap > 0)) {
                    throw new IllegalArgumentException(at + ": time " + t[i] + " s must be after the previous sample's "
                            + t[i - 1] + " s");
                }
                if (gap > maxGap) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: gap of %s s after the sample at "
                            + "%s s exceeds maxGap = %s s", at, Formats.number(gap), Formats.number(t[i - 1]),
                            Formats.number(maxGap)));
                }
            }
            double la = finite(at, names[1], lat[i]);
            if (!(Math.abs(la) < limit)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: latitude %.6f deg is within %s deg of "
                        + "a pole or beyond it (allowed |lat| < %s deg): a north-aligned level frame is undefined at "
                        + "the pole; split the track or use Earth-fixed axes", at, Math.toDegrees(la),
                        Formats.number(POLE_MARGIN_DEGREES), Formats.number(90.0 - POLE_MARGIN_DEGREES)));
            }
            xyz[3 * i] = la;
            xyz[3 * i + 1] = unwrap(at, names[2], finite(at, names[2], lon[i]), i == 0 ? Double.NaN : xyz[3 * i - 2]);
            xyz[3 * i + 2] = finite(at, names[3], h[i]);
            if (hpr != null) {
                hpr[3 * i] = unwrap(at, names[4], finite(at, names[4], heading[i]),
                        i == 0 ? Double.NaN : hpr[3 * i - 3]);
                hpr[3 * i + 1] = finite(at, names[5], pitch[i]);
                hpr[3 * i + 2] = finite(at, names[6], roll[i]);
            }
        }
        double[] identity = new double[4 * n];
        for (int i = 0; i < n; i++) {
            identity[4 * i] = 1.0;
        }
        SampledMotion p = SampledMotion.fromArrays(t, xyz, identity);
        SampledMotion a = hpr == null ? null : SampledMotion.fromArrays(t, hpr, identity);
        return new GeodeticTrack(p, a, maxGap);
    }

    private static void checkLength(String name, double[] values, int n) {
        if (values.length != n) {
            throw new IllegalArgumentException(name + " must hold one value per time (" + n + "), got " + values.length);
        }
    }

    private static double finite(String at, String column, double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(at + ", " + column + ": value " + v + " is not finite");
        }
        return v;
    }

    /** The angle shifted by whole turns to within half a turn of the previous one; big steps refused. */
    private static double unwrap(String at, String column, double angle, double previous) {
        if (Double.isNaN(previous)) {
            return angle;
        }
        double turns = Math.rint((angle - previous) / (2 * Math.PI));
        double u = angle - 2 * Math.PI * turns;
        if (Math.abs(u - previous) > MAX_ANGLE_STEP) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: %s steps by %.3f deg from the previous "
                    + "sample (allowed %.0f deg): the track crosses a pole or is too coarsely sampled", at, column,
                    Math.toDegrees(u - previous), Math.toDegrees(MAX_ANGLE_STEP)));
        }
        return u;
    }

    /**
     * A stream is untrusted input: the interpolants are re-checked by their own proxies; here the rest.
     *
     * @param in the stream
     * @throws java.io.IOException if the stream cannot be read or holds invalid values
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.nonNull("position", position);
            Arguments.positive("maxGap", maxGap);
            if (angles != null && angles.sampleCount() != position.sampleCount()) {
                throw new IllegalArgumentException("attitude and position must have the same samples");
            }
            for (int i = 1; i < position.sampleCount(); i++) {
                if (position.sampleTime(i) - position.sampleTime(i - 1) > maxGap) {
                    throw new IllegalArgumentException("gap before sample " + i + " exceeds maxGap");
                }
            }
        } catch (RuntimeException e) {
            throw Arguments.refusedStream(GeodeticTrack.class, e);
        }
    }

    @Override
    public PathSample at(double t) {
        Placement p = position.at(t);
        Vector3D x = p.origin();
        Vector3D v = p.originVelocity();
        Vector3D a = p.originAcceleration();
        return new PathSample(x.getX(), x.getY(), x.getZ(), v.getX(), v.getY(), v.getZ(), a.getX(), a.getY(), a.getZ());
    }

    /**
     * Returns true if the log carries heading, pitch and roll.
     *
     * @return true if the log carries heading, pitch and roll
     */
    public boolean hasAttitude() {
        return angles != null;
    }

    /**
     * The logged attitude as a profile over the carried level frame (convention of
     * {@link AttitudeSample}), with the interpolant's rates.
     *
     * @return the attitude profile
     * @throws IllegalStateException if the log has no attitude columns
     */
    public AttitudeProfile attitude() {
        if (angles == null) {
            throw new IllegalStateException("this track has no heading, pitch, roll: it was built without attitude");
        }
        return new LoggedAttitude(angles);
    }

    /**
     * Interpolated heading, pitch, roll as an attitude profile.
     *
     * @param angles the logged heading, pitch and roll as a sampled motion
     */
    private record LoggedAttitude(SampledMotion angles) implements AttitudeProfile, Serializable {
        @Override
        public AttitudeSample at(double t) {
            Placement p = angles.at(t);
            Vector3D x = p.origin();
            Vector3D v = p.originVelocity();
            Vector3D a = p.originAcceleration();
            return new AttitudeSample(x.getX(), x.getY(), x.getZ(), v.getX(), v.getY(), v.getZ(), a.getX(), a.getY(),
                    a.getZ());
        }
    }

    /**
     * Returns number of samples.
     *
     * @return number of samples
     */
    public int sampleCount() {
        return position.sampleCount();
    }

    /**
     * Returns time of the first sample (s).
     *
     * @return time of the first sample (s)
     */
    public double startTime() {
        return position.startTime();
    }

    /**
     * Returns time of the last sample (s).
     *
     * @return time of the last sample (s)
     */
    public double endTime() {
        return position.endTime();
    }

    /**
     * Time of one sample.
     *
     * @param index sample index, in [0, sampleCount())
     * @return its time (s)
     */
    public double sampleTime(int index) {
        return position.sampleTime(index);
    }

    /**
     * Returns the stated largest gap between samples (s).
     *
     * @return the stated largest gap between samples (s)
     */
    public double maxGap() {
        return maxGap;
    }

    /**
     * The survey quantities at one time (see {@link SurveyPoint}): Eotvos correction, vertical
     * acceleration, and the reading of an ideal scalar gravimeter on a level platform carried
     * along this track, from an {@link IdealSensor} on the carried level frame with the Earth's
     * gravitation.
     *
     * @param earth the Earth frames (the track's times count from its epoch)
     * @param t time (s), within the track
     * @return the survey point
     * @throws IllegalArgumentException if {@code t} is outside the track or the height outside the
     *         range of normal gravity's series
     */
    public SurveyPoint surveyAt(EarthFrames earth, double t) {
        Arguments.nonNull("earth", earth);
        ReferenceFrame level = earth.carriedLevel("survey platform", this, LocalAxes.ENU);
        return survey(earth, IdealSensor.of(level, earth.gravitationIn(level)), t);
    }

    /**
     * The survey quantities at every sample time of the track.
     *
     * @param earth the Earth frames (the track's times count from its epoch)
     * @return one point per sample, in time order
     */
    public List<SurveyPoint> surveyAtSamples(EarthFrames earth) {
        Arguments.nonNull("earth", earth);
        ReferenceFrame level = earth.carriedLevel("survey platform", this, LocalAxes.ENU);
        IdealSensor gravimeter = IdealSensor.of(level, earth.gravitationIn(level));
        List<SurveyPoint> out = new ArrayList<>(sampleCount());
        for (int i = 0; i < sampleCount(); i++) {
            out.add(survey(earth, gravimeter, sampleTime(i)));
        }
        return out;
    }

    /**
     * Writes the survey at every sample ({@link #surveyAtSamples(EarthFrames)}) as CSV, in the
     * library's log style: two comment lines starting with {@code #} (what was surveyed, with which
     * model and epoch, and the caution), the header
     * {@value #SURVEY_HEADER}, then one line per sample. Numbers are written with
     * {@link Double#toString(double)} (they read back to the same doubles); latitude and longitude
     * in degrees, the two corrections in mGal (1 mGal = 1e-5 m/s^2), the reading and normal
     * gravity in m/s^2. The Eotvos correction is to be added to a moving gravimeter's reading,
     * the vertical acceleration subtracted (see {@link SurveyPoint}).
     *
     * @param earth the Earth frames (the track's times count from its epoch)
     * @param out the destination (flushed, not closed)
     * @throws IOException if writing fails
     * @throws IllegalArgumentException as {@link #surveyAtSamples(EarthFrames)}
     */
    public void writeSurveyCsv(EarthFrames earth, Writer out) throws IOException {
        Arguments.nonNull("out", out);
        writeSurvey(surveyAtSamples(earth), "# survey of " + this + " with " + earth, out);
    }

    /**
     * Writes the filtered survey ({@link #surveyAtSamples(EarthFrames, SurveyFilter)}) as CSV, in
     * the format of {@link #writeSurveyCsv(EarthFrames, Writer)}; the first comment line names the
     * filter.
     *
     * @param earth the Earth frames (the track's times count from its epoch)
     * @param filter the filter applied to the four survey quantities
     * @param out the destination (flushed, not closed)
     * @throws IOException if writing fails
     * @throws IllegalArgumentException as {@link #surveyAtSamples(EarthFrames, SurveyFilter)}
     */
    public void writeSurveyCsv(EarthFrames earth, SurveyFilter filter, Writer out) throws IOException {
        Arguments.nonNull("out", out);
        writeSurvey(surveyAtSamples(earth, filter), "# survey of " + this + " with " + earth + ", filtered by "
                + filter, out);
    }

    /**
     * Writes the filtered survey as a CSV file (see {@link #writeSurveyCsv(EarthFrames, SurveyFilter, Writer)}),
     * UTF-8, replacing the file.
     *
     * @param earth the Earth frames (the track's times count from its epoch)
     * @param filter the filter applied to the four survey quantities
     * @param file the file; its directory must exist
     * @throws IOException if writing fails
     * @throws IllegalArgumentException as {@link #surveyAtSamples(EarthFrames, SurveyFilter)}
     */
    public void writeSurveyCsv(EarthFrames earth, SurveyFilter filter, Path file) throws IOException {
        Arguments.nonNull("file", file);
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            writeSurveyCsv(earth, filter, out);
        }
    }

    /**
     * The survey at every sample with its four quantities filtered ({@link SurveyFilter#applyTo(List)}):
     * the samples whose whole kernel lies inside the track, in time order. The track must be
     * sampled at a constant interval.
     *
     * @param earth the Earth frames (the track's times count from its epoch)
     * @param filter the filter
     * @return the filtered points, {@code 2 filter.margin(interval)} fewer than the samples
     * @throws IllegalArgumentException if the track is not sampled at a constant interval, or is
     *         shorter than the filter's kernel, or as {@link #surveyAtSamples(EarthFrames)}
     */
    public List<SurveyPoint> surveyAtSamples(EarthFrames earth, SurveyFilter filter) {
        Arguments.nonNull("filter", filter);
        return filter.applyTo(surveyAtSamples(earth));
    }

    /** The CSV of survey points after a first comment line. */
    private static void writeSurvey(List<SurveyPoint> points, String description, Writer out) throws IOException {
        StringBuilder b = new StringBuilder();
        b.append(description).append('\n');
        b.append("# for survey processing and analysis, not for primary navigation\n");
        b.append(SURVEY_HEADER).append('\n');
        out.write(b.toString());
        for (SurveyPoint p : points) {
            b.setLength(0);
            b.append(p.time()).append(',').append(Math.toDegrees(p.position().latitude())).append(',')
                    .append(Math.toDegrees(p.position().longitude())).append(',').append(p.position().height())
                    .append(',').append(Units.toMilligals(p.eotvosCorrection())).append(',')
                    .append(Units.toMilligals(p.verticalAcceleration())).append(',').append(p.gravimeterReading())
                    .append(',').append(p.normalGravity()).append('\n');
            out.write(b.toString());
        }
        out.flush();
    }

    /**
     * Writes the survey at every sample as a CSV file (see {@link #writeSurveyCsv(EarthFrames, Writer)}),
     * UTF-8, replacing the file.
     *
     * @param earth the Earth frames (the track's times count from its epoch)
     * @param file the file; its directory must exist
     * @throws IOException if writing fails
     * @throws IllegalArgumentException as {@link #surveyAtSamples(EarthFrames)}
     */
    public void writeSurveyCsv(EarthFrames earth, Path file) throws IOException {
        Arguments.nonNull("file", file);
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            writeSurveyCsv(earth, out);
        }
    }

    private SurveyPoint survey(EarthFrames earth, IdealSensor gravimeter, double t) {
        PathSample s = at(t);
        Ellipsoid shape = earth.model().ellipsoid();
        double lat = s.latitude();
        double ve = (shape.primeVerticalRadius(lat) + s.height()) * Math.cos(lat) * s.longitudeRate();
        double vn = (shape.meridianRadius(lat) + s.height()) * s.latitudeRate();
        LatLonHeight where = s.position();
        double eotvos = earth.model().eotvosCorrection(where, new Vector3D(ve, vn, 0.0), LocalAxes.ENU);
        double reading = gravimeter.readingAt(t).specificForce().getZ();
        return new SurveyPoint(t, where, eotvos, s.heightAcceleration(), reading, earth.model().normalGravity(where));
    }

    @Override
    public String toString() {
        return "GeodeticTrack{" + sampleCount() + " samples, [" + Formats.number(startTime()) + ", "
                + Formats.number(endTime()) + "] s, maxGap " + Formats.number(maxGap) + " s"
                + (angles == null ? "" : ", with attitude") + "}";
    }
}
