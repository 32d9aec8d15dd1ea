package breakwater.report;

import breakwater.catalog.BankEntry;
import breakwater.design.BoardCheck;
import breakwater.design.Evaluation;
import breakwater.network.AntiResonance;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;

import breakwater.timedomain.DroopByAge;

import java.util.List;
import java.util.Locale;

import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.CURRENT;
import static breakwater.units.Quantity.FREQUENCY;
import static breakwater.units.Quantity.FRACTION;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.TIME;
import static breakwater.units.Quantity.VOLTAGE;

/** The human-readable summary printed on the console. */
public final class ConsoleReport {
    private ConsoleReport() {
    }

    public static String render(Scenario scenario, String footprintName, Evaluation e) {
        StringBuilder b = new StringBuilder();
        Rail r = scenario.rail();
        String currency = scenario.cost().currency();
        line(b, "Rail", r.name().isEmpty() ? scenario.source() : r.name());
        line(b, "", volts(r.voltageV()) + " ± " + format(r.toleranceFraction(), FRACTION)
                + " (" + volts(r.toleranceLowerV()) + " .. " + volts(r.toleranceUpperV()) + "), load "
                + format(r.minCurrentA(), CURRENT) + " .. " + format(r.maxCurrentA(), CURRENT) + " (ΔI "
                + format(r.currentStepA(), CURRENT) + "), "
                + (r.hasEdgeTime() ? "edge time " + format(r.edgeTimeS(), TIME) : "ideal edges"));
        if (r.hasBudget()) {
            line(b, "Budget", budget(r));
        }
        line(b, "Target", "Z_t = " + format(r.targetImpedanceOhms(), RESISTANCE) + "  (" + targetRule(r) + ")");
        if (!footprintName.isEmpty()) {
            line(b, "Footprint", footprintName);
        }
        b.append('\n');
        String cur = currency.isEmpty() ? "" : " (" + currency + ")";
        boolean placed = e.bank().isPlaced();
        b.append(String.format(Locale.ROOT, "  %-24s %-6s %6s %12s %16s%s%n", "part", "case", "count", "unit" + cur,
                "extended" + cur, placed ? "  region" : ""));
        for (BankEntry be : e.bank().entries()) {
            b.append(String.format(Locale.ROOT, "  %-24s %-6s %6d %12s %16s%s%n", be.part().name(), be.part().caseCode(),
                    be.count(), money(be.part().unitCost()), money(be.part().unitCost() * be.count()),
                    placed ? "  " + be.region() : ""));
        }
        if (e.bank().entries().isEmpty()) {
            b.append("  (empty bank)\n");
        }
        b.append(String.format(Locale.ROOT, "  %-24s %-6s %6d %12s %16s%n", "total", "", e.bank().totalParts(), "",
                money(e.cost().total())));
        line(b, "Cost", money(e.cost().total()) + (currency.isEmpty() ? "" : " " + currency) + " per board (parts "
                + money(e.cost().partsCost()) + ", placement " + money(e.cost().placementCost()) + ", line items "
                + money(e.cost().lineItemCost()) + "); " + e.bank().totalParts() + " parts, "
                + e.bank().distinctParts() + " distinct");
        for (BoardCheck.Violation v : e.board()) {
            line(b, "Board", "LIMIT BROKEN: " + v.describe());
        }
        b.append('\n');
        var wc = e.figures();
        line(b, "Worst case", "droop " + format(wc.droopV(), VOLTAGE) + ", overshoot " + format(wc.overshootV(), VOLTAGE)
                + " from the " + volts(wc.operatingV()) + " operating point at I_min"
                + (r.hasEdgeTime() ? " (any load slewing no faster than ΔI in " + format(r.edgeTimeS(), TIME) + ")"
                : " (any load pattern, ideal edges)"));
        line(b, "", "V_min " + volts(wc.minVoltageV()) + " (limit " + volts(wc.lowerLimitV()) + "), V_max "
                + volts(wc.maxVoltageV()) + " (limit " + volts(wc.upperLimitV()) + "), margin "
                + format(wc.marginV(), VOLTAGE) + (wc.passes() ? "  PASS" : "  FAIL"));
        line(b, "", String.format(Locale.ROOT, "worst-case ratio %.2f: worst excursion / ΔI·Z_t (ΔI·Z_t = %s)",
                wc.worstCaseRatio(), format(r.currentStepA() * r.targetImpedanceOhms(), VOLTAGE)));
        line(b, "", accuracy(e.worstCase().relativeAccuracy()));
        line(b, "", "droop from load activity older than: " + droopByAgeText(e));
        b.append('\n');
        var m = e.impedance();
        line(b, "Impedance", "peak " + format(m.peakOhms(), RESISTANCE) + " at " + format(m.peakHz(), FREQUENCY)
                + String.format(Locale.ROOT, " (%.2f × target)", m.peakOverTarget())
                + String.format(Locale.ROOT, ", flatness %.2f dB (max/min |Z|)", m.flatnessDb())
                + " over " + format(scenario.band().fromHz(), FREQUENCY) + " .. " + format(scenario.band().toHz(), FREQUENCY));
        if (m.antiResonances().isEmpty()) {
            line(b, "", "no anti-resonance in the band");
        } else {
            b.append(String.format(Locale.ROOT, "  %-14s %10s %8s %6s   %s%n", "", "", "", "",
                    "response to a load swinging by ΔI:"));
            b.append(String.format(Locale.ROOT, "  %-14s %10s %8s %6s   %9s %14s %16s %15s%n", "anti-resonance", "|Z|",
                    "|Z|/Z_t", "Q", "ΔI step", "resonant sine", "resonant square", "cycles to 95 %"));
            for (int i = 0; i < m.antiResonances().size(); i++) {
                AntiResonance a = m.antiResonances().get(i);
                var rf = e.resonances().get(i);
                var rr = rf.response();
                double dI = r.currentStepA();
                boolean rings = rf.rings();
                b.append(String.format(Locale.ROOT, "  %-14s %10s %8.2f %6.2f   %9s %14s %16s %15s%n",
                        format(a.frequencyHz(), FREQUENCY, 4), format(a.impedanceOhms(), RESISTANCE),
                        a.impedanceOhms() / m.targetOhms(), a.q(),
                        rings ? format(dI * rf.ownStepPeakOhms(), VOLTAGE) : "-",
                        rings ? format(dI * rr.sineAmplitudeOhms(), VOLTAGE) : "-",
                        rings ? format(dI * rr.squareAmplitudeOhms(), VOLTAGE) : "-",
                        rr.cyclesTo95Percent() > 0 ? Integer.toString(rr.cyclesTo95Percent()) : "-"));
            }
            b.append(Texts.wrap("  (square: a 50 % square wave at the resonance; cycles to 95 %: cycles of resonant drive "
                    + "until the sine response reaches 95 % of its steady state; - where no mode rings)", "   "));
        }
        return b.toString();
    }

    /**
     * The part of the worst droop due to load activity older than each of {@link DroopByAge#AGES_S}
     * (docs/worst-case.md#droop-by-age), as shares of the droop (0 when there is no droop).
     */
    static List<double[]> droopByAge(Evaluation e) {
        List<double[]> out = new java.util.ArrayList<>();
        double droop = e.worstCase().droopOhms();
        for (DroopByAge.Share s : DroopByAge.of(e.model(), e.worstCase().droopPattern())) {
            out.add(new double[]{s.ageS(), s.olderOhms(), droop > 0 ? s.olderOhms() / droop : 0});
        }
        return out;
    }

    /** A share as a percentage with {@code digits} decimals; a share that rounds to zero is "0 %", never "-0 %". */
    static String percent(double share, int digits) {
        String t = String.format(Locale.ROOT, "%." + digits + "f", 100 * share);
        return (t.matches("-0\\.?0*") ? t.substring(1) : t) + " %";
    }

    /** "10 ns gives 62 %, 100 ns 30 %, …" for the console and the report. */
    static String droopByAgeText(Evaluation e) {
        StringBuilder b = new StringBuilder();
        for (double[] s : droopByAge(e)) {
            b.append(b.isEmpty() ? "" : ", ").append(format(s[0], TIME)).append(' ')
                    .append(percent(s[2], 0));
        }
        return b.toString();
    }

    /** The tolerance budget in words: set point, ripple, and what is left for the transient (console and report). */
    static String budget(Rail r) {
        return "set point ± " + format(r.setPointFraction(), FRACTION) + " (" + format(r.setPointV(), VOLTAGE)
                + "), ripple " + format(r.rippleVpp(), VOLTAGE) + " peak-to-peak (± " + format(r.rippleVpp() / 2, VOLTAGE)
                + "), left for the transient ± " + format(r.transientAllowanceV(), VOLTAGE) + " ("
                + volts(r.lowerLimitV()) + " .. " + volts(r.upperLimitV()) + ")";
    }

    /** How the target impedance was computed, in words. */
    static String targetRule(Rail r) {
        return r.hasBudget() ? "(V × tolerance − V × set point − ripple/2) / ΔI" : "V × tolerance / ΔI";
    }

    /** The worst case's stated accuracy in words (console and report). */
    static String accuracy(double relative) {
        return "exact for the model to " + String.format(Locale.ROOT, "%.0e", relative).replace("e-0", "e-")
                + " relative: reached by a load pattern, at most that fraction below the model's true worst case";
    }

    /** Volts with 4 significant digits (trailing zeros kept), always in V (engineers write 0.9 V, not 900 mV, for a rail). */
    public static String volts(double v) {
        // four significant digits kept, trailing zeros included, so limits and V_min/V_max read alike
        java.math.BigDecimal d = new java.math.BigDecimal(v).round(new java.math.MathContext(4));
        int integerDigits = d.signum() == 0 ? 1 : d.precision() - d.scale();
        return d.setScale(Math.max(d.scale(), 4 - Math.max(integerDigits, 0)),
                java.math.RoundingMode.HALF_EVEN).toPlainString() + " V";
    }

    static String money(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }

    /** A labelled line, wrapped to the console's width under its text column. */
    private static void line(StringBuilder b, String head, String text) {
        b.append(Texts.wrap(String.format(Locale.ROOT, "%-10s %s", head, text), " ".repeat(11)));
    }
}
