package breakwater.optimize;

import breakwater.catalog.CatalogReader;
import breakwater.design.BoardCheck;
import breakwater.design.Candidates;
import breakwater.scenario.Scenario;
import breakwater.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.SplittableRandom;

import static org.assertj.core.api.Assertions.assertThat;

/** The running room counts say what the board check says, on the demo rails with and without regions. */
class RoomCountTest {

    @Test
    void oneMoreFitsExactlyWhenTheBoardCheckFindsNothing() throws Exception {
        for (String file : new String[] {"scenarios/drone-core.toml", "scenarios/spectrometer-ddr.toml"}) {
            Scenario s = ScenarioReader.read(Path.of(file), file);
            var parts = CatalogReader.read(s.catalogFile(), s.catalogFile().toString()).parts();
            Candidates c = Candidates.forScenario(parts, s);
            RoomCount room = new RoomCount(s, c);
            SplittableRandom r = new SplittableRandom(3);
            int checked = 0;
            for (int trial = 0; trial < 3000; trial++) {
                int[] counts = new int[c.size()];
                int types = 1 + r.nextInt(9);
                for (int t = 0; t < types; t++) {
                    counts[r.nextInt(c.size())] = r.nextInt(14);
                }
                if (!BoardCheck.violations(c.bank(counts), s.board(), s.regions()).isEmpty()) {
                    continue; // the counts only promise to judge additions to a bank within the limits
                }
                room.reset(counts);
                int i = r.nextInt(c.size());
                int k = 1 + r.nextInt(12);
                counts[i] += k;
                boolean fits = BoardCheck.violations(c.bank(counts), s.board(), s.regions()).isEmpty();
                assertThat(room.fits(i, k)).as("%s: %d more of %s", file, k, c.part(i).name()).isEqualTo(fits);
                checked++;
            }
            assertThat(checked).as(file).isGreaterThan(200);
        }
    }
}
