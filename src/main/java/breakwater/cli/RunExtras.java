package breakwater.cli;

import breakwater.report.ReportModel;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;

/**
 * What a mode adds to the common output of {@link Results#emit}: report sections, summary.json keys,
 * console text (printed before the verdict), a change to the report model (e.g. overlaid curves), and a
 * condition the run must meet besides the spec for exit 0 (e.g. "no margin lost"), with its reason.
 *
 * @param sections       extra report sections, in order
 * @param summary        adds keys to summary.json
 * @param console        text printed after the bank's summary, before the verdict ("" for none)
 * @param model          applied to the report model before it is written
 * @param modeMet        the mode's own condition for exit 0, besides the spec
 * @param modeVerdict    why {@code modeMet} is false, printed with the verdict ("" when it is true)
 */
record RunExtras(List<ReportModel.Section> sections, Consumer<ObjectNode> summary, String console,
                 UnaryOperator<ReportModel> model, boolean modeMet, String modeVerdict) {

    RunExtras {
        sections = List.copyOf(sections);
        Objects.requireNonNull(summary, "summary");
        Objects.requireNonNull(console, "console");
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(modeVerdict, "modeVerdict");
    }

    static final RunExtras NONE = new RunExtras(List.of(), s -> { }, "", m -> m, true, "");

    static RunExtras of(List<ReportModel.Section> sections, Consumer<ObjectNode> summary, String console) {
        return new RunExtras(sections, summary, console, m -> m, true, "");
    }

    RunExtras withModel(UnaryOperator<ReportModel> change) {
        return new RunExtras(sections, summary, console, change, modeMet, modeVerdict);
    }

    RunExtras withModeCondition(boolean met, String whyNot) {
        return new RunExtras(sections, summary, console, model, met, met ? "" : whyNot);
    }

    /** Both, this one first. */
    RunExtras plus(RunExtras other) {
        List<ReportModel.Section> all = new ArrayList<>(sections);
        all.addAll(other.sections);
        String text = console.isEmpty() ? other.console
                : other.console.isEmpty() ? console : console + "\n" + other.console;
        String why = String.join("\n",
                java.util.stream.Stream.of(modeVerdict, other.modeVerdict).filter(s -> !s.isEmpty()).toList());
        return new RunExtras(all, summary.andThen(other.summary), text, m -> other.model.apply(model.apply(m)),
                modeMet && other.modeMet, why);
    }
}
