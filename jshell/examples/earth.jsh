// A survey site (invented) on the WGS84 Earth: one line gives the Earth frames.
var earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-03-20T12:00:00Z"));
var site = LatLonHeight.ofDegrees(57.62, 11.31, 12.0);
var enu = earth.localLevel(site, LocalAxes.ENU);
System.out.println(enu);
System.out.println("normal gravity " + EarthModel.WGS84.normalGravity(site) + " m/s^2");
System.out.println(enu.stateAt(0.0, PointState.of(Vector3D.ZERO, new Vector3D(0, 100, 0))).fictitious());
/exit
