package breakwater.report;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** Ratings and percentages as a person writes them. */
class RatingsNoteTest {
    @Test
    void plainNumbersLoseTrailingZerosAfterThePointOnly() {
        assertThat(RatingsNote.plain(10)).isEqualTo("10");
        assertThat(RatingsNote.plain(6.3)).isEqualTo("6.3");
        assertThat(RatingsNote.plain(1000)).isEqualTo("1000");
        assertThat(RatingsNote.plain(2500)).isEqualTo("2500");
        assertThat(RatingsNote.plain(3)).isEqualTo("3");
        assertThat(RatingsNote.plain(0.25)).isEqualTo("0.25");
    }
}
