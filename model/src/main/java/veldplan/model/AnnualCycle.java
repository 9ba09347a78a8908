package veldplan.model;

/**
 * One model year. Processes run in this fixed order; each sees the state the one before left.
 *
 * <h2>Order of processes</h2>
 * <ol>
 *   <li>{@link Management#startOfYear}: water points open this year, herbivores' reach.</li>
 *   <li>{@link Grass#grow}: the wet season's grass from the water balance (already computed in
 *       {@link Forcing}), suppressed by trees; standing fuel.</li>
 *   <li>{@link Herbivory#forageAndGraze}: browse, forage within reach, competition, and what is
 *       eaten, which lowers the fuel.</li>
 *   <li>{@link Fire#burn}: planned burns and unplanned fires in the dry season on what is left.</li>
 *   <li>{@link Trees#update}: death, topkill, elephant breakage, growth, recruitment.</li>
 *   <li>{@link Animals#hunt} and {@link Animals#breedAndDie}: predation, then births and deaths
 *       of guilds, elephants and predators.</li>
 *   <li>{@link Management#endOfYear}: elephant offtake and contraception; the year's costs.</li>
 * </ol>
 *
 * <h2>Why this order</h2>
 * Southern African savanna years run from the wet season into the dry season: grass grows with
 * the rains, herbivores eat through the dry season, and most fire comes late in the dry season on
 * the cured grass that herbivores left (Govender et al. 2006; Archibald et al. 2009). Trees respond
 * to the year's fire and browsing; animal numbers to the year's forage. Management acts between
 * years, as culls and darting operations are planned on the year's census.
 *
 * <h2>Stochasticity</h2>
 * Weather (in {@link Forcing}), fire and demography draw from separate counter-based streams
 * derived from the replicate seed, so every policy meets the same random numbers.
 */
final class AnnualCycle {
  /** Names of the processes in the order they run; {@link #step} runs one by index. */
  static final String[] PROCESSES = {
      "Management.startOfYear", "Grass.grow", "Herbivory.forageAndGraze", "Fire.burn",
      "Trees.update", "Animals.hunt", "Animals.breedAndDie", "Management.endOfYear"};

  private AnnualCycle() {}

  static void advance(ModelParameters p, ManagementPlan plan, Forcing f, int year,
      EcosystemState s) {
    s.year = year;
    for (int process = 0; process < PROCESSES.length; process++) {
      step(process, p, plan, f, year, s);
    }
    assert s.violation() == null : s.violation() + " after year " + year;
  }

  /** Runs process number {@code process} of the year (tests check invariants between steps). */
  static void step(int process, ModelParameters p, ManagementPlan plan, Forcing f, int year,
      EcosystemState s) {
    switch (process) {
      case 0 -> Management.startOfYear(p, plan, year, s);
      case 1 -> Grass.grow(p.grass(), p.trees(), f, year, s);
      case 2 -> Herbivory.forageAndGraze(p, s);
      case 3 -> Fire.burn(p, plan, f, year, s);
      case 4 -> Trees.update(p, f, year, s);
      case 5 -> Animals.hunt(p, s);
      case 6 -> Animals.breedAndDie(p, f, year, s);
      case 7 -> Management.endOfYear(p, plan, year, s);
      default -> throw new IllegalArgumentException("no process " + process);
    }
  }
}
