package veldplan.optimiser.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code veldplan} command line. */
@Command(name = "veldplan", mixinStandardHelpOptions = true,
    versionProvider = Main.Version.class,
    description = "Simulates savanna parks under management policies and climate paths, and"
        + " searches the policies that trade guild persistence, trees and cost.",
    subcommands = {SimulateCommand.class, OptimiseCommand.class, CommandLine.HelpCommand.class})
public final class Main implements Runnable {
  @CommandLine.Spec
  CommandLine.Model.CommandSpec spec;

  /** Entry point. */
  public static void main(String[] args) {
    // Charts are drawn off screen; no display is needed.
    System.setProperty("java.awt.headless", "true");
    if (ModuleLayer.boot().findModule(VECTOR_MODULE).isEmpty()) {
      System.err.println("error: veldplan needs the JDK's " + VECTOR_MODULE + " module (its"
          + " simulator runs several replicates at once with vector instructions). Run it with"
          + " ./veldplan, which adds it, or with java --add-modules " + VECTOR_MODULE
          + " -jar ...");
      System.exit(ExitCodes.FAILURE);
    }
    System.exit(execute(args));
  }

  /** The JDK 17 incubator module of the Vector API, which the simulator uses. */
  static final String VECTOR_MODULE = "jdk.incubator.vector";

  /** Runs the command line and returns the exit code (for tests). */
  public static int execute(String... args) {
    CommandLine cli = new CommandLine(new Main());
    cli.setParameterExceptionHandler((ex, a) -> {
      ex.getCommandLine().getErr().println("error: " + ex.getMessage());
      ex.getCommandLine().getErr().println("Run '"
          + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help' for the options.");
      return ExitCodes.BAD_INPUT;
    });
    return cli.execute(args);
  }

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /** Tool version from the jar manifest. */
  public static String version() {
    String v = Main.class.getPackage().getImplementationVersion();
    return v == null ? "dev" : v;
  }

  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
      return new String[] {"veldplan " + version()};
    }
  }
}
