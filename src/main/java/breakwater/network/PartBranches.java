package breakwater.network;

import breakwater.catalog.Part;
import breakwater.scenario.Footprint;

import java.util.Optional;

/** Turns catalog parts into circuit branches. */
public final class PartBranches {
    private PartBranches() {
    }

    /**
     * Mounting inductance used for {@code part}: the footprint's value for the part's case code when the
     * footprint lists that case, else the catalog's {@code mount_inductance}.
     */
    public static double mountInductanceH(Part part, Optional<Footprint> footprint) {
        if (footprint.isPresent() && !part.caseCode().isEmpty()) {
            Double override = footprint.get().mountInductanceByCaseH().get(part.caseCode());
            if (override != null) {
                return override;
            }
        }
        return part.mountInductanceH();
    }

    /**
     * One part as a branch: R = ESR, L = ESL + mounting inductance, C = nominal × DC-bias retention
     * (docs/network-model.md#the-lumped-network).
     */
    public static SeriesBranch single(Part part, Optional<Footprint> footprint) {
        return new SeriesBranch(part.name(), part.esrOhms(), part.eslH() + mountInductanceH(part, footprint),
                part.effectiveCapacitanceF());
    }
}
