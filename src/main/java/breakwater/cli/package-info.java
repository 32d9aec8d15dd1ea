/**
 * The {@code breakwater} command: one picocli command class per mode (solve, check, trim,
 * compare, frontier), the options they share, Ctrl-C handling, and the exit codes. It reads the inputs,
 * runs the mode and hands what it found to {@code report}.
 *
 * <p>May use every other package; the only package that imports picocli.
 *
 * <p>Read: {@code docs/file-contracts.md} (outputs, exit codes), {@code docs/architecture.md}.
 */
package breakwater.cli;
