package dev.noninertial.frames.dispersion;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.regex.Pattern;

import dev.noninertial.frames.Arguments;

/**
 * A dispersion (Monte Carlo) study: named inputs with their distributions, a user model from the
 * inputs of one case to an outcome vector, a number of cases and a master seed.
 *
 * <pre>{@code
 * DispersionStudy study = DispersionStudy.of(model, "east_m", "north_m").
 *         withInput("elevation_deg", InputDistribution.normal(84.0, 0.3)).
 *         withInput("windSpeed_mps", InputDistribution.uniform(0.0, 8.0)).
 *         withCases(10_000).withSeed(20261202L);
 * DispersionResult result = study.run();          // all local cores
 * }</pre>
 *
 * <p><b>Reproducibility.</b> Case {@code i} draws its inputs, one uniform number each in
 * declaration order, from its own {@link SplitMix64} generator seeded with
 * {@link SplitMix64#caseSeed(long, long) caseSeed(masterSeed, i)}. Its inputs and outcome depend
 * on nothing but the master seed, the index and the model, so {@link #runCase(long)} re-runs any
 * case alone, and {@link #run(int)} with any thread count, or a cluster runner with any
 * partitioning, gives the same table bit for bit (provided the model itself is deterministic).
 * Appending an input leaves the draws of the inputs declared before it unchanged.
 *
 * <p>Immutable, thread-safe and {@link Serializable} (it travels to cluster executors); the model
 * must be serializable too (see {@link DispersionModel}). {@code with...} methods return copies.
 * Defaults: 1000 cases, master seed 0, no inputs (a study needs at least one input to run).
 *
 * <p>Results are for simulation and analysis, not for safety-area or hazard decisions; defer to
 * local codes and licensed practice.
 */
public final class DispersionStudy implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Largest number of cases of one study (the outcome table is held in memory). */
    public static final int MAX_CASES = 100_000_000;

    /** Largest number of values (cases times columns) of a table held in one Java array. */
    public static final int MAX_TABLE_VALUES = Integer.MAX_VALUE - 8;

    /** Allowed input and outcome names: letters, digits, underscore, dot, minus (CSV-safe). */
    private static final Pattern NAME = Pattern.compile("[A-Za-z][A-Za-z0-9_.\\-]*");

    /** Cases handed to a worker thread at a time by the local runner. */
    private static final int BLOCK = 32;

    /** The user's model. */
    private final DispersionModel model;
    /** Outcome names in order. */
    @SuppressWarnings("serial") // List.copyOf list: serializable
    private final List<String> outcomeNames;
    /** Input names in declaration (drawing) order. */
    @SuppressWarnings("serial") // List.copyOf list: serializable
    private final List<String> inputNames;
    /** Input distributions, same order as {@code inputNames}. */
    @SuppressWarnings("serial") // List.copyOf list: serializable
    private final List<InputDistribution> distributions;
    /** Number of cases. */
    private final int cases;
    /** Master seed. */
    private final long seed;

    private DispersionStudy(DispersionModel model, List<String> outcomeNames, List<String> inputNames,
            List<InputDistribution> distributions, int cases, long seed) {
        this.model = model;
        this.outcomeNames = outcomeNames;
        this.inputNames = inputNames;
        this.distributions = distributions;
        this.cases = cases;
        this.seed = seed;
    }

    /**
     * A study of a model with named outcomes, 1000 cases, master seed 0 and no inputs yet.
     *
     * @param model the model, serializable and thread-safe
     * @param outcomeNames the names of the model's outcomes in order (at least one; letters,
     *        digits, {@code _ . -}, starting with a letter; no duplicates)
     * @return the study
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if a name is malformed or repeated
     */
    public static DispersionStudy of(DispersionModel model, String... outcomeNames) {
        Arguments.nonNull("model", model);
        Arguments.nonNull("outcomeNames", outcomeNames);
        if (outcomeNames.length == 0) {
            throw new IllegalArgumentException("outcomeNames must hold at least 1 name, got 0");
        }
        List<String> names = new ArrayList<>();
        for (String name : outcomeNames) {
            checkName("outcome name", name, names);
            names.add(name);
        }
        return new DispersionStudy(model, List.copyOf(names), List.of(), List.of(), 1000, 0L);
    }

    private static void checkName(String what, String name, List<String> taken) {
        Arguments.nonNull(what, name);
        if (!NAME.matcher(name).matches()) {
            throw new IllegalArgumentException(what + " must match " + NAME.pattern() + ", got '" + name + "'");
        }
        if (taken.contains(name)) {
            throw new IllegalArgumentException(what + " must be unique, got '" + name + "' twice");
        }
    }

    /**
     * A copy with one more input, drawn after the inputs already declared.
     *
     * @param name the input's name (letters, digits, {@code _ . -}, starting with a letter),
     *        distinct from every input and outcome name
     * @param distribution its distribution
     * @return the new study
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if the name is malformed or already used
     */
    public DispersionStudy withInput(String name, InputDistribution distribution) {
        List<String> taken = new ArrayList<>(inputNames);
        taken.addAll(outcomeNames);
        checkName("input name", name, taken);
        Arguments.nonNull("distribution", distribution);
        List<String> names = new ArrayList<>(inputNames);
        names.add(name);
        List<InputDistribution> laws = new ArrayList<>(distributions);
        laws.add(distribution);
        return new DispersionStudy(model, outcomeNames, List.copyOf(names), List.copyOf(laws), cases, seed);
    }

    /**
     * A copy with another number of cases.
     *
     * @param count number of cases, in [1, {@link #MAX_CASES}]
     * @return the new study
     * @throws IllegalArgumentException if {@code count} is out of range
     */
    public DispersionStudy withCases(int count) {
        if (count < 1 || count > MAX_CASES) {
            throw new IllegalArgumentException("count must be in [1, " + MAX_CASES + "], got " + count);
        }
        return new DispersionStudy(model, outcomeNames, inputNames, distributions, count, seed);
    }

    /**
     * A copy with another master seed.
     *
     * @param masterSeed any 64-bit value
     * @return the new study
     */
    public DispersionStudy withSeed(long masterSeed) {
        return new DispersionStudy(model, outcomeNames, inputNames, distributions, cases, masterSeed);
    }

    /**
     * A copy with another model (same inputs, outcome names, cases and seed).
     *
     * @param newModel the model
     * @return the new study
     * @throws NullPointerException if {@code newModel} is null
     */
    public DispersionStudy withModel(DispersionModel newModel) {
        Arguments.nonNull("newModel", newModel);
        return new DispersionStudy(newModel, outcomeNames, inputNames, distributions, cases, seed);
    }

    /**
     * Returns the model.
     *
     * @return the model
     */
    public DispersionModel model() {
        return model;
    }

    /**
     * Returns the outcome names in order (unmodifiable).
     *
     * @return the outcome names in order (unmodifiable)
     */
    public List<String> outcomeNames() {
        return outcomeNames;
    }

    /**
     * Returns the input names in declaration (drawing) order (unmodifiable).
     *
     * @return the input names in declaration (drawing) order (unmodifiable)
     */
    public List<String> inputNames() {
        return inputNames;
    }

    /**
     * Returns the input distributions in declaration order (unmodifiable).
     *
     * @return the input distributions in declaration order (unmodifiable)
     */
    public List<InputDistribution> distributions() {
        return distributions;
    }

    /**
     * Returns the number of cases.
     *
     * @return the number of cases
     */
    public int cases() {
        return cases;
    }

    /**
     * Returns the master seed.
     *
     * @return the master seed
     */
    public long seed() {
        return seed;
    }

    /**
     * The drawn inputs of one case, from its own generator (see the class comment).
     *
     * @param index case index in [0, cases)
     * @return the case
     * @throws IllegalArgumentException if {@code index} is out of range
     * @throws IllegalStateException if the study has no input
     */
    public DispersionCase drawCase(long index) {
        checkIndex(index);
        if (inputNames.isEmpty()) {
            throw new IllegalStateException("the study has no input: add one with withInput(name, distribution)");
        }
        SplitMix64 generator = SplitMix64.of(SplitMix64.caseSeed(seed, index));
        double[] values = new double[distributions.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = distributions.get(i).draw(generator.nextOpenUnit());
        }
        return new DispersionCase(index, inputNames, values);
    }

    private void checkIndex(long index) {
        if (index < 0 || index >= cases) {
            throw new IllegalArgumentException("index must be in [0, " + (cases - 1) + "], got " + index);
        }
    }

    /**
     * Re-runs one case alone: draws its inputs and applies the model.
     *
     * @param index case index in [0, cases)
     * @return the outcome vector (new array), identical bit for bit to row {@code index} of
     *         every run of this study
     * @throws IllegalArgumentException if {@code index} is out of range
     * @throws IllegalStateException if the model fails or returns a wrong or non-finite vector
     */
    public double[] runCase(long index) {
        return outcomeOf(drawCase(index));
    }

    /**
     * The row of the outcome table for one case: its inputs in declaration order followed by its
     * outcomes (the layout of {@link DispersionResult#row(int)}). Cluster runners build the
     * table from these rows.
     *
     * @param index case index in [0, cases)
     * @return new array of {@code inputNames().size() + outcomeNames().size()} values
     * @throws IllegalArgumentException if {@code index} is out of range
     * @throws IllegalStateException if the model fails or returns a wrong or non-finite vector
     */
    public double[] tableRow(long index) {
        DispersionCase drawn = drawCase(index);
        double[] outcome = outcomeOf(drawn);
        int n = inputNames.size();
        double[] row = new double[n + outcome.length];
        System.arraycopy(drawn.valuesUnsafe(), 0, row, 0, n);
        System.arraycopy(outcome, 0, row, n, outcome.length);
        return row;
    }

    private double[] outcomeOf(DispersionCase drawn) {
        double[] outcome;
        try {
            outcome = model.outcome(drawn);
        } catch (RuntimeException e) {
            throw new IllegalStateException("case " + drawn.index() + " failed in the model: " + e.getMessage()
                    + " (inputs " + drawn + ")", e);
        }
        if (outcome == null || outcome.length != outcomeNames.size()) {
            throw new IllegalStateException("case " + drawn.index() + ": the model must return "
                    + outcomeNames.size() + " outcomes " + outcomeNames + ", got "
                    + (outcome == null ? "null" : outcome.length + " values"));
        }
        for (int k = 0; k < outcome.length; k++) {
            if (!Double.isFinite(outcome[k])) {
                throw new IllegalStateException("case " + drawn.index() + ": outcome '" + outcomeNames.get(k)
                        + "' must be finite, got " + outcome[k] + " (inputs " + drawn + ")");
            }
        }
        return outcome.clone();
    }

    /**
     * Runs every case on all cores of this machine
     * ({@link Runtime#availableProcessors()} threads).
     *
     * @return the result table and statistics
     * @throws IllegalStateException if a case fails (the first failure, naming the case)
     */
    public DispersionResult run() {
        return run(Runtime.getRuntime().availableProcessors());
    }

    /**
     * Runs every case on a given number of threads. The table is the same bit for bit for any
     * thread count.
     *
     * @param threads number of worker threads, in [1, 1024]
     * @return the result table and statistics
     * @throws IllegalArgumentException if {@code threads} is out of range
     * @throws IllegalStateException if a case fails (the first failure, naming the case), or the
     *         table would exceed {@link #MAX_TABLE_VALUES} values
     */
    public DispersionResult run(int threads) {
        if (threads < 1 || threads > 1024) {
            throw new IllegalArgumentException("threads must be in [1, 1024], got " + threads);
        }
        if (inputNames.isEmpty()) {
            throw new IllegalStateException("the study has no input: add one with withInput(name, distribution)");
        }
        int width = inputNames.size() + outcomeNames.size();
        long size = (long) cases * width;
        if (size > MAX_TABLE_VALUES) {
            throw new IllegalStateException("cases x (inputs + outcomes) = " + cases + " x " + width + " = " + size
                    + " values must fit one table of at most " + MAX_TABLE_VALUES
                    + " values: run fewer cases here, or keep the table on a cluster");
        }
        double[] table = new double[(int) size];
        AtomicInteger nextBlock = new AtomicInteger();
        AtomicReference<RuntimeException> failure = new AtomicReference<>();
        Runnable worker = () -> {
            while (failure.get() == null) {
                int from = nextBlock.getAndIncrement() * BLOCK;
                if (from >= cases) {
                    return;
                }
                int to = Math.min(cases, from + BLOCK);
                try {
                    for (int i = from; i < to; i++) {
                        System.arraycopy(tableRow(i), 0, table, i * width, width);
                    }
                } catch (RuntimeException e) {
                    failure.compareAndSet(null, e);
                    return;
                }
            }
        };
        int count = Math.min(threads, (cases + BLOCK - 1) / BLOCK);
        if (count == 1) {
            worker.run();
        } else {
            Thread[] pool = new Thread[count];
            for (int t = 0; t < count; t++) {
                pool[t] = new Thread(worker, "dispersion-" + t);
                pool[t].setDaemon(true);
                pool[t].start();
            }
            for (Thread thread : pool) {
                try {
                    thread.join();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    failure.compareAndSet(null, new IllegalStateException("interrupted while running the study", e));
                }
            }
        }
        if (failure.get() != null) {
            throw failure.get();
        }
        return DispersionResult.ofTable(inputNames, outcomeNames, table);
    }

    @Override
    public String toString() {
        StringBuilder text = new StringBuilder("DispersionStudy[").append(cases).append(" cases, seed ")
                .append(seed).append(", inputs {");
        for (int i = 0; i < inputNames.size(); i++) {
            text.append(i == 0 ? "" : ", ").append(inputNames.get(i)).append(": ").append(distributions.get(i));
        }
        return text.append("}, outcomes ").append(outcomeNames).append(']').toString();
    }
}
