package breakwater.report;

import breakwater.catalog.BankEntry;
import breakwater.design.Evaluation;
import breakwater.network.ImpedanceCurve;

import java.io.IOException;
import java.io.Writer;
import java.util.Locale;

/** The CSV result files (docs/file-contracts.md#output-files). */
public final class CsvOutputs {
    private CsvOutputs() {
    }

    /**
     * bom.csv: {@code part,description,case,count,unit_cost,extended_cost}, one row per part, then a
     * {@code TOTAL} row whose count is the number of parts and whose extended cost is cost_total
     * (parts + placement + line items; the description spells out the split). A placed bank
     * (docs/network-model.md#placement-regions) has a last column {@code region}, one row per part and region.
     */
    public static void writeBom(Evaluation e, String currency, Writer w) throws IOException {
        boolean placed = e.bank().isPlaced();
        w.write("part,description,case,count,unit_cost,extended_cost" + (placed ? ",region" : "") + "\n");
        for (BankEntry be : e.bank().entries()) {
            w.write(Csv.text(be.part().name()) + "," + Csv.text(be.part().description()) + ","
                    + Csv.text(be.part().caseCode()) + "," + be.count() + "," + Csv.num(be.part().unitCost()) + ","
                    + Csv.num(breakwater.design.CostBreakdown.extended(be).doubleValue())
                    + (placed ? "," + Csv.text(be.region()) : "") + "\n");
        }
        String split = String.format(Locale.ROOT, "parts %.4f + placement %.4f + line items %.4f%s",
                e.cost().partsCost(), e.cost().placementCost(), e.cost().lineItemCost(),
                currency.isEmpty() ? "" : " " + currency);
        w.write("TOTAL," + Csv.text(split) + ",," + e.bank().totalParts() + ",," + Csv.num(e.cost().total())
                + (placed ? "," : "") + "\n");
    }

    /** worst-case.csv: {@code time_s,load_current_a,voltage_v}, the droop pattern up to and after the worst instant. */
    public static void writeWorstCase(breakwater.timedomain.Waveform wf, Writer w) throws IOException {
        w.write("time_s,load_current_a,voltage_v\n");
        double[] t = wf.timeS();
        double[] i = wf.loadCurrentA();
        double[] v = wf.voltageV();
        StringBuilder b = new StringBuilder();
        for (int k = 0; k < t.length; k++) {
            b.setLength(0);
            b.append(Csv.num(t[k])).append(',').append(Csv.num(i[k])).append(',').append(Csv.num(v[k])).append('\n');
            w.write(b.toString());
        }
    }

    /** impedance.csv: {@code frequency_hz,impedance_ohm,phase_deg,target_ohm}. */
    public static void writeImpedance(ImpedanceCurve curve, double targetOhms, Writer w) throws IOException {
        w.write("frequency_hz,impedance_ohm,phase_deg,target_ohm\n");
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < curve.size(); i++) {
            b.setLength(0);
            b.append(Csv.num(curve.frequencyHz(i))).append(',')
                    .append(Csv.num(curve.magnitudeOhms(i))).append(',')
                    .append(Csv.num(curve.phaseDegrees(i))).append(',')
                    .append(Csv.num(targetOhms)).append('\n');
            w.write(b.toString());
        }
    }
}
