/**
 * A rail scenario as read from its TOML file: the rail's spec, the band, regulator, plane,
 * package, die, board limits, footprints, costs, solver defaults and the existing bank, each a validated
 * record, and {@link breakwater.scenario.ScenarioReader}, which reports every problem of the file at its
 * line and column.
 *
 * <p>May use {@code units} and {@code diagnostic}; Jackson (its TOML reader) is used here.
 *
 * <p>Read: {@code docs/file-contracts.md} (scenario), {@code docs/network-model.md} (what the sections mean
 * in the circuit).
 */
package breakwater.scenario;
