package dev.noninertial.frames.fuzz;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.lang.reflect.Array;
import java.lang.reflect.Constructor;
import java.lang.reflect.Executable;
import java.lang.reflect.Field;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.lang.reflect.Parameter;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Supplier;
import java.util.jar.JarFile;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.RealMatrix;

/**
 * A reflection fuzz of a module's public API (issue 15): every public method and constructor of
 * every public class is called with otherwise valid arguments and one bad value at a time (null,
 * NaN, infinities, huge, subnormal, empty arrays, arrays holding NaN, out-of-range indices). Each
 * call must either return a finite result (and leave finite values in the arrays it writes) or
 * throw {@link IllegalArgumentException}, {@link NullPointerException} or
 * {@link IllegalStateException} whose message names the argument (its parameter name, the
 * module being compiled with {@code -parameters}).
 *
 * <p>Valid arguments come from {@link SampleValues}: a table of valid candidates per type, and for
 * a type without candidates, the type's own public factories called with valid arguments. The
 * valid arguments of one executable are found greedily: start from the first candidate of every
 * parameter and, while the call is refused with a message naming a parameter, move that parameter
 * to its next candidate. An executable for which no valid call is found is counted as skipped.
 *
 * <p>Failures are reported with a key {@code Class.method(Types)#parameter:badValue}; keys listed
 * in the allow-list (resource {@code /fuzz/allowed.txt}, one key or glob per line with a reason)
 * are counted as allowed. Failures in classes not yet listed in {@code /fuzz/enforced.txt} (a class
 * added by another branch on its first day) are reported but do not fail the build.
 */
public final class ApiFuzz {

    /** Longest time one call may take before it is reported as hanging. */
    private static final long CALL_TIMEOUT_MS = 3_000;

    /** How many candidate moves the greedy search for a valid call may make. */
    private static final int SEARCH_STEPS = 40;

    /** Names of methods never called: object plumbing, or running unbounded work. */
    private static final Set<String> SKIPPED_NAMES = Set.of("equals", "hashCode", "toString", "compareTo",
            "values", "valueOf", "wait", "notify", "notifyAll", "getClass", "main");

    private final String module;
    private final List<Class<?>> classes;
    private final SampleValues samples;
    private final List<String> allowed;
    private final Set<String> enforced;
    private ExecutorService worker = newWorker();

    /** Counters and findings of one run. */
    public static final class Report {
        /** Public classes (and interfaces, records, enums) examined. */
        public int classes;
        /** Public methods and constructors examined. */
        public int executables;
        /** Executables fuzzed (a valid call was found, or they take no fuzzable parameter). */
        public int fuzzed;
        /** Executables skipped because no valid call was found, with the reason. */
        public final Map<String, String> skipped = new LinkedHashMap<>();
        /** Calls with one bad argument. */
        public int tried;
        /** Calls refused as required. */
        public int refused;
        /** Calls that returned finite results. */
        public int accepted;
        /** Failing calls in enforced classes, not allowed: key to description. */
        public final Map<String, String> failures = new LinkedHashMap<>();
        /** Failing calls covered by the allow-list. */
        public final Map<String, String> allowedFailures = new LinkedHashMap<>();
        /** Failing calls in classes not yet enforced (reported only). */
        public final Map<String, String> newClassFailures = new LinkedHashMap<>();
        /** Encapsulation findings (internal arrays reachable from outside). */
        public final Map<String, String> exposures = new LinkedHashMap<>();
        /** Package-private accessors handing out internal arrays (covered by package sealing). */
        public final Map<String, String> packageInternal = new LinkedHashMap<>();
        /** Internal array accessors checked for copies. */
        public int arrayAccessorsChecked;
        /** Executables started from a valid call of the table ({@link SampleValues#addCall}). */
        public final Set<String> tabled = new TreeSet<>();
        /** Valid calls of the table that match no executable of the module (another module's). */
        public final Set<String> untabled = new TreeSet<>();

        /** @return the counts on one line */
        public String counts() {
            return String.format(Locale.ROOT, "%d classes, %d public executables (%d fuzzed, %d skipped), %d calls with one"
                    + " bad argument: %d refused, %d accepted with finite results, %d failing (%d allowed, %d in new classes)",
                    classes, executables, fuzzed, skipped.size(), tried, refused, accepted,
                    failures.size() + allowedFailures.size() + newClassFailures.size(), allowedFailures.size(),
                    newClassFailures.size());
        }

        /** @return every finding, readable */
        public String details() {
            StringBuilder b = new StringBuilder(counts()).append('\n');
            section(b, "FAILING (fix the code, or add the key to fuzz/allowed.txt with a reason)", failures);
            section(b, "failing in classes not yet in fuzz/enforced.txt (reported only)", newClassFailures);
            section(b, "allowed by fuzz/allowed.txt", allowedFailures);
            section(b, "internal arrays reachable", exposures);
            section(b, "internal arrays shared inside a package (sealed jars keep other code out)", packageInternal);
            section(b, "skipped (no valid call found)", skipped);
            if (!tabled.isEmpty()) {
                b.append("== started from a valid call of the table (").append(tabled.size()).append(")\n");
                tabled.forEach(k -> b.append("  ").append(k).append('\n'));
            }
            return b.toString();
        }

        private static void section(StringBuilder b, String title, Map<String, String> entries) {
            if (entries.isEmpty()) {
                return;
            }
            b.append("== ").append(title).append(" (").append(entries.size()).append(")\n");
            entries.forEach((k, v) -> b.append("  ").append(k).append("  ->  ").append(v).append('\n'));
        }
    }

    /**
     * A fuzz of the classes found beside {@code anchor} (its directory or jar), in the packages
     * under {@code rootPackage}.
     *
     * @param module module name used in the report
     * @param anchor any main class of the module
     * @param rootPackage package prefix of the classes to examine
     * @param samples valid candidates per type
     */
    public ApiFuzz(String module, Class<?> anchor, String rootPackage, SampleValues samples) {
        this.module = module;
        this.classes = discover(anchor, rootPackage);
        this.samples = samples;
        this.allowed = resourceLines("/fuzz/allowed.txt");
        this.enforced = new TreeSet<>(resourceLines("/fuzz/enforced.txt"));
        samples.learnFactories(classes);
    }

    /** @return every class found, public or not, sorted by name */
    public List<Class<?>> classes() {
        return classes;
    }

    private static ExecutorService newWorker() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "api-fuzz");
            t.setDaemon(true);
            return t;
        });
    }

    // ------------------------------------------------------------------ discovery

    private static List<Class<?>> discover(Class<?> anchor, String rootPackage) {
        List<String> names = new ArrayList<>();
        try {
            Path location = Path.of(anchor.getProtectionDomain().getCodeSource().getLocation().toURI());
            if (Files.isDirectory(location)) {
                try (Stream<Path> files = Files.walk(location)) {
                    files.filter(p -> p.toString().endsWith(".class"))
                            .forEach(p -> names.add(location.relativize(p).toString().replace('\\', '/')));
                }
            } else {
                try (JarFile jar = new JarFile(location.toFile())) {
                    jar.stream().map(e -> e.getName()).filter(n -> n.endsWith(".class")).forEach(names::add);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
        List<Class<?>> found = new ArrayList<>();
        for (String n : names) {
            String name = n.substring(0, n.length() - ".class".length()).replace('/', '.');
            if (!name.startsWith(rootPackage) || name.endsWith("package-info") || name.endsWith("module-info")) {
                continue;
            }
            try {
                found.add(Class.forName(name, false, anchor.getClassLoader()));
            } catch (ClassNotFoundException | LinkageError e) {
                throw new IllegalStateException("cannot load " + name, e);
            }
        }
        found.sort(Comparator.comparing(Class::getName));
        return found;
    }

    private static boolean isPublicApi(Class<?> c) {
        if (c.isAnonymousClass() || c.isLocalClass() || c.isSynthetic()) {
            return false;
        }
        for (Class<?> k = c; k != null; k = k.getEnclosingClass()) {
            if (!Modifier.isPublic(k.getModifiers())) {
                return false;
            }
        }
        return true;
    }

    private static List<String> resourceLines(String name) {
        try (InputStream in = ApiFuzz.class.getResourceAsStream(name)) {
            if (in == null) {
                return List.of();
            }
            List<String> out = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                String key = line.strip();
                int bar = key.indexOf('|');
                if (bar >= 0) {
                    key = key.substring(0, bar).strip();
                }
                if (!key.isEmpty() && !key.startsWith("#")) {
                    out.add(key);
                }
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    // ------------------------------------------------------------------ the run

    /** @return the report of a full run */
    public Report run() {
        Report report = new Report();
        for (Class<?> c : classes) {
            checkEncapsulation(c, report);
            if (!isPublicApi(c)) {
                continue;
            }
            report.classes++;
            List<Executable> executables = new ArrayList<>();
            if (!c.isInterface() && !Modifier.isAbstract(c.getModifiers())) {
                executables.addAll(Arrays.asList(c.getConstructors()));
            }
            for (Method m : c.getDeclaredMethods()) {
                if (Modifier.isPublic(m.getModifiers()) && !m.isSynthetic() && !m.isBridge()
                        && !SKIPPED_NAMES.contains(m.getName())
                        && !(c.isInterface() && Modifier.isAbstract(m.getModifiers()) && m.getParameterCount() == 0)) {
                    executables.add(m);
                }
            }
            executables.sort(Comparator.comparing(ApiFuzz::signature));
            for (Executable e : executables) {
                report.executables++;
                fuzz(c, e, report);
            }
        }
        worker.shutdownNow();
        for (String k : samples.callSignatures()) {
            if (!report.tabled.contains(k)) {
                report.untabled.add(k);
            }
        }
        return report;
    }

    static String signature(Executable e) {
        StringBuilder b = new StringBuilder(e.getDeclaringClass().getSimpleName());
        Class<?> outer = e.getDeclaringClass().getEnclosingClass();
        if (outer != null) {
            b.insert(0, outer.getSimpleName() + ".");
        }
        b.append('.').append(e instanceof Constructor ? "new" : e.getName()).append('(');
        Class<?>[] types = e.getParameterTypes();
        for (int i = 0; i < types.length; i++) {
            b.append(i == 0 ? "" : ",").append(types[i].getSimpleName());
        }
        return b.append(')').toString();
    }

    private void fuzz(Class<?> c, Executable e, Report report) {
        Parameter[] params = e.getParameters();
        if (params.length > 0 && !params[0].isNamePresent()) {
            throw new IllegalStateException(signature(e) + " has no parameter names in its class file: compile "
                    + module + " with javac -parameters (see the parent pom)");
        }
        boolean instance = e instanceof Method && !Modifier.isStatic(e.getModifiers());
        List<Supplier<Object>> receivers = instance ? samples.candidates(c, 0) : List.of(() -> null);
        if (receivers.isEmpty()) {
            report.skipped.put(signature(e), "no instance of " + c.getSimpleName() + " available");
            return;
        }
        List<List<Supplier<Object>>> candidates = new ArrayList<>();
        Supplier<Object[]> call = samples.call(signature(e));
        if (call != null) {
            report.tabled.add(signature(e));
            int given = call.get().length;
            if (given != params.length) {
                throw new IllegalStateException("the valid call of " + signature(e) + " gives " + given
                        + " arguments for " + params.length + " parameters");
            }
            for (int i = 0; i < params.length; i++) {
                int k = i;
                candidates.add(List.of(() -> call.get()[k]));
            }
        }
        for (int i = candidates.size(); i < params.length; i++) {
            Parameter p = params[i];
            List<Supplier<Object>> list = samples.candidates(p.getType(), 0);
            if (list.isEmpty()) {
                report.skipped.put(signature(e), "no valid value of " + p.getType().getSimpleName() + " for " + p.getName());
                return;
            }
            candidates.add(list);
        }
        int[] choice = new int[params.length];
        int receiver = 0;
        String lastRefusal = null;
        boolean found = false;
        for (int step = 0; step < SEARCH_STEPS && !found; step++) {
            Object target = receivers.get(receiver).get();
            Object[] args = arguments(candidates, choice);
            Result r = call(e, target, args);
            if (r.failure == null) {
                found = true;
                break;
            }
            lastRefusal = describe(r.failure);
            int blamed = blamed(params, r.failure);
            if (blamed >= 0 && choice[blamed] + 1 < candidates.get(blamed).size()) {
                choice[blamed]++;
            } else if (blamed < 0 && receiver + 1 < receivers.size()) {
                receiver++;
            } else if (!advanceAny(choice, candidates, step)) {
                break;
            }
        }
        if (!found) {
            report.skipped.put(signature(e), "no valid call found; last refusal: " + lastRefusal);
            return;
        }
        report.fuzzed++;
        Supplier<Object> target = receivers.get(receiver);
        for (int i = 0; i < params.length; i++) {
            for (BadValue bad : BadValue.forType(params[i].getType(), arguments(candidates, choice)[i])) {
                report.tried++;
                Object[] args = arguments(candidates, choice);
                args[i] = bad.value();
                Result r = call(e, target.get(), args);
                judge(c, e, params[i].getName(), bad, args, i, r, report);
            }
        }
    }

    /** Moves some parameter to its next candidate when the refusal named none of them. */
    private static boolean advanceAny(int[] choice, List<List<Supplier<Object>>> candidates, int step) {
        for (int k = 0; k < choice.length; k++) {
            int i = (k + step) % choice.length;
            if (choice[i] + 1 < candidates.get(i).size()) {
                choice[i]++;
                return true;
            }
        }
        return false;
    }

    private static Object[] arguments(List<List<Supplier<Object>>> candidates, int[] choice) {
        Object[] args = new Object[choice.length];
        for (int i = 0; i < args.length; i++) {
            args[i] = candidates.get(i).get(choice[i]).get();
        }
        return args;
    }

    /** Index of the parameter a refusal names, -1 if none. */
    private static int blamed(Parameter[] params, Throwable failure) {
        String message = String.valueOf(failure.getMessage());
        int best = -1;
        int bestLength = 0;
        for (int i = 0; i < params.length; i++) {
            String name = params[i].getName();
            if (mentions(message, name) && name.length() > bestLength) {
                best = i;
                bestLength = name.length();
            }
        }
        return best;
    }

    /**
     * Whether a message names an argument: the name as a word (case-insensitive); for a plural
     * name of an array or collection ({@code times}), its singular names one element of it
     * ({@code "sample 3: time must be finite"}).
     */
    static boolean mentions(String message, String name) {
        if (name.length() > 3 && name.endsWith("s") && mentionsWord(message, name.substring(0, name.length() - 1))) {
            return true;
        }
        return mentionsWord(message, name);
    }

    private static boolean mentionsWord(String message, String name) {
        String m = message.toLowerCase(Locale.ROOT);
        String n = name.toLowerCase(Locale.ROOT);
        int at = m.indexOf(n);
        while (at >= 0) {
            boolean startOk = at == 0 || !Character.isLetterOrDigit(m.charAt(at - 1));
            int end = at + n.length();
            boolean endOk = end == m.length() || !Character.isLetterOrDigit(m.charAt(end));
            if (startOk && endOk) {
                return true;
            }
            at = m.indexOf(n, at + 1);
        }
        return false;
    }

    private record Result(Object value, Throwable failure, boolean timedOut) {
    }

    private Result call(Executable e, Object target, Object[] args) {
        Future<Result> f = worker.submit(() -> {
            try {
                Object value = e instanceof Method ? ((Method) e).invoke(target, args)
                        : ((Constructor<?>) e).newInstance(args);
                return new Result(value, null, false);
            } catch (InvocationTargetException x) {
                return new Result(null, x.getCause(), false);
            } catch (IllegalAccessException | InstantiationException | IllegalArgumentException x) {
                return new Result(null, new AssertionError("reflection: " + x), false);
            } catch (OutOfMemoryError x) {
                return new Result(null, x, false);
            }
        });
        try {
            return f.get(CALL_TIMEOUT_MS, TimeUnit.MILLISECONDS);
        } catch (TimeoutException x) {
            f.cancel(true);
            worker.shutdownNow();
            worker = newWorker();
            return new Result(null, null, true);
        } catch (InterruptedException x) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(x);
        } catch (ExecutionException x) {
            return new Result(null, x.getCause(), false);
        }
    }

    private void judge(Class<?> c, Executable e, String name, BadValue bad, Object[] args, int index, Result r,
                       Report report) {
        String problem = null;
        if (r.timedOut) {
            problem = "did not return within " + CALL_TIMEOUT_MS + " ms";
        } else if (r.failure != null) {
            Throwable x = r.failure;
            boolean allowedType = x instanceof IllegalArgumentException || x instanceof NullPointerException
                    || x instanceof IllegalStateException;
            if (!allowedType) {
                problem = "threw " + describe(x);
            } else if (!mentions(String.valueOf(x.getMessage()), name)) {
                problem = "message does not name '" + name + "': " + describe(x);
            } else {
                report.refused++;
                return;
            }
        } else {
            String nonFinite = Finiteness.check(r.value, 0);
            if (nonFinite == null) {
                for (int k = 0; k < args.length && nonFinite == null; k++) {
                    if (k != index && args[k] != null && args[k].getClass().isArray()) {
                        String w = Finiteness.check(args[k], 0);
                        if (w != null) {
                            nonFinite = "wrote " + w + " into argument " + k;
                        }
                    }
                }
            }
            if (nonFinite == null) {
                report.accepted++;
                return;
            }
            problem = "returned a non-finite result: " + nonFinite;
        }
        String key = signature(e) + "#" + name + ":" + bad.kind();
        if (isAllowed(key)) {
            report.allowedFailures.put(key, problem);
        } else if (!enforced.contains(topLevel(c).getName())) {
            report.newClassFailures.put(key, problem);
        } else {
            report.failures.put(key, problem);
        }
    }

    private static Class<?> topLevel(Class<?> c) {
        Class<?> k = c;
        while (k.getEnclosingClass() != null) {
            k = k.getEnclosingClass();
        }
        return k;
    }

    private boolean isAllowed(String key) {
        for (String pattern : allowed) {
            if (glob(pattern, key)) {
                return true;
            }
        }
        return false;
    }

    /** Glob match with {@code *} for any run of characters. */
    static boolean glob(String pattern, String text) {
        String regex = Arrays.stream(pattern.split("\\*", -1)).map(java.util.regex.Pattern::quote)
                .reduce((a, b) -> a + ".*" + b).orElse("");
        return text.matches(regex);
    }

    private static String describe(Throwable x) {
        String m = String.valueOf(x.getMessage());
        if (m.length() > 200) {
            m = m.substring(0, 200) + "...";
        }
        return x.getClass().getSimpleName() + ": " + m;
    }

    // ------------------------------------------------------------------ encapsulation (class 8)

    /**
     * Internal arrays must not be reachable: no non-private array field, and every non-private
     * no-argument method returning an array returns a new one on each call.
     */
    private void checkEncapsulation(Class<?> c, Report report) {
        for (Field f : c.getDeclaredFields()) {
            if (f.getType().isArray() && !Modifier.isPrivate(f.getModifiers()) && !f.isSynthetic()) {
                report.exposures.put(c.getName() + "." + f.getName(), "non-private array field");
            }
        }
        List<Supplier<Object>> receivers = samples.candidates(c, 0);
        if (receivers.isEmpty()) {
            return;
        }
        for (Method m : c.getDeclaredMethods()) {
            if (Modifier.isPrivate(m.getModifiers()) || Modifier.isStatic(m.getModifiers()) || m.isSynthetic()
                    || m.getParameterCount() != 0 || !m.getReturnType().isArray()) {
                continue;
            }
            report.arrayAccessorsChecked++;
            try {
                m.setAccessible(true);
                Object receiver = receivers.get(0).get();
                Object first = m.invoke(receiver);
                Object second = m.invoke(receiver);
                if (first != null && first == second) {
                    if (Modifier.isPublic(m.getModifiers()) || Modifier.isProtected(m.getModifiers())) {
                        report.exposures.put(c.getName() + "." + m.getName() + "()", "returns its internal array");
                    } else {
                        report.packageInternal.put(c.getName() + "." + m.getName() + "()",
                                "package-private, returns its internal array: reachable only from the package,"
                                + " which the release jars seal");
                    }
                }
            } catch (ReflectiveOperationException | RuntimeException x) {
                // not callable on the sample: nothing learned
            }
        }
    }

    /** Recursive check that a returned value holds only finite numbers. */
    static final class Finiteness {
        private Finiteness() {
        }

        static String check(Object v, int depth) {
            if (v == null || depth > 3) {
                return null;
            }
            if (v instanceof Double || v instanceof Float) {
                double d = ((Number) v).doubleValue();
                return Double.isFinite(d) ? null : String.valueOf(d);
            }
            if (v instanceof double[]) {
                for (double d : (double[]) v) {
                    if (!Double.isFinite(d)) {
                        return "array element " + d;
                    }
                }
                return null;
            }
            if (v.getClass().isArray() && !v.getClass().getComponentType().isPrimitive()) {
                int n = Math.min(Array.getLength(v), 1000);
                for (int i = 0; i < n; i++) {
                    String w = check(Array.get(v, i), depth + 1);
                    if (w != null) {
                        return w;
                    }
                }
                return null;
            }
            if (v instanceof Vector3D) {
                Vector3D u = (Vector3D) v;
                return Double.isFinite(u.getX() + u.getY() + u.getZ()) || (Double.isFinite(u.getX())
                        && Double.isFinite(u.getY()) && Double.isFinite(u.getZ())) ? null : "vector " + u;
            }
            if (v instanceof Rotation) {
                Rotation q = (Rotation) v;
                return Double.isFinite(q.getQ0()) && Double.isFinite(q.getQ1()) && Double.isFinite(q.getQ2())
                        && Double.isFinite(q.getQ3()) ? null : "rotation with a non-finite quaternion";
            }
            if (v instanceof RealMatrix) {
                return check(((RealMatrix) v).getData(), depth + 1);
            }
            if (v instanceof Optional) {
                return check(((Optional<?>) v).orElse(null), depth + 1);
            }
            if (v instanceof Collection) {
                int k = 0;
                for (Object o : (Collection<?>) v) {
                    if (k++ > 100) {
                        break;
                    }
                    String w = check(o, depth + 1);
                    if (w != null) {
                        return w;
                    }
                }
                return null;
            }
            if (v.getClass().getName().startsWith("dev.noninertial.")) {
                return checkAccessors(v, depth);
            }
            return null;
        }

        /** Public no-argument accessors of a library value that return numbers, vectors or rotations. */
        private static String checkAccessors(Object v, int depth) {
            for (Method m : v.getClass().getMethods()) {
                Class<?> t = m.getReturnType();
                boolean numeric = t == double.class || t == double[].class || t == Vector3D.class
                        || t == Rotation.class;
                if (m.getParameterCount() != 0 || Modifier.isStatic(m.getModifiers()) || !numeric
                        || m.getDeclaringClass() == Object.class) {
                    continue;
                }
                try {
                    String w = check(m.invoke(v), depth + 1);
                    if (w != null) {
                        return m.getName() + "() = " + w;
                    }
                } catch (ReflectiveOperationException | RuntimeException x) {
                    // an accessor that refuses is not a non-finite value
                }
            }
            return null;
        }
    }
}
