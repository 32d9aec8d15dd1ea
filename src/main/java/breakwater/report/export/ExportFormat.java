package breakwater.report.export;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/** The open file conventions a judged rail can be written in, for re-checking it with other tools. */
public enum ExportFormat {
    /** Berkeley SPICE netlists (SPICE3 syntax): the rail with its worst-case droop and overshoot loads. */
    SPICE("spice", List.of(SpiceDeck.DROOP_FILE, SpiceDeck.OVERSHOOT_FILE)),
    /** Touchstone (version 1.1) one-port Z-parameters: the impedance at the load. */
    TOUCHSTONE("touchstone", List.of(TouchstoneFile.FILE));

    private final String word;
    private final List<String> files;

    ExportFormat(String word, List<String> files) {
        this.word = word;
        this.files = files;
    }

    /** The word on the command line ("spice"). */
    public String word() {
        return word;
    }

    /** The files this format writes into the output folder. */
    public List<String> files() {
        return files;
    }

    /** The format named {@code word}, ignoring case and surrounding blanks. */
    public static Optional<ExportFormat> byWord(String word) {
        String w = word.strip().toLowerCase(Locale.ROOT);
        for (ExportFormat f : values()) {
            if (f.word.equals(w)) {
                return Optional.of(f);
            }
        }
        return Optional.empty();
    }
}
