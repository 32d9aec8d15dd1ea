package breakwater;

import breakwater.scenario.Band;
import breakwater.scenario.Board;
import breakwater.scenario.CostModel;
import breakwater.scenario.Die;
import breakwater.scenario.PackagePath;
import breakwater.scenario.Plane;
import breakwater.scenario.Rail;
import breakwater.scenario.Regulator;
import breakwater.scenario.Scenario;
import breakwater.scenario.SolverSettings;

import java.nio.file.Path;
import java.util.Map;

/** Scenarios built in code for tests, with every field explicit. Values are invented. */
public final class Fixtures {
    private Fixtures() {
    }

    /** A mutable builder over {@link Scenario}'s record components. */
    public static final class ScenarioBuilder {
        public Rail rail = new Rail("test rail", 1.0, 0.05, 4.0, 2.0, 0.0);
        public Band band = new Band(1e4, 1e8);
        public Regulator regulator = new Regulator(0.5e-3, 15e-9);
        public Plane plane = Plane.NONE;
        public PackagePath packagePath = PackagePath.NONE;
        public Die die = new Die(100e-9, 1e-3);
        public Board board = Board.UNLIMITED;
        public CostModel cost = new CostModel(0.004, 0.1, "EUR");
        public boolean requireTarget = false;
        public java.util.List<breakwater.scenario.Region> regions = java.util.List.of();

        public ScenarioBuilder regions(java.util.List<breakwater.scenario.Region> r) {
            regions = r;
            return this;
        }

        public ScenarioBuilder rail(Rail r) {
            rail = r;
            return this;
        }

        public ScenarioBuilder board(Board b) {
            board = b;
            return this;
        }

        public ScenarioBuilder die(Die d) {
            die = d;
            return this;
        }

        public ScenarioBuilder plane(Plane p) {
            plane = p;
            return this;
        }

        public ScenarioBuilder packagePath(PackagePath p) {
            packagePath = p;
            return this;
        }

        public ScenarioBuilder regulator(Regulator r) {
            regulator = r;
            return this;
        }

        public ScenarioBuilder band(Band b) {
            band = b;
            return this;
        }

        public ScenarioBuilder requireTarget(boolean b) {
            requireTarget = b;
            return this;
        }

        public Scenario build() {
            return new Scenario("test.toml", rail, band, regulator, plane, packagePath, die, Path.of("catalog.csv"),
                    board, Map.of(), cost, SolverSettings.DEFAULT, requireTarget, "", 0.0, regions);
        }
    }

    public static ScenarioBuilder scenario() {
        return new ScenarioBuilder();
    }
}
