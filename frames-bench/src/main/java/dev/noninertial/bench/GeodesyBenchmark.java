package dev.noninertial.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import dev.noninertial.geodesy.EarthRotationAngle;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.LatLonHeight;

/**
 * Geodetic to Cartesian and back on WGS84, and the Earth rotation angle, against hand-written
 * baselines ({@link GeodesyBaselines}).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class GeodesyBenchmark {

    Ellipsoid wgs84 = Ellipsoid.WGS84;
    LatLonHeight site = GeodesyBaselines.SITE;
    double lat = site.latitude();
    double lon = site.longitude();
    double h = site.height();
    Vector3D point = wgs84.toCartesian(site);
    double px = point.getX();
    double py = point.getY();
    double pz = point.getZ();
    double jdWhole = GeodesyBaselines.JD_WHOLE;
    double jdFraction = GeodesyBaselines.JD_FRACTION;
    double[] out = new double[3];

    /** @return library, geodetic to Cartesian */
    @Benchmark
    public Vector3D toCartesianLibrary() {
        return wgs84.toCartesian(site);
    }

    /** @return baseline (a), geodetic to Cartesian with a Vector3D result */
    @Benchmark
    public Vector3D toCartesianObjects() {
        return GeodesyBaselines.toCartesian(lat, lon, h);
    }

    /** @return baseline (b), geodetic to Cartesian on primitives (the output array) */
    @Benchmark
    public double[] toCartesianPrimitives() {
        GeodesyBaselines.toCartesian(lat, lon, h, out);
        return out;
    }

    /** @return library, Cartesian to geodetic (exact method) */
    @Benchmark
    public LatLonHeight toGeodeticLibrary() {
        return wgs84.toGeodetic(point);
    }

    /** @return baseline (a), Cartesian to geodetic by fixed-point iteration on Vector3D input */
    @Benchmark
    public double[] toGeodeticObjects() {
        return GeodesyBaselines.toGeodeticIterative(point);
    }

    /** @return baseline (b), Cartesian to geodetic by Bowring's formula, two passes, primitives */
    @Benchmark
    public double[] toGeodeticPrimitives() {
        GeodesyBaselines.toGeodeticBowring(px, py, pz, out);
        return out;
    }

    /** @return library, Earth rotation angle from a two-part Julian date */
    @Benchmark
    public double eraLibrary() {
        return EarthRotationAngle.atJulianDate(jdWhole, jdFraction);
    }

    /** @return baseline (b), the published formula on primitives without checks */
    @Benchmark
    public double eraPrimitives() {
        return GeodesyBaselines.era(jdWhole, jdFraction);
    }
}
