package breakwater.report.export;

import breakwater.design.WorstCaseVolts;
import breakwater.network.ImpedanceCurve;
import breakwater.network.FrequencyGrid;
import breakwater.network.PowerNetwork;
import breakwater.timedomain.Waveform;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A complete SPICE3 deck that replays one worst case of a judged rail: the rail's subcircuit
 * ({@link RailNetlist}), a piecewise-linear load current with every breakpoint of the worst-case pattern,
 * a unit AC current at the load, a transient analysis fine enough for the fastest mode and an AC analysis
 * over the range of impedance.csv. Only plain SPICE3 cards are used (elements, {@code .subckt},
 * {@code .tran}, {@code .ac}, {@code .save}, {@code .end}), so that any SPICE-family simulator reads it.
 */
public final class SpiceDeck {
    public static final String DROOP_FILE = "rail-droop.cir";
    public static final String OVERSHOOT_FILE = "rail-overshoot.cir";

    /** Largest time step as a share of the fastest mode's period. */
    static final double STEPS_PER_PERIOD = 50;
    /** Largest time step as a share of the load's edge time. */
    static final double STEPS_PER_EDGE = 5;

    /** Which worst case a deck replays. */
    public enum Kind {
        DROOP("droop", DROOP_FILE), OVERSHOOT("overshoot", OVERSHOOT_FILE);

        final String word;
        final String file;

        Kind(String word, String file) {
            this.word = word;
            this.file = file;
        }

        public String file() {
            return file;
        }
    }

    private SpiceDeck() {
    }

    /** The largest transient step: 1/50 of the fastest mode's period, and 1/5 of the edge time if there is one. */
    static double maxStepS(double shortestPeriodS, double edgeTimeS) {
        double step = shortestPeriodS / STEPS_PER_PERIOD;
        return edgeTimeS > 0 ? Math.min(step, edgeTimeS / STEPS_PER_EDGE) : step;
    }

    /**
     * The .ac sweep's last frequency: the last point of impedance.csv on its regular spacing of
     * 10^(1/200) (the clamped end of the band is left out when it falls between two), raised by 1e-12
     * relative so that a simulator counting its points by rounding down still reaches it. A sweep
     * {@code dec 200} from the first point of impedance.csv to there then lands on its points.
     */
    static double acStopHz(ImpedanceCurve curve) {
        int n = curve.size();
        double ratio = Math.pow(10.0, 1.0 / FrequencyGrid.DEFAULT_POINTS_PER_DECADE);
        double lastStep = curve.frequencyHz(n - 1) / curve.frequencyHz(n - 2);
        double last = Math.abs(lastStep / ratio - 1) < 1e-9 ? curve.frequencyHz(n - 1) : curve.frequencyHz(n - 2);
        return last * (1 + 1e-12);
    }

    public static void write(ExportedRail r, Kind kind, Writer w) throws IOException {
        for (String line : lines(r, kind)) {
            w.write(line);
            w.write('\n');
        }
    }

    static List<String> lines(ExportedRail r, Kind kind) {
        var ev = r.evaluation();
        PowerNetwork network = ev.network();
        WorstCaseVolts f = ev.figures();
        var rail = r.scenario().rail();
        Waveform wf = kind == Kind.DROOP ? r.droop() : r.overshoot();
        double period = r.shortestPeriodS();
        PwlSchedule pwl = PwlSchedule.of(wf.timeS(), wf.loadCurrentA(), period);
        double tmax = maxStepS(period, rail.edgeTimeS());
        double tstop = pwl.time(pwl.size() - 1);
        ImpedanceCurve curve = ev.curve();
        double fFrom = curve.frequencyHz(0);
        double fTo = acStopHz(curve);
        int perDecade = FrequencyGrid.DEFAULT_POINTS_PER_DECADE;

        List<String> out = new ArrayList<>();
        SpiceNetlist c = new SpiceNetlist();
        // the first line of a deck is its title; it starts with '*' so that no reader takes it for a card
        c.comment("Breakwater worst-case " + kind.word + " replay: " + r.railName());
        c.comment("Written by Breakwater " + r.version() + " for scenario " + r.scenario().source() + ", with "
                + r.footprintText() + ".");
        c.comment("Bank: " + r.bankText() + ".");
        c.comment("");
        if (kind == Kind.DROOP) {
            c.comment("Expected (Breakwater's exact worst case of this lumped model): the MINIMUM of v(load) is "
                    + num(f.minVoltageV()) + " V at t = " + num(wf.worstInstantS()) + " s,");
            c.comment("a droop of " + num(f.droopV()) + " V below the operating point " + num(f.operatingV())
                    + " V (V_nom - Z(0)*I_min); the lower limit is " + num(f.lowerLimitV()) + " V.");
        } else {
            c.comment("Expected (Breakwater's exact worst case of this lumped model): the MAXIMUM of v(load) is "
                    + num(f.maxVoltageV()) + " V at t = " + num(wf.worstInstantS()) + " s,");
            c.comment("an overshoot of " + num(f.overshootV()) + " V above the operating point " + num(f.operatingV())
                    + " V (V_nom - Z(0)*I_min); the upper limit is " + num(f.upperLimitV()) + " V.");
        }
        c.comment("A simulator integrates the same model numerically, step by step: expect agreement to a small "
                + "fraction of a percent of the " + kind.word + ", not to the last digit.");
        c.comment("In the .ac analysis v(load) is Z(f) at the load in ohms; it matches impedance.csv.");
        c.comment("");
        c.comment("Caution: a model is not a measurement. Verify the design on hardware (impedance and transient "
                + "measurements on the real board),");
        c.comment("and respect part ratings (voltage, temperature, ripple current, DC bias) and the local codes.");
        c.comment("");
        c.comment("To look at it in ngspice, an open-source SPICE simulator: 'ngspice " + kind.file + "', then the "
                + "interactive commands");
        c.comment("  run   plot v(load)   meas tran v" + (kind == Kind.DROOP ? "min MIN" : "max MAX") + " v(load)");
        c.comment("(they are not part of this deck), or in batch mode 'ngspice -b -r " + kind.word + ".raw "
                + kind.file + "'.");
        c.comment("");
        out.addAll(c.lines());
        out.addAll(RailNetlist.subcircuit(network, rail.voltageV(), ev.bank().entries(), r.footprint(),
                r.footprintName()));

        SpiceNetlist top = new SpiceNetlist();
        top.comment("");
        top.line(top.declare("Xrail") + " " + RailNetlist.LOAD + " 0 " + RailNetlist.SUBCIRCUIT);
        top.comment("");
        top.comment("Load current from the load node to ground: the worst-case " + kind.word + " pattern, "
                + (kind == Kind.DROOP ? "every breakpoint of worst-case.csv"
                : "every breakpoint of the waveform Breakwater computes for it (worst-case.csv holds the droop "
                + "pattern)") + ":");
        top.comment(pwl.size() + " breakpoints over " + num(tstop) + " s; the worst instant is at "
                + num(wf.worstInstantS()) + " s, then the load holds its value while the rail settles.");
        if (pwl.jumps() > 0) {
            top.comment("The pattern has " + pwl.jumps() + " ideal jumps (two breakpoints at one time). SPICE needs "
                    + "strictly increasing times, so the two breakpoints of a jump are");
            top.comment("separated by " + num(pwl.separationS()) + " s, centred on the jump's time: "
                    + num(PwlSchedule.SEPARATION_PER_PERIOD) + " of the fastest mode's period (" + num(period)
                    + " s), far too short to change the result.");
        } else {
            top.comment("The pattern has no ideal jumps (its edges take at least the rail's edge time), so its "
                    + "times already increase strictly.");
        }
        top.comment("The transient starts from the DC operating point with the load at its first value, "
                + num(pwl.value(0)) + " A.");
        top.line(top.declare("Iload") + " " + RailNetlist.LOAD + " 0 DC " + num(pwl.value(0)) + " PWL(");
        for (int i = 0; i < pwl.size(); i++) {
            top.line("+ " + num(pwl.time(i)) + " " + num(pwl.value(i)) + (i == pwl.size() - 1 ? " )" : ""));
        }
        top.comment("");
        top.comment("A unit current injected into the load node, in the .ac analysis only (DC 0, no transient "
                + "function): v(load) there is Z(f) in ohms.");
        top.line(top.declare("Iac") + " 0 " + RailNetlist.LOAD + " DC 0 AC 1");
        top.comment("");
        long steps = (long) Math.ceil(tstop / tmax);
        top.comment(String.format(Locale.ROOT, "Time step: the fastest mode of the model has a period of %s s "
                + "(2*pi/|p| over its poles); the largest step is 1/%.0f of it%s: %s s,", num(period),
                STEPS_PER_PERIOD, rail.hasEdgeTime() ? String.format(Locale.ROOT, " and at most 1/%.0f of the "
                        + "edge time %s s", STEPS_PER_EDGE, num(rail.edgeTimeS())) : "", num(tmax)));
        top.comment("so about " + steps + " steps over the pattern's span.");
        top.comment("Integration by the second-order Gear method (SPICE3's METHOD option): on these stiff networks"
                + " (picohenry package paths beside microfarads) the trapezoidal default can stall with 'timestep too"
                + " small' in a quiet stretch; Gear's slight numerical damping is far below the agreement expected"
                + " at this step.");
        top.line(".options method=gear maxord=2");
        top.line(".tran " + num(tmax) + " " + num(tstop) + " 0 " + num(tmax));
        top.comment("AC at the frequencies of impedance.csv (the band widened by a decade each side), " + perDecade
                + " points per decade from its first point; the sweep ends at its last regular point.");
        top.line(".ac dec " + perDecade + " " + num(fFrom) + " " + num(fTo));
        top.comment("Only v(load) is kept; remove this line to keep every node (the output grows with the "
                + "step count).");
        top.line(".save v(" + RailNetlist.LOAD + ")");
        top.line(".end");
        out.addAll(top.lines());
        return out;
    }

    private static String num(double v) {
        return SpiceNetlist.number(v);
    }
}
