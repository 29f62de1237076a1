// A gravity-survey line (invented: the vessel Brannoch Wake, line 7, 10 kn due east along 60 N,
// heaving 0.8 m at 0.6 rad/s, logged at 10 Hz): write its track log, read it back, write the survey CSV, print the first rows.
// For survey processing and analysis, not for primary navigation.
var earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-09-01T06:00:00Z"));
var log = new StringBuilder("# Brannoch Wake, line 7 (invented)\nt[s], lat[deg], lon[deg], h[m]\n");
var east = Units.knots(10.0) / (Ellipsoid.WGS84.primeVerticalRadius(Units.degrees(60.0)) * 0.5);  // rad/s of longitude
for (int k = 0; k <= 600; k++) log.append(k / 10.0 + ", 60.0, " + (4.0 + Units.toDegrees(east * k / 10.0)) + ", " + 0.8 * Math.sin(0.06 * k) + "\n");
var folder = Files.createTempDirectory("survey");
Files.writeString(folder.resolve("line7.csv"), log);
var track = GeodeticTrack.readCsv(folder.resolve("line7.csv"), 0.2);
track.writeSurveyCsv(earth, folder.resolve("line7-survey.csv"));
Files.readAllLines(folder.resolve("line7-survey.csv")).stream().limit(7).forEach(System.out::println);
System.out.println("heave acceleration at t = 0.2 s, analytic: " + Units.toMilligals(-0.8 * 0.36 * Math.sin(0.12)) + " mGal");
// the heave is noise to a survey: a Gaussian filter that halves a 30 s period leaves 0.3 % of it
var filter = SurveyFilter.ofHalfGainPeriod(30.0);
track.writeSurveyCsv(earth, filter, folder.resolve("line7-filtered.csv"));
Files.readAllLines(folder.resolve("line7-filtered.csv")).stream().skip(2).limit(2).forEach(System.out::println);
System.out.println(filter + ", gain at the heave's 0.6 rad/s: " + filter.gainAt(0.6 / (2 * Math.PI)));
System.out.println("rule of thumb 7.503 V cos(lat) + 0.004154 V^2: " + (7.503 * 10 * 0.5 + 0.004154 * 100) + " mGal");
/exit
