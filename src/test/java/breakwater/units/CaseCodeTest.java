package breakwater.units;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Case code forms. Source: EIA chip sizes are named by length and width in hundredths of an inch, four
 * digits (0402 = 0.04 in × 0.02 in), and moulded tantalum/polymer cases by letters A, B, C, D, E, V, X
 * (common practice, from memory).
 */
class CaseCodeTest {

    @ParameterizedTest
    @ValueSource(strings = {"0201", "0402", "0603", "0805", "1206", "1210", "1812", "2220", "A", "D", "V", "X", "EE"})
    void acceptsEiaDigitsAndLetterCodes(String code) {
        assertThat(CaseCode.isValid(code)).isTrue();
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "402", "04020", "0402A", "a", "ABC", "04O2", " 0402", "0402 "})
    void refusesOtherForms(String code) {
        assertThat(CaseCode.isValid(code)).isFalse();
    }
}
