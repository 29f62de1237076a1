// An invented survey drone stands still for 10 minutes at an invented site: write what its IMU
// outputs at 100 Hz (increments over 10 ms) to a log file, read the file back and navigate it.
// For simulation and analysis, not for primary navigation.
var model = EarthModel.WGS84;
var site = LatLonHeight.ofDegrees(47.3, 8.6, 450.0);
var attitude = Orientations.fromYawPitchRoll(Units.degrees(30.0), 0.0, 0.0);        // body over NED
var dv = attitude.applyTo(model.normalGravityIn(site, LocalAxes.NED).negate()).scalarMultiply(0.01);
var da = attitude.applyTo(model.earthRateIn(site.latitude(), LocalAxes.NED)).scalarMultiply(0.01);
int n = 60_000;
var packed = new double[6 * n];
for (int k = 0; k < n; k++) { packed[6 * k] = dv.getX(); packed[6 * k + 1] = dv.getY(); packed[6 * k + 2] = dv.getZ(); packed[6 * k + 3] = da.getX(); packed[6 * k + 4] = da.getY(); packed[6 * k + 5] = da.getZ(); }
var file = Files.createTempDirectory("imu").resolve("standstill.csv");
IncrementLog.ofUniform(0.0, 0.01, packed).writeCsv(file);
Files.readAllLines(file).stream().limit(4).forEach(System.out::println);
var log = IncrementLog.readCsv(file);
var nav = LevelNavigator.of(model, LocalAxes.NED);
var end = nav.run(NavigationState.of(0.0, site, Vector3D.ZERO, LocalAxes.NED, attitude), log);
System.out.printf("%s: after %.0f s the drone is %.3f mm from where it stood%n", log, log.end(),
        1e3 * model.ellipsoid().toCartesian(end.position()).distance(model.ellipsoid().toCartesian(site)));
/exit
