package breakwater.scenario;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A rail scenario as read from its TOML file (docs/file-contracts.md#scenario-toml).
 *
 * @param source        the scenario file as the user named it (for messages)
 * @param rail          electrical spec
 * @param band          band where flatness and target are judged
 * @param regulator     regulator output impedance
 * @param plane         plane capacitance, or {@link Plane#NONE}
 * @param packagePath   package path to the load, or {@link PackagePath#NONE}
 * @param die           die capacitance, or {@link Die#NONE}
 * @param catalogFile   catalog path, already resolved against the scenario's folder
 * @param board         board limits
 * @param footprints    named layout options, in file order
 * @param cost          extra costs
 * @param solver        search settings
 * @param requireTarget also hold |Z| under the target impedance in the band
 * @param existingBankFile bank to cost down, resolved against the scenario's folder, or "" for none
 * @param designMarginV how far inside the tolerance band {@code solve} keeps the worst case, V (0: none)
 * @param regions       placement regions in file order (docs/network-model.md#placement-regions); empty: every
 *                      part on the board node
 */
public record Scenario(
        String source,
        Rail rail,
        Band band,
        Regulator regulator,
        Plane plane,
        PackagePath packagePath,
        Die die,
        Path catalogFile,
        Board board,
        Map<String, Footprint> footprints,
        CostModel cost,
        SolverSettings solver,
        boolean requireTarget,
        String existingBankFile,
        double designMarginV,
        List<Region> regions) {

    public Scenario {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(rail, "rail");
        Objects.requireNonNull(band, "band");
        Objects.requireNonNull(regulator, "regulator");
        Objects.requireNonNull(plane, "plane");
        Objects.requireNonNull(packagePath, "packagePath");
        Objects.requireNonNull(die, "die");
        Objects.requireNonNull(catalogFile, "catalogFile");
        Objects.requireNonNull(board, "board");
        Objects.requireNonNull(cost, "cost");
        Objects.requireNonNull(solver, "solver");
        Objects.requireNonNull(existingBankFile, "existingBankFile");
        if (!(designMarginV >= 0) || !Double.isFinite(designMarginV)) {
            throw new IllegalArgumentException("design margin must be finite and >= 0, got " + designMarginV);
        }
        regions = List.copyOf(regions);
        if (regions.stream().map(Region::name).distinct().count() != regions.size()) {
            throw new IllegalArgumentException("two regions with one name");
        }
        // keep file order: the reader passes a LinkedHashMap; copy defensively but in order
        footprints = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(footprints));
    }

    /** Without a design margin. */
    public Scenario(String source, Rail rail, Band band, Regulator regulator, Plane plane, PackagePath packagePath,
                    Die die, Path catalogFile, Board board, Map<String, Footprint> footprints, CostModel cost,
                    SolverSettings solver, boolean requireTarget, String existingBankFile) {
        this(source, rail, band, regulator, plane, packagePath, die, catalogFile, board, footprints, cost, solver,
                requireTarget, existingBankFile, 0.0);
    }

    /** Without placement regions. */
    public Scenario(String source, Rail rail, Band band, Regulator regulator, Plane plane, PackagePath packagePath,
                    Die die, Path catalogFile, Board board, Map<String, Footprint> footprints, CostModel cost,
                    SolverSettings solver, boolean requireTarget, String existingBankFile, double designMarginV) {
        this(source, rail, band, regulator, plane, packagePath, die, catalogFile, board, footprints, cost, solver,
                requireTarget, existingBankFile, designMarginV, List.of());
    }

    /** The region named {@code name}, if declared. */
    public Optional<Region> region(String name) {
        return regions.stream().filter(r -> r.name().equals(name)).findFirst();
    }

    /** The regions' names in file order. */
    public List<String> regionNames() {
        return regions.stream().map(Region::name).toList();
    }

    public Optional<Path> existingBank() {
        return existingBankFile.isEmpty() ? Optional.empty() : Optional.of(Path.of(existingBankFile));
    }

    public Optional<Footprint> footprint(String name) {
        return Optional.ofNullable(footprints.get(name));
    }
}
