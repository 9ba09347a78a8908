package veldplan.optimiser.search;

/**
 * Called by {@link Nsga2} on the search thread after every generation, generation 0 included.
 * A listener that throws aborts the run (the state it was given stays a valid checkpoint).
 */
@FunctionalInterface
public interface SearchListener {
  /** A listener that does nothing. */
  SearchListener NONE = (report, state) -> { };

  /**
   * One generation is complete.
   *
   * @param report progress figures
   * @param state  a checkpoint from which {@link Nsga2#resume} continues exactly
   */
  void generationDone(GenerationReport report, SearchState state);
}
