package breakwater.diagnostic;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Invisible and look-alike characters, named by code point (the Unicode standard's names) where they sit. */
class HiddenCharactersTest {

    @Test
    void aNoBreakSpaceBetweenNumberAndUnitIsAPlainSpaceWithAWarning() throws InputException {
        HiddenCharacters.Scan s = HiddenCharacters.scan("c = \"10\u00A0nF\"\nd = \"5\u202F%\"\n", "a.toml",
                HiddenCharacters.Syntax.TOML);
        assertThat(s.refusals()).isEmpty();
        assertThat(s.textOrThrow()).isEqualTo("c = \"10 nF\"\nd = \"5 %\"\n");
        assertThat(s.warnings()).extracting(Diagnostic::render).containsExactly(
                "a.toml:1:8: U+00A0 (no-break space) at column 8 between a number and its unit, read as a plain space;"
                        + " type a plain space to silence this",
                "a.toml:2:7: U+202F (narrow no-break space) at column 7 between a number and its unit, read as a plain"
                        + " space; type a plain space to silence this");
    }

    @Test
    void elsewhereEachIsRefusedWithWhatToType() {
        HiddenCharacters.Scan s = HiddenCharacters.scan("[rail]\u00A0\nna\u200Bme = \"x\"\nv = \"\u22125 V\"\n",
                "a.toml", HiddenCharacters.Syntax.TOML);
        assertThat(s.refusals()).extracting(Diagnostic::render).containsExactly(
                "a.toml:1:7: U+00A0 (no-break space) at column 7: type a plain space",
                "a.toml:2:3: U+200B (zero-width space) at column 3: an invisible character, delete it (retype the text "
                        + "around it)",
                "a.toml:3:6: U+2212 (minus sign) at column 6: a number's sign is a plain hyphen-minus '-'");
        assertThatThrownBy(s::textOrThrow).isInstanceOf(InputException.class);
    }

    @Test
    void commentsAndWordsAreLeftAlone() {
        // a comment may hold anything; a minus sign in words is no number's sign; a tab outside a string is TOML's
        HiddenCharacters.Scan s = HiddenCharacters.scan("# 10\u00A0nF \u200B\nname = \"a \u2212 b\"\n\tx = 1 # \t\n",
                "a.toml", HiddenCharacters.Syntax.TOML);
        assertThat(s.refusals()).isEmpty();
        assertThat(s.warnings()).isEmpty();
    }

    @Test
    void csvTabsInARowWithCommasAreRefusedAndAFileWithoutCommasIsLeftToTheSeparatorCheck() {
        HiddenCharacters.Scan s = HiddenCharacters.scan("# a\tcomment\npart,count\nA,\t2\n", "b.csv",
                HiddenCharacters.Syntax.CSV);
        assertThat(s.refusals()).extracting(Diagnostic::render).containsExactly(
                "b.csv:3:3: U+0009 (tab) at column 3: a row's fields are separated by commas; type a comma or a plain "
                        + "space");
        assertThat(HiddenCharacters.scan("part\tcount\nA\t2\n", "b.csv", HiddenCharacters.Syntax.CSV).refusals())
                .isEmpty();
    }

    @Test
    void columnsCountCodePoints() {
        // a character outside the Basic Multilingual Plane is one column (two UTF-16 units)
        HiddenCharacters.Scan s = HiddenCharacters.scan("x,\uD835\uDC00\u200B,1\n", "c.csv", HiddenCharacters.Syntax.CSV);
        assertThat(s.refusals()).extracting(Diagnostic::column).containsExactly(4);
    }

    @Test
    void withoutUnitsNoSpaceIsAccepted() {
        HiddenCharacters.Scan s = HiddenCharacters.scan("part,count\nA,2\u00A0x\n", "b.csv",
                HiddenCharacters.Syntax.CSV, false);
        assertThat(s.warnings()).isEmpty();
        assertThat(s.refusals()).extracting(Diagnostic::render)
                .containsExactly("b.csv:2:4: U+00A0 (no-break space) at column 4: type a plain space");
    }
}
