package dev.noninertial.frames.fuzz;

import java.lang.reflect.Constructor;
import java.lang.reflect.Executable;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.lang.reflect.Parameter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;

/**
 * Valid candidate values per type for {@link ApiFuzz}: an explicit table, enum constants, and, for
 * a type without entries, values made by the public factories (static methods and constructors)
 * of the discovered classes that return the type, themselves called with valid candidates. Values
 * are produced fresh for every call (suppliers), so arrays and readers are never shared.
 */
public class SampleValues {

    private static final int MAX_DEPTH = 2;
    private static final int MAX_LEARNED = 3;

    private final Map<Class<?>, List<Supplier<Object>>> table = new HashMap<>();
    private final Map<Class<?>, List<Supplier<Object>>> learned = new HashMap<>();
    private final Set<Class<?>> learning = new HashSet<>();
    private final List<Executable> factories = new ArrayList<>();
    private final Map<String, Supplier<Object[]>> calls = new HashMap<>();

    /**
     * Adds valid candidates for a type, tried in the order given.
     *
     * @param type the type
     * @param values suppliers of valid values
     * @param <T> the type
     * @return this table
     */
    @SafeVarargs
    public final <T> SampleValues add(Class<T> type, Supplier<? extends T>... values) {
        List<Supplier<Object>> list = table.computeIfAbsent(type, k -> new ArrayList<>());
        for (Supplier<? extends T> v : values) {
            list.add(v::get);
        }
        return this;
    }

    /**
     * Replaces the candidates of a type.
     *
     * @param type the type
     * @param values suppliers of valid values, tried in this order
     * @param <T> the type
     * @return this table
     */
    @SafeVarargs
    public final <T> SampleValues put(Class<T> type, Supplier<? extends T>... values) {
        List<Supplier<Object>> list = new ArrayList<>();
        for (Supplier<? extends T> v : values) {
            list.add(v::get);
        }
        table.put(type, list);
        return this;
    }

    /**
     * Gives one executable a coherent valid call: arguments that agree with each other (arrays
     * sized for the offsets and counts given, times inside a motion's span, a log file in the
     * format read), which a search over independent candidates per type cannot find. The fuzz
     * starts from these arguments (the receiver still comes from the candidates of its class) and
     * varies one at a time.
     *
     * @param signature the executable, as in report keys: {@code Class.method(Types)}
     * @param arguments supplier of a fresh argument array per call, one element per parameter
     * @return this table
     */
    public SampleValues addCall(String signature, Supplier<Object[]> arguments) {
        if (calls.putIfAbsent(signature, arguments) != null) {
            throw new IllegalArgumentException("a valid call of " + signature + " is already given");
        }
        return this;
    }

    /** The valid call given for an executable, or null. */
    Supplier<Object[]> call(String signature) {
        return calls.get(signature);
    }

    /** Signatures with a valid call given. */
    Set<String> callSignatures() {
        return calls.keySet();
    }

    /** Makes the public factories of these classes available for types without entries. */
    void learnFactories(List<Class<?>> classes) {
        for (Class<?> c : classes) {
            if (!Modifier.isPublic(c.getModifiers())) {
                continue;
            }
            for (Method m : c.getDeclaredMethods()) {
                if (Modifier.isPublic(m.getModifiers()) && Modifier.isStatic(m.getModifiers()) && !m.isSynthetic()
                        && m.getReturnType() != void.class && !m.getReturnType().isPrimitive()) {
                    factories.add(m);
                }
            }
            if (!c.isInterface() && !Modifier.isAbstract(c.getModifiers())) {
                for (Constructor<?> k : c.getConstructors()) {
                    factories.add(k);
                }
            }
        }
        factories.sort(java.util.Comparator.comparing(ApiFuzz::signature));
    }

    /**
     * Valid candidates of a type.
     *
     * @param type the type
     * @param depth nesting of factory calls so far
     * @return the candidates, possibly empty
     */
    List<Supplier<Object>> candidates(Class<?> type, int depth) {
        Class<?> boxed = box(type);
        List<Supplier<Object>> explicit = table.get(boxed);
        if (explicit != null) {
            return explicit;
        }
        if (type.isEnum()) {
            List<Supplier<Object>> out = new ArrayList<>();
            for (Object constant : type.getEnumConstants()) {
                out.add(() -> constant);
            }
            return out;
        }
        List<Supplier<Object>> known = learned.get(type);
        if (known != null) {
            return known;
        }
        if (depth > MAX_DEPTH || !learning.add(type)) {
            return List.of();
        }
        List<Supplier<Object>> out = new ArrayList<>();
        try {
            for (Executable f : factories) {
                Class<?> made = f instanceof Method ? ((Method) f).getReturnType() : f.getDeclaringClass();
                if (out.size() >= MAX_LEARNED || !type.isAssignableFrom(made) || made == Object.class) {
                    continue;
                }
                Supplier<Object> recipe = recipe(f, depth + 1);
                if (recipe != null) {
                    out.add(recipe);
                }
            }
        } finally {
            learning.remove(type);
        }
        if (depth == 0 || !out.isEmpty()) {
            learned.put(type, out);
        }
        return out;
    }

    /** A supplier calling a factory with valid arguments, or null if none is found quickly. */
    private Supplier<Object> recipe(Executable f, int depth) {
        Parameter[] params = f.getParameters();
        List<List<Supplier<Object>>> lists = new ArrayList<>();
        for (Parameter p : params) {
            if (p.getType() == f.getDeclaringClass() && f instanceof Method) {
                return null; // needs an instance of its own type: circular
            }
            List<Supplier<Object>> c = candidates(p.getType(), depth);
            if (c.isEmpty()) {
                return null;
            }
            lists.add(c);
        }
        int[] choice = new int[params.length];
        for (int step = 0; step < 12; step++) {
            Object[] args = new Object[params.length];
            for (int i = 0; i < args.length; i++) {
                args[i] = lists.get(i).get(choice[i]).get();
            }
            try {
                Object value = invoke(f, args);
                if (value != null) {
                    int[] fixed = choice.clone();
                    return () -> {
                        Object[] a = new Object[params.length];
                        for (int i = 0; i < a.length; i++) {
                            a[i] = lists.get(i).get(fixed[i]).get();
                        }
                        try {
                            return invoke(f, a);
                        } catch (Throwable e) {
                            throw new IllegalStateException("sample factory " + ApiFuzz.signature(f) + " failed", e);
                        }
                    };
                }
                return null;
            } catch (Throwable e) {
                String message = String.valueOf(e.getMessage());
                int blamed = -1;
                for (int i = 0; i < params.length; i++) {
                    if (ApiFuzz.mentions(message, params[i].getName()) && choice[i] + 1 < lists.get(i).size()) {
                        blamed = i;
                    }
                }
                if (blamed < 0) {
                    return null;
                }
                choice[blamed]++;
            }
        }
        return null;
    }

    private static Object invoke(Executable f, Object[] args) throws Throwable {
        try {
            return f instanceof Method ? ((Method) f).invoke(null, args) : ((Constructor<?>) f).newInstance(args);
        } catch (InvocationTargetException e) {
            throw e.getCause();
        }
    }

    private static Class<?> box(Class<?> type) {
        if (!type.isPrimitive()) {
            return type;
        }
        if (type == double.class) {
            return Double.class;
        }
        if (type == int.class) {
            return Integer.class;
        }
        if (type == long.class) {
            return Long.class;
        }
        if (type == boolean.class) {
            return Boolean.class;
        }
        if (type == float.class) {
            return Float.class;
        }
        if (type == char.class) {
            return Character.class;
        }
        if (type == byte.class) {
            return Byte.class;
        }
        return Short.class;
    }
}
