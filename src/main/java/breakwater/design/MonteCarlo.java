package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.network.NetworkBuilder;
import breakwater.network.PartBranches;
import breakwater.network.PowerNetwork;
import breakwater.scenario.Die;
import breakwater.scenario.Footprint;
import breakwater.scenario.PackagePath;
import breakwater.scenario.Plane;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.stream.IntStream;

/**
 * Part-to-part spread of a chosen bank: the exact worst case over many banks whose parts are drawn
 * within their tolerances.
 *
 * <p>In each sample every part TYPE of the bank gets one draw, shared by all its placed parts (a batch
 * from one reel moves together; this is the pessimistic choice, because n independent parts would
 * average out): capacitance × (1 + t·u₁), ESR × (1 + s·u₂), ESL × (1 + s·u₃), mounting inductance
 * × (1 + m·u₄), with u₁ … u₄ uniform on [−1, 1], t the part's capacitance tolerance ({@link ToleranceRule}),
 * s the ESR/ESL spread and m the mounting-inductance spread (footprint and via geometry; the mounting
 * inductance is the catalog's or the footprint's, whichever the evaluator uses). When asked, each sample
 * also draws the plane (C and R), the package path (R and L) and the die (C and R) within their own
 * spreads ({@link StackupSpread}), one draw per value after the parts'. Each sample is then judged with
 * the evaluator's exact worst case ({@link BankEvaluator#worstCaseVolts}).
 *
 * <p>Reproducible: sample k uses its own generator, seeded with the k-th number of a
 * {@link SplittableRandom} seeded with {@code seed}, and results are stored by index, so the outcome
 * does not depend on how many threads run the samples. Because the draws are multiplied by the
 * tolerances, the same seed with wider tolerances moves every sample further along the same direction.
 */
public final class MonteCarlo {
    /** Default capacitance tolerance by dielectric when the catalog gives none (common practice). */
    public static final double C0G_TOLERANCE = 0.05;
    public static final double X7R_TOLERANCE = 0.10;
    public static final double X5R_TOLERANCE = 0.20;
    /** Polymer, tantalum and anything else. */
    public static final double OTHER_TOLERANCE = 0.20;
    /** ESR and ESL spread when none is given: ±20 %. */
    public static final double DEFAULT_SPREAD = 0.20;
    /**
     * Mounting-inductance spread when none is given: ±20 %, our own choice (no published figure): pad and
     * via geometry, drill and stack-up tolerances and the distance to the planes move the loop
     * inductance of a footprint by tens of percent from one board build or placement to another.
     */
    public static final double DEFAULT_MOUNT_SPREAD = 0.20;

    /**
     * Spreads of the board and chip values, either side, in [0, 1): plane C and R, package R and L, die C and R.
     *
     * @param planeFraction   plane capacitance and resistance
     * @param packageFraction package resistance and inductance
     * @param dieFraction     die capacitance and resistance
     */
    public record StackupSpread(double planeFraction, double packageFraction, double dieFraction) {
        /** Plane, package and die as given (the default). */
        public static final StackupSpread NONE = new StackupSpread(0, 0, 0);

        public StackupSpread {
            for (double f : new double[]{planeFraction, packageFraction, dieFraction}) {
                if (!(f >= 0 && f < 1)) {
                    throw new IllegalArgumentException("plane, package and die spreads must be in 0 .. 100 % "
                            + "(exclusive), got " + f);
                }
            }
        }

        public boolean any() {
            return planeFraction > 0 || packageFraction > 0 || dieFraction > 0;
        }
    }

    /**
     * The most samples one run draws: a million, far past the point where the p99 of a yield study stops
     * moving, and about 64 MB of statistics ({@link #BYTES_PER_SAMPLE}).
     */
    public static final int MAX_SAMPLES = 1_000_000;
    /**
     * Heap a run keeps per sample, estimated: the worst droop and overshoot (8 bytes each) in the result,
     * its defensive copies and the sorted copies of the percentiles and histograms (four more of each).
     * The draws themselves are made and judged in blocks of {@link #BLOCK} samples and then dropped.
     */
    public static final long BYTES_PER_SAMPLE = 64;
    /** Samples drawn and judged together before their seeds and pass flags are dropped. */
    static final int BLOCK = 4096;

    private MonteCarlo() {
    }

    /** The capacitance tolerance used for a part (0.1 = ±10 %). */
    @FunctionalInterface
    public interface ToleranceRule {
        double capacitanceTolerance(Part part);
    }

    /** The catalog's {@code tolerance} column, else the default for the part's dielectric. */
    public static final ToleranceRule CATALOG_OR_DIELECTRIC = p -> p.tolerance().orElse(dielectricDefault(p.dielectric()));

    /** Where a part's capacitance tolerance comes from, in words: "catalog" or "default for X7R". */
    public static String toleranceSource(Part p) {
        return p.tolerance().isPresent() ? "catalog"
                : "default for " + (p.dielectric().isEmpty() ? "unknown dielectric" : p.dielectric());
    }

    /** C0G/NP0 5 %, X7R 10 %, X5R 20 %, polymer, tantalum and any other 20 % (common practice). */
    public static double dielectricDefault(String dielectric) {
        String d = dielectric.strip().toUpperCase(Locale.ROOT);
        return switch (d) {
            case "C0G", "NP0", "COG", "NPO" -> C0G_TOLERANCE;
            case "X7R", "X7S", "X8R" -> X7R_TOLERANCE;
            case "X5R", "X6S" -> X5R_TOLERANCE;
            default -> OTHER_TOLERANCE;
        };
    }

    /**
     * @param samples             number of banks drawn, &ge; 1
     * @param seed                seed of the whole run
     * @param spreadFraction      ESR and ESL spread, in [0, 1) (0.2 = ±20 %)
     * @param mountSpreadFraction mounting-inductance spread, in [0, 1)
     * @param stackup             plane, package and die spreads
     * @param tolerance           capacitance tolerance per part
     */
    public record Settings(int samples, long seed, double spreadFraction, double mountSpreadFraction,
                           StackupSpread stackup, ToleranceRule tolerance) {
        public Settings {
            Objects.requireNonNull(tolerance, "tolerance");
            Objects.requireNonNull(stackup, "stackup");
            if (!(mountSpreadFraction >= 0 && mountSpreadFraction < 1)) {
                throw new IllegalArgumentException("mounting-inductance spread must be in 0 .. 100 % (exclusive), got "
                        + mountSpreadFraction);
            }
            if (samples < 1 || samples > MAX_SAMPLES) {
                throw new IllegalArgumentException("Monte Carlo draws 1 to " + MAX_SAMPLES + " samples, got " + samples);
            }
            if (!(spreadFraction >= 0 && spreadFraction < 1)) {
                throw new IllegalArgumentException("ESR/ESL spread must be in 0 .. 100 % (exclusive), got "
                        + spreadFraction);
            }
        }

        /** The parts' own spread only: no mounting-inductance, plane, package or die spread. */
        public Settings(int samples, long seed, double spreadFraction, ToleranceRule tolerance) {
            this(samples, seed, spreadFraction, 0, StackupSpread.NONE, tolerance);
        }

        /** The defaults: catalog or dielectric tolerances, {@link #DEFAULT_MOUNT_SPREAD}, no stack-up spread. */
        public Settings(int samples, long seed, double spreadFraction) {
            this(samples, seed, spreadFraction, DEFAULT_MOUNT_SPREAD, StackupSpread.NONE, CATALOG_OR_DIELECTRIC);
        }
    }

    /** How one part type of the bank was varied. */
    public record PartSpread(String part, int count, double capacitanceTolerance, String toleranceSource,
                             double spreadFraction, double mountSpreadFraction) {
    }

    /**
     * Nearest-rank percentiles of a sample and its maximum. The nearest-rank p-th percentile of n values
     * sorted ascending x₁ ≤ … ≤ xₙ is x_⌈p·n/100⌉ (1-based), the smallest value with at least p % of the
     * sample at or below it; it is always one of the sample values (no interpolation).
     */
    public record Distribution(double p50, double p95, double p99, double max) {
        public static Distribution of(double[] values) {
            double[] s = values.clone();
            Arrays.sort(s);
            return new Distribution(nearestRank(s, 50), nearestRank(s, 95), nearestRank(s, 99), s[s.length - 1]);
        }
    }

    /** Nearest-rank percentile (see {@link Distribution}) of values already sorted ascending; 0 &lt; p &le; 100. */
    public static double nearestRank(double[] sortedAscending, double percent) {
        if (sortedAscending.length == 0 || !(percent > 0 && percent <= 100)) {
            throw new IllegalArgumentException("need values and 0 < p <= 100");
        }
        int rank = (int) Math.ceil(percent / 100.0 * sortedAscending.length - 1e-9);
        return sortedAscending[Math.max(1, Math.min(sortedAscending.length, rank)) - 1];
    }

    /**
     * What the samples gave.
     *
     * @param settings    how they were drawn
     * @param parts       the spread of each part type, in bank order
     * @param nominal     the bank's own worst case
     * @param droopV      worst droop of each sample, by sample index
     * @param overshootV  worst overshoot of each sample, by sample index
     * @param passing     samples whose V_min and V_max stay inside the evaluator's limits
     * @param seconds     wall-clock time the run took (not part of equality: no two runs share it)
     */
    public record Result(Settings settings, List<PartSpread> parts, WorstCaseVolts nominal, double[] droopV,
                         double[] overshootV, int passing, double seconds) {
        public Result {
            parts = List.copyOf(parts);
            droopV = droopV.clone();
            overshootV = overshootV.clone();
            if (droopV.length != settings.samples() || overshootV.length != settings.samples()) {
                throw new IllegalArgumentException("one droop and one overshoot per sample expected");
            }
        }

        @Override
        public double[] droopV() {
            return droopV.clone();
        }

        @Override
        public double[] overshootV() {
            return overshootV.clone();
        }

        /** Share of samples inside the limits, 0 .. 1. */
        public double yieldFraction() {
            return (double) passing / settings.samples();
        }

        public Distribution droop() {
            return Distribution.of(droopV);
        }

        public Distribution overshoot() {
            return Distribution.of(overshootV);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Result r && r.settings.equals(settings) && r.parts.equals(parts)
                    && r.nominal.equals(nominal) && Arrays.equals(r.droopV, droopV)
                    && Arrays.equals(r.overshootV, overshootV) && r.passing == passing;
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(droopV) * 31 + Arrays.hashCode(overshootV) + passing;
        }

        @Override
        public String toString() {
            return "MonteCarlo.Result[" + settings.samples() + " samples, yield " + yieldFraction() + "]";
        }
    }

    /**
     * Draws {@code settings.samples()} samples of {@code bank} and judges each with {@code evaluator}
     * (its limits decide the yield), in parallel on the common fork-join pool.
     *
     * @throws IllegalArgumentException when a part's capacitance tolerance is not in [0, 1)
     */
    public static Result run(BankEvaluator evaluator, CapacitorBank bank, Settings settings) {
        return run(evaluator, bank, settings, BLOCK);
    }

    /** As {@link #run(BankEvaluator, CapacitorBank, Settings)}, drawing {@code block} samples at a time. */
    static Result run(BankEvaluator evaluator, CapacitorBank bank, Settings settings, int block) {
        long t0 = System.nanoTime();
        List<BankEntry> entries = bank.entries();
        int n = entries.size();
        double[] tol = new double[n];
        List<PartSpread> spreads = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Part p = entries.get(i).part();
            tol[i] = settings.tolerance().capacitanceTolerance(p);
            if (!drawable(tol[i])) {
                throw new IllegalArgumentException(p.name() + ": capacitance tolerance must be in 0 .. 100 % "
                        + "(exclusive) for Monte Carlo, got " + tol[i]);
            }
            spreads.add(new PartSpread(p.name(), entries.get(i).count(), tol[i], toleranceSource(p),
                    settings.spreadFraction(), settings.mountSpreadFraction()));
        }
        int samples = settings.samples();
        SplittableRandom root = new SplittableRandom(settings.seed());
        double[] droop = new double[samples];
        double[] over = new double[samples];
        int passing = 0;
        // block by block: sample k still takes the k-th seed of the root generator, whatever the block
        long[] seeds = new long[Math.min(block, samples)];
        boolean[] pass = new boolean[seeds.length];
        for (int from = 0; from < samples; from += block) {
            int base = from;
            int size = Math.min(block, samples - from);
            for (int j = 0; j < size; j++) {
                seeds[j] = root.nextLong();
            }
            IntStream.range(0, size).parallel().forEach(j -> {
                WorstCaseVolts f = evaluator.worstCaseVolts(network(evaluator, entries, tol, settings, seeds[j]));
                droop[base + j] = f.droopV();
                over[base + j] = f.overshootV();
                pass[j] = f.passes();
            });
            for (int j = 0; j < size; j++) {
                passing += pass[j] ? 1 : 0;
            }
        }
        WorstCaseVolts nominal = evaluator.worstCaseVolts(
                NetworkBuilder.build(evaluator.scenario(), entries, evaluator.footprint()));
        return new Result(settings, spreads, nominal, droop, over, passing, (System.nanoTime() - t0) / 1e9);
    }

    /**
     * Whether samples can be drawn within a capacitance tolerance: 0 to 100 %, 100 % excluded (a draw
     * could take C to nothing).
     */
    public static boolean drawable(double toleranceFraction) {
        return toleranceFraction >= 0 && toleranceFraction < 1;
    }

    /** The yield of a Monte Carlo run, when there was one. */
    public static java.util.OptionalDouble yieldOf(Optional<Result> run) {
        return run.map(r -> java.util.OptionalDouble.of(r.yieldFraction())).orElse(java.util.OptionalDouble.empty());
    }

    /**
     * The samples a run asked for, or none: announced to {@code listener} first; a tolerance the draws
     * cannot use is refused as a request ({@link RequestRefused}) naming the option.
     */
    public static Optional<Result> runRequested(BankEvaluator evaluator, CapacitorBank bank,
                                                Optional<Settings> settings, RunListener listener) {
        if (settings.isEmpty()) {
            return Optional.empty();
        }
        listener.monteCarloStarting(settings.get());
        try {
            return Optional.of(run(evaluator, bank, settings.get()));
        } catch (IllegalArgumentException e) {
            throw new RequestRefused("--monte-carlo: " + e.getMessage());
        }
    }

    /** The network of one sample (see the class comment), drawn from a generator seeded with {@code sampleSeed}. */
    static PowerNetwork network(BankEvaluator evaluator, List<BankEntry> entries, double[] tolerance, Settings settings,
                                long sampleSeed) {
        Scenario s = evaluator.scenario();
        SplittableRandom r = new SplittableRandom(sampleSeed);
        List<BankEntry> drawn = sample(entries, tolerance, settings.spreadFraction(), settings.mountSpreadFraction(),
                evaluator.footprint(), r);
        StackupSpread st = settings.stackup();
        // six draws, always in this order, whatever the spreads
        double uPc = r.nextDouble(-1.0, 1.0);
        double uPr = r.nextDouble(-1.0, 1.0);
        double uKr = r.nextDouble(-1.0, 1.0);
        double uKl = r.nextDouble(-1.0, 1.0);
        double uDc = r.nextDouble(-1.0, 1.0);
        double uDr = r.nextDouble(-1.0, 1.0);
        Plane plane = s.plane().isPresent() ? new Plane(s.plane().capacitanceF() * (1 + st.planeFraction() * uPc),
                s.plane().resistanceOhms() * (1 + st.planeFraction() * uPr)) : s.plane();
        PackagePath pkg = s.packagePath().present() ? new PackagePath(true,
                s.packagePath().resistanceOhms() * (1 + st.packageFraction() * uKr),
                s.packagePath().inductanceH() * (1 + st.packageFraction() * uKl)) : s.packagePath();
        Die die = s.die().isPresent() ? new Die(s.die().capacitanceF() * (1 + st.dieFraction() * uDc),
                s.die().resistanceOhms() * (1 + st.dieFraction() * uDr)) : s.die();
        // the drawn parts carry their resolved mounting inductance, so no footprint is applied again
        return NetworkBuilder.build(s, drawn, Optional.empty(), plane, pkg, die);
    }

    /** One sample's parts, without mounting-inductance spread and footprint (for tests of the draws). */
    static List<BankEntry> sample(List<BankEntry> entries, double[] tolerance, double spread, long sampleSeed) {
        return sample(entries, tolerance, spread, 0, Optional.empty(), new SplittableRandom(sampleSeed));
    }

    /**
     * Every part type drawn once from {@code r} (four draws each: C, ESR, ESL, mounting inductance); the
     * drawn part's mounting inductance is the one the evaluator uses ({@code footprint}'s for its case, else
     * the catalog's) times (1 + m·u₄).
     */
    static List<BankEntry> sample(List<BankEntry> entries, double[] tolerance, double spread, double mountSpread,
                                  Optional<Footprint> footprint, SplittableRandom r) {
        List<BankEntry> out = new ArrayList<>(entries.size());
        for (int i = 0; i < entries.size(); i++) {
            BankEntry e = entries.get(i);
            Part p = e.part();
            // four draws per type, always in this order, whatever the tolerances: widening a tolerance
            // scales the same draws
            double uC = r.nextDouble(-1.0, 1.0);
            double uR = r.nextDouble(-1.0, 1.0);
            double uL = r.nextDouble(-1.0, 1.0);
            double uM = r.nextDouble(-1.0, 1.0);
            Part drawn = new Part(p.name(), p.description(), p.caseCode(), p.dielectric(),
                    p.capacitanceF() * (1 + tolerance[i] * uC), p.esrOhms() * (1 + spread * uR),
                    p.eslH() * (1 + spread * uL),
                    PartBranches.mountInductanceH(p, footprint) * (1 + mountSpread * uM), p.unitCost(), p.voltageRatingV(),
                    p.toleranceFraction(), p.dcBiasRetention(), p.maxCount());
            out.add(new BankEntry(drawn, e.count(), e.region()));
        }
        return out;
    }
}
