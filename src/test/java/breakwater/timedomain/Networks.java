package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Invented test networks (no real parts): realistic orders of magnitude for a 1 V class core rail. */
final class Networks {

    private Networks() {
    }

    /** A bank part: capacitance, ESR, ESL + mounting inductance, count. */
    static SeriesBranch part(String label, double c, double esr, double esl, double mount, int n) {
        return new SeriesBranch(label, esr, esl + mount, c).parallel(n);
    }

    /** The eight bank part types used across tests and benchmarks. */
    static List<SeriesBranch> eightPartBank() {
        return List.of(
                part("polymer-100u", 100e-6, 10e-3, 1.0e-9, 0.8e-9, 2),
                part("mlcc-22u", 22e-6, 3e-3, 0.8e-9, 0.6e-9, 3),
                part("mlcc-10u", 10e-6, 4e-3, 0.5e-9, 0.5e-9, 6),
                part("mlcc-4u7", 4.7e-6, 6e-3, 0.4e-9, 0.45e-9, 8),
                part("mlcc-1u", 1e-6, 10e-3, 0.3e-9, 0.4e-9, 20),
                part("mlcc-220n", 220e-9, 15e-3, 0.3e-9, 0.4e-9, 10),
                part("mlcc-10n", 10e-9, 40e-3, 0.2e-9, 0.3e-9, 6),
                part("mlcc-1n", 1e-9, 80e-3, 0.2e-9, 0.3e-9, 4));
    }

    /** Regulator 0.3 mΩ + 18 nH, plane 6 nF/0.5 mΩ, eight part types, package 0.4 mΩ/25 pH, die 150 nF/0.3 mΩ. */
    static PowerNetwork realistic() {
        List<SeriesBranch> board = new ArrayList<>();
        board.add(new SeriesBranch("plane", 0.5e-3, 0, 6e-9));
        board.addAll(eightPartBank());
        return new PowerNetwork(0.3e-3, 18e-9, board, true, 0.4e-3, 25e-12,
                List.of(new SeriesBranch("die", 0.3e-3, 0, 150e-9)));
    }

    /** A smaller network with plane and die whose modes span about three decades (for ODE references). */
    static PowerNetwork moderate() {
        List<SeriesBranch> board = List.of(
                new SeriesBranch("plane", 2e-3, 0, 5e-9),
                part("mlcc-10u", 10e-6, 5e-3, 0.6e-9, 0.5e-9, 2),
                part("mlcc-1u", 1e-6, 12e-3, 0.3e-9, 0.4e-9, 4),
                part("mlcc-100n", 100e-9, 20e-3, 0.3e-9, 0.4e-9, 4));
        return new PowerNetwork(2e-3, 3e-9, board, true, 1e-3, 40e-12,
                List.of(new SeriesBranch("die", 1e-3, 0, 50e-9)));
    }

    static double logUniform(Random r, double lo, double hi) {
        return lo * Math.pow(hi / lo, r.nextDouble());
    }

    /** A random network: regulator, optional plane, 1..8 bank parts, optional package with die. */
    static PowerNetwork random(Random r) {
        List<SeriesBranch> board = new ArrayList<>();
        if (r.nextBoolean()) {
            board.add(new SeriesBranch("plane", logUniform(r, 0.1e-3, 2e-3), 0, logUniform(r, 1e-9, 20e-9)));
        }
        int parts = 1 + r.nextInt(8);
        for (int k = 0; k < parts; k++) {
            double c = logUniform(r, 1e-9, 100e-6);
            board.add(part("p" + k, c, logUniform(r, 2e-3, 60e-3), logUniform(r, 0.15e-9, 1e-9),
                    logUniform(r, 0.2e-9, 0.8e-9), 1 + r.nextInt(20)));
        }
        double rReg = logUniform(r, 0.1e-3, 3e-3);
        double lReg = logUniform(r, 1e-9, 30e-9);
        if (r.nextBoolean()) {
            return new PowerNetwork(rReg, lReg, board, true, logUniform(r, 0.1e-3, 1e-3),
                    logUniform(r, 5e-12, 100e-12),
                    List.of(new SeriesBranch("die", logUniform(r, 0.1e-3, 2e-3), 0, logUniform(r, 10e-9, 300e-9))));
        }
        return new PowerNetwork(rReg, lReg, board, false, 0, 0, List.of());
    }
}
