package breakwater.optimize;

import breakwater.design.Evaluation;

import java.util.List;
import java.util.Optional;

/** A step of a run that an engine announces before it starts it (see {@link SearchRunner#announce}). */
public sealed interface SearchStage {

    /** {@code solve}: one search over the candidates {@code screening} kept. */
    record Solving(Screening screening, SearchSettings settings) implements SearchStage {
        /** Candidates searched. */
        public int parts() {
            return screening.kept().size();
        }
    }

    /**
     * {@code trim}: a search from the existing bank, named {@code bankName}, keeping {@code keep} (and
     * only its own part numbers when {@code existingPartsOnly}).
     */
    record Trimming(String bankName, Evaluation existing, CostDown.Keep keep, boolean existingPartsOnly, int parts,
                    SearchSettings settings)
            implements SearchStage {
    }

    /** {@code compare}: one search per footprint, or one given bank judged under each. */
    record Comparing(List<String> footprints, Optional<String> bankName, SearchSettings all, SearchSettings each)
            implements SearchStage {
        public Comparing {
            footprints = List.copyOf(footprints);
        }
    }

    /** {@code compare}: the search under one footprint. */
    record FootprintSearch(String name) implements SearchStage {
    }

    /** {@code frontier}: {@code points} limits, one search each after the search for the tightest. */
    record Frontier(int points, SearchSettings all, SearchSettings each) implements SearchStage {
    }

    /** {@code frontier}: the search for the smallest worst excursion within reach. */
    record TightestSearch() implements SearchStage {
    }

    /** {@code frontier}: the search for limit {@code index} (from 1) of {@code of}. */
    record LimitSearch(int index, int of) implements SearchStage {
    }
}
