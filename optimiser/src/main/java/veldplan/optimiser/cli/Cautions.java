package veldplan.optimiser.cli;

/** The cautions every command prints and every report carries. */
public final class Cautions {
  /** Plain-text cautions, one paragraph per line. */
  public static final String TEXT = String.join(System.lineSeparator(),
      "CAUTION: veldplan is decision support. Its outputs depend on the model and on the inputs;",
      "they are not predictions and not instructions. Prescribed burning, culling, darting and",
      "the closure of water points can hurt people and animals: they follow local regulations",
      "and permits and are carried out by licensed, trained practitioners. Any policy taken up",
      "needs monitoring and review against what happens on the ground.");

  private Cautions() {}
}
