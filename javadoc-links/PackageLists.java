import java.io.IOException;
import java.lang.module.ModuleDescriptor;
import java.lang.module.ModuleFinder;
import java.lang.module.ModuleReference;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.jar.JarFile;

/**
 * Writes the package lists that Javadoc's -linkoffline reads, so that the API reference links to
 * the JDK's and Hipparchus's documentation without fetching anything while building.
 *
 * <pre>
 *   java javadoc-links/PackageLists.java jdk javadoc-links/jdk-17          (run it with the JDK 17)
 *   java javadoc-links/PackageLists.java jars javadoc-links/hipparchus ~/.m2/.../hipparchus-core-V.jar ...
 * </pre>
 * "jdk": the exported packages of the running JDK's java.* and documented jdk.* modules, in the
 * modular element-list format. "jars": every package holding a public class in the jars given.
 */
public class PackageLists {
    public static void main(String[] args) throws IOException {
        Path out = Path.of(args[1]);
        Files.createDirectories(out);
        List<String> lines = new ArrayList<>();
        if (args[0].equals("jdk")) {
            TreeMap<String, TreeSet<String>> modules = new TreeMap<>();
            for (ModuleReference m : ModuleFinder.ofSystem().findAll()) {
                ModuleDescriptor d = m.descriptor();
                if (!(d.name().startsWith("java.") || d.name().startsWith("jdk.")) || d.name().startsWith("jdk.internal")) {
                    continue;
                }
                TreeSet<String> exported = new TreeSet<>();
                d.exports().stream().filter(e -> !e.isQualified()).forEach(e -> exported.add(e.source()));
                if (!exported.isEmpty()) {
                    modules.put(d.name(), exported);
                }
            }
            modules.forEach((name, packages) -> {
                lines.add("module:" + name);
                lines.addAll(packages);
            });
            Files.write(out.resolve("element-list"), lines);
        } else {
            TreeSet<String> packages = new TreeSet<>();
            for (int i = 2; i < args.length; i++) {
                try (JarFile jar = new JarFile(args[i])) {
                    jar.stream().map(e -> e.getName())
                       .filter(n -> n.endsWith(".class") && !n.contains("$") && n.indexOf('/') > 0
                               && !n.startsWith("META-INF/") && !n.endsWith("module-info.class")
                               && !n.endsWith("package-info.class"))
                       .forEach(n -> packages.add(n.substring(0, n.lastIndexOf('/')).replace('/', '.')));
                }
            }
            lines.addAll(packages);
            Files.write(out.resolve("package-list"), lines);
        }
    }
}
