package breakwater.report;

import breakwater.report.export.ExportFormat;
import breakwater.report.export.ExportedRail;
import breakwater.report.export.SpiceDeck;
import breakwater.report.export.TouchstoneFile;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumSet;
import java.util.List;

/** Writes the files of the export formats asked for into the output folder, each atomically. */
public final class RailExports {
    private RailExports() {
    }

    /** Writes {@code formats} for {@code rail} into {@code dir}; returns the names written, in order. */
    public static List<String> write(OutputDirectory dir, Collection<ExportFormat> formats, ExportedRail rail)
            throws IOException {
        List<String> written = new ArrayList<>();
        EnumSet<ExportFormat> asked = formats.isEmpty() ? EnumSet.noneOf(ExportFormat.class) : EnumSet.copyOf(formats);
        if (asked.contains(ExportFormat.SPICE)) {
            for (SpiceDeck.Kind kind : SpiceDeck.Kind.values()) {
                dir.write(kind.file(), w -> SpiceDeck.write(rail, kind, w));
                written.add(kind.file());
            }
        }
        if (asked.contains(ExportFormat.TOUCHSTONE)) {
            dir.write(TouchstoneFile.FILE, w -> TouchstoneFile.write(rail, w));
            written.add(TouchstoneFile.FILE);
        }
        return written;
    }
}
