package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.jar.JarFile;
import java.util.jar.Manifest;

import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.noninertial.frames.Placement;

/**
 * Issue 15, class 8: a class that declares itself in one of our packages from another jar or
 * folder cannot reach the package's internals (the kernel shares its arrays inside the package).
 * The frames-core jar is sealed (JAR File Specification, "Package Sealing": all classes of a
 * sealed package must come from the same jar), so the JVM refuses to define the intruder. Runs
 * where frames-core comes from its jar (the Maven reactor's verify); skipped with a note when it
 * comes from a class folder (an IDE run), where no manifest exists.
 */
class SealedPackageTest {

    private static final String INTRUDER = "package dev.noninertial.frames;\n"
            + "public final class Intruder {\n"
            + "    public static double[] grab(Placement p) {\n"
            + "        return p.components();\n"
            + "    }\n"
            + "}\n";

    @Test
    void aClassDeclaredInOurPackageElsewhereIsRefused(@TempDir Path dir) throws Exception {
        Path core = Path.of(Placement.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        assumeTrue(Files.isRegularFile(core), "frames-core comes from " + core + ", not a jar: sealing needs the jar");
        try (JarFile jar = new JarFile(core.toFile())) {
            Manifest m = jar.getManifest();
            assertTrue(m != null && "true".equalsIgnoreCase(m.getMainAttributes().getValue("Sealed")),
                    "frames-core's manifest must declare Sealed: true");
        }
        // compile the intruder against frames-core into a folder of its own
        Path src = dir.resolve("src/dev/noninertial/frames/Intruder.java");
        Files.createDirectories(src.getParent());
        Files.writeString(src, INTRUDER, StandardCharsets.UTF_8);
        Path out = dir.resolve("classes");
        Files.createDirectories(out);
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assumeTrue(javac != null, "no system Java compiler (a JRE, not a JDK)");
        String hipparchus = Path.of(Vector3D.class.getProtectionDomain().getCodeSource().getLocation().toURI())
                .toString();
        int rc = javac.run(null, null, null, "-d", out.toString(), "-cp",
                core + java.io.File.pathSeparator + hipparchus, src.toString());
        assertTrue(rc == 0, "the intruder must compile (it is legal Java)");
        try (URLClassLoader loader = new URLClassLoader(new URL[] {core.toUri().toURL(), out.toUri().toURL(),
            Path.of(hipparchus).toUri().toURL()}, ClassLoader.getPlatformClassLoader())) {
            // the package is defined from the sealed jar first, as in any application
            Class.forName("dev.noninertial.frames.Placement", true, loader);
            SecurityException e = assertThrows(SecurityException.class,
                    () -> Class.forName("dev.noninertial.frames.Intruder", true, loader));
            assertTrue(e.getMessage().contains("sealing violation"), e.getMessage());
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }
}
