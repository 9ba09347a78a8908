package veldplan.optimiser.cli;

import java.io.PrintWriter;
import java.util.List;

/** How every command reports bad options: all of them at once, then exit status 2. */
final class CommandLineProblems {
  private CommandLineProblems() {}

  /** Prints the problems to {@code err} and returns {@link ExitCodes#BAD_INPUT}. */
  static int report(PrintWriter err, List<String> problems) {
    err.println("error: " + problems.size() + " problem(s) on the command line");
    problems.forEach(p -> err.println("  " + p));
    err.flush();
    return ExitCodes.BAD_INPUT;
  }

  /** Adds a problem if an option's whole number lies outside [min, max]. */
  static void range(List<String> problems, String option, Integer value, int min, int max) {
    if (value != null && (value < min || value > max)) {
      problems.add(option + ": " + value + " (expected " + min + " <= N <= " + max + ")");
    }
  }
}
