package breakwater.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Writes a large catalog of INVENTED parts for behaviour tests and benchmarks of big searches (a stockroom
 * of thousands of parts). Seeded, so the same seed gives the same file; nothing it writes is committed.
 *
 * <p>The figures are typical-of-the-trade orders of magnitude written from memory (common practice), not
 * measurements of any part: per case code an ESL and a mounting inductance, an ESR that falls with
 * capacitance, capacitance values on the E6 series within what the case holds, ratings of 4 to 50 V.
 *
 * <p>Run: {@code java -cp target/test-classes breakwater.bench.CatalogGenerator OUT.csv [PARTS] [SEED]}.
 */
public final class CatalogGenerator {
    /** Case code, ESL (H), mounting inductance (H), smallest and largest capacitance (F). */
    private record CaseRange(String code, double eslH, double mountH, double minF, double maxF) {
    }

    private static final CaseRange[] CASES = {
        new CaseRange("0201", 0.18e-9, 0.35e-9, 100e-12, 1e-6),
        new CaseRange("0402", 0.35e-9, 0.45e-9, 100e-12, 4.7e-6),
        new CaseRange("0603", 0.5e-9, 0.6e-9, 1e-9, 22e-6),
        new CaseRange("0805", 0.6e-9, 0.7e-9, 10e-9, 47e-6),
        new CaseRange("1206", 0.8e-9, 0.9e-9, 100e-9, 100e-6),
        new CaseRange("1210", 0.9e-9, 1.0e-9, 1e-6, 100e-6),
    };
    private static final double[] E6 = {1.0, 1.5, 2.2, 3.3, 4.7, 6.8};
    private static final String[] DIELECTRICS = {"C0G", "X7R", "X5R"};
    private static final double[] RATINGS = {4, 6.3, 10, 16, 25, 50};

    private CatalogGenerator() {
    }

    /** The catalog text: a header saying the data is invented, then {@code parts} rows. */
    public static String catalog(int parts, long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        StringBuilder b = new StringBuilder();
        b.append("# Breakwater GENERATED catalog: INVENTED DATA for tests and benchmarks, seed ").append(seed)
                .append(".\n# No real company, brand or part is meant; values are typical-of-the-trade orders of\n"
                        + "# magnitude from memory, NOT measurements. Never design with it.\n")
                .append("part,description,case,dielectric,capacitance,esr,esl,mount_inductance,cost,voltage_rating,"
                        + "tolerance,dc_bias_retention,max_count\n");
        for (int i = 0; i < parts; i++) {
            if (i % BULK_EVERY == BULK_EVERY - 1) {
                bulk(b, i, r);
                continue;
            }
            CaseRange c = CASES[r.nextInt(CASES.length)];
            int decades = (int) Math.round(Math.log10(c.maxF() / c.minF()));
            double cap = c.minF() * Math.pow(10, r.nextInt(decades + 1)) * E6[r.nextInt(E6.length)];
            cap = Math.min(cap, c.maxF());
            String dielectric = cap <= 10e-9 && r.nextBoolean() ? "C0G" : DIELECTRICS[1 + r.nextInt(2)];
            // ESR of a ceramic falls roughly as 1/sqrt(C): ~5 mΩ at 10 µF, ~50 mΩ at 100 nF
            double esr = 5e-3 * Math.sqrt(10e-6 / cap) * (0.7 + 0.6 * r.nextDouble());
            esr = Math.max(1e-3, Math.min(esr, 0.5));
            double esl = c.eslH() * (0.9 + 0.2 * r.nextDouble());
            double cost = 0.001 + 0.002 * Math.log10(cap / 1e-12) * (0.5 + r.nextDouble()) / 3;
            double rating = RATINGS[r.nextInt(RATINGS.length)];
            double retention = dielectric.equals("C0G") ? 1.0 : 0.5 + 0.5 * r.nextDouble();
            String tolerance = dielectric.equals("C0G") ? "5 %" : dielectric.equals("X7R") ? "10 %" : "20 %";
            b.append(String.format(Locale.ROOT, "G%05d-%s-%s,\"generated %s %s\",%s,%s,%.4g,%.4g,%.4g,%.4g,%.5f,%s,%s,%.3f,%n",
                    i, c.code(), dielectric, dielectric, c.code(), c.code(), dielectric, cap, esr, esl, c.mountH(),
                    cost, rating, tolerance, retention));
        }
        return b.toString();
    }

    /** One part in this many is a polymer bulk part (a large catalog holds a few, as a stockroom does). */
    static final int BULK_EVERY = 32;
    private static final String[] BULK_CASES = {"B", "D", "7343"};
    private static final double[] BULK_UF = {47, 100, 150, 220, 330, 470};

    /**
     * A polymer bulk part: 47 … 470 µF, ESR 5 … 40 mΩ falling with capacitance, ESL 0.8 … 1.6 nH, mounting
     * 0.8 … 1.2 nH, 20 % tolerance, no DC-bias loss (orders of magnitude from memory, common practice).
     */
    private static void bulk(StringBuilder b, int i, SplittableRandom r) {
        int k = r.nextInt(BULK_CASES.length);
        String code = BULK_CASES[k];
        double cap = BULK_UF[r.nextInt(BULK_UF.length)] * 1e-6;
        double esr = 12e-3 * Math.sqrt(220e-6 / cap) * (0.6 + 0.8 * r.nextDouble());
        double esl = (0.8 + 0.4 * k) * 1e-9 * (0.9 + 0.2 * r.nextDouble());
        double mount = (0.8 + 0.2 * k) * 1e-9;
        double cost = (0.08 + 0.0006 * cap * 1e6) * (0.7 + 0.6 * r.nextDouble());
        double rating = new double[] {2.5, 4, 6.3, 10, 16}[r.nextInt(5)];
        b.append(String.format(Locale.ROOT, "G%05d-%s-polymer,\"generated polymer %s\",%s,polymer,%.4g,%.4g,%.4g,%.4g,%.5f,%s,20 %%,1.000,%n",
                i, code, code, code, cap, esr, esl, mount, cost, rating));
    }

    /** Writes {@link #catalog(int, long)} to {@code file}. */
    public static Path write(Path file, int parts, long seed) throws IOException {
        Files.writeString(file, catalog(parts, seed), StandardCharsets.UTF_8);
        return file;
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 1) {
            System.err.println("usage: CatalogGenerator OUT.csv [PARTS (2000)] [SEED (1)]");
            System.exit(2);
        }
        int parts = args.length > 1 ? Integer.parseInt(args[1]) : 2000;
        long seed = args.length > 2 ? Long.parseLong(args[2]) : 1;
        write(Path.of(args[0]), parts, seed);
    }
}
