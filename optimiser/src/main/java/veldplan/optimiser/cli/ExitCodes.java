package veldplan.optimiser.cli;

/** Process exit codes of the command line. */
public final class ExitCodes {
  /** Success. */
  public static final int OK = 0;
  /** The model or the tool failed (a bug or an I/O failure); the message says where. */
  public static final int FAILURE = 1;
  /** Bad input: a scenario, policy or command-line problem; nothing was written. */
  public static final int BAD_INPUT = 2;

  private ExitCodes() {}
}
