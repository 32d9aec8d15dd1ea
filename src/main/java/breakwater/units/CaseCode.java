package breakwater.units;

import java.util.regex.Pattern;

/**
 * How a part's case (package size) is written: an EIA case code of four digits such as 0201, 0402,
 * 0603, 0805, 1206, 1210, 1812, 2220 (inch-based length and width in hundredths), or a letter code of one
 * or two capital letters as used for moulded parts (A, B, C, D, E, V, X). Case codes are strings: the
 * leading zero of 0402 is part of the name.
 */
public final class CaseCode {
    private static final Pattern FORM = Pattern.compile("\\d{4}|[A-Z]{1,2}");

    /** The rule, worded for messages. */
    public static final String RULE = "a case code is an EIA code of 4 digits such as 0402 or 1206,"
            + " or 1 or 2 capital letters such as A or D for moulded parts";

    private CaseCode() {
    }

    public static boolean isValid(String code) {
        return FORM.matcher(code).matches();
    }
}
