/**
 * The command line (picocli): commands, help, and the mapping of outcomes to exit codes (0 all positions pass,
 * 1 a position violates the policy, 2 invalid input, 3 no answer the solver can stand behind). Output goes only
 * through the command's {@code getOut()}/{@code getErr()} writers so that tests can capture it. Nothing imports
 * this package.
 */
package org.tjmargin.cli;
