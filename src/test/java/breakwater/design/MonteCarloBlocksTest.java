package breakwater.design;

import org.junit.jupiter.api.Test;

import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Samples are drawn and judged block by block; the blocks must not change a single sample. */
class MonteCarloBlocksTest {

    @Test
    void theBlockSizeChangesNoSample() throws Exception {
        BankEvaluator ev = new BankEvaluator(MonteCarloTest.scenario(0.05), Optional.empty());
        CapacitorBank b = MonteCarloTest.bank(1, 2, 3, 4);
        MonteCarlo.Settings s = new MonteCarlo.Settings(23, 5, 0.2, p -> 0.1);
        MonteCarlo.Result whole = MonteCarlo.run(ev, b, s, MonteCarlo.BLOCK);
        // blocks of 1, of 4 (the last one short) and of the whole run hold the same samples in the same order
        assertThat(MonteCarlo.run(ev, b, s, 1)).isEqualTo(whole);
        assertThat(MonteCarlo.run(ev, b, s, 4)).isEqualTo(whole);
        assertThat(MonteCarlo.run(ev, b, s, 23)).isEqualTo(whole);
    }

    @Test
    void theSampleCountIsBounded() {
        assertThatThrownBy(() -> new MonteCarlo.Settings(0, 1, 0.2)).hasMessageContaining("1 to 1000000");
        assertThatThrownBy(() -> new MonteCarlo.Settings(MonteCarlo.MAX_SAMPLES + 1, 1, 0.2))
                .hasMessageContaining("1 to 1000000");
        assertThat(new MonteCarlo.Settings(MonteCarlo.MAX_SAMPLES, 1, 0.2).samples()).isEqualTo(1_000_000);
    }
}
