package veldplan.optimiser.park;

import java.util.ArrayList;
import java.util.List;
import veldplan.shared.scenario.BurnBlock;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.BurnSeason;
import veldplan.shared.scenario.ElephantPlan;
import veldplan.shared.scenario.Levers;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.WaterPlan;

/**
 * The searched levers of a scenario as genes on the unit interval, and their decoding to a
 * feasible policy.
 *
 * <p>Every lever the scenario's {@code optimisation.levers} names gets one gene per block (burn
 * interval, season, target share, water points open, closure year) or one for the park
 * (elephant offtake, contraception coverage, trigger density); every other lever keeps the value
 * of the scenario's policy. A gene {@code u} in [0, 1] decodes as follows:
 * <ul>
 *   <li>a lever with K ordered levels (whole-year burn intervals, then "no planned burning" as
 *       the longest; water points 0..n; closure years, then "never" as the latest; burn
 *       seasons) takes level {@code min(floor(u K), K - 1)} (decision-methods.md §2.9,
 *       deterministic decoding);</li>
 *   <li>a continuous lever is {@code min + u (max - min)}, rounded to the resolution a park can
 *       carry out: 0.01 for shares, 0.001 per year for offtake, 0.01 elephants/km2 for the
 *       trigger. Offtake and contraception with a lower bound of 0 keep the lowest tenth of the
 *       gene for "not at all" ({@link #withOff}).</li>
 * </ul>
 * The decoded policy is canonical: a lever that has no effect (season and target of a block with
 * no planned burning, the closure year of a block with no open point, the trigger when elephants
 * are left alone) takes one fixed value, so policies that act the same are equal and are
 * simulated once.
 */
public final class PolicySpace {
  /** Resolution of shares (target burnt, contraception coverage). */
  static final double SHARE_STEP = 0.01;
  /** Resolution of the offtake rate (fraction per year). */
  static final double OFFTAKE_STEP = 0.001;
  /** Resolution of the trigger density (elephants/km2). */
  static final double TRIGGER_STEP = 0.01;
  /** Share of a rate gene's interval that means "not at all" when the rate's lower bound is 0. */
  static final double OFF_ZONE = 0.1;

  /** What a gene sets. */
  public enum Kind {
    /** Years between planned burns in a block, or none. */
    INTERVAL,
    /** Early- or late-dry-season burning in a block. */
    SEASON,
    /** Share of a block aimed at in a planned burn. */
    TARGET,
    /** Artificial water points kept open in a block. */
    OPEN_POINTS,
    /** Year a block's remaining points close, or never. */
    CLOSURE_YEAR,
    /** Elephant offtake. */
    OFFTAKE,
    /** Contraception coverage. */
    CONTRACEPTION,
    /** Trigger density. */
    TRIGGER
  }

  /** One gene: what it sets and for which block (-1 for the park). */
  public record Gene(Kind kind, int block, String label) {}

  private final Scenario scenario;
  private final Levers levers;
  private final List<String> blockNames = new ArrayList<>();
  private final int[] waterPoints;
  private final List<Gene> genes = new ArrayList<>();
  private final List<BurnSeason> seasons;

  /** The space of a scenario with an {@code optimisation} section. */
  public PolicySpace(Scenario scenario) {
    if (scenario.optimisation() == null) {
      throw new IllegalArgumentException("the scenario has no optimisation section");
    }
    this.scenario = scenario;
    this.levers = scenario.optimisation().levers();
    List<BurnBlock> blocks = scenario.park().blocks();
    waterPoints = new int[blocks.size()];
    seasons = levers.burnSeasons() == null ? List.of()
        : levers.burnSeasons().stream().sorted().toList();
    for (int b = 0; b < blocks.size(); b++) {
      BurnBlock block = blocks.get(b);
      blockNames.add(block.name());
      waterPoints[b] = block.artificialWaterPoints();
      if (levers.fireReturnIntervalYears() != null) {
        genes.add(new Gene(Kind.INTERVAL, b, block.name() + ": fire return interval"));
      }
      if (seasons.size() > 1) {
        genes.add(new Gene(Kind.SEASON, b, block.name() + ": burn season"));
      }
      if (levers.targetFractionBurnt() != null
          && levers.targetFractionBurnt().min() < levers.targetFractionBurnt().max()) {
        genes.add(new Gene(Kind.TARGET, b, block.name() + ": target share burnt"));
      }
      if (Boolean.TRUE.equals(levers.waterPointsOpen()) && waterPoints[b] > 0) {
        genes.add(new Gene(Kind.OPEN_POINTS, b, block.name() + ": water points open"));
      }
      if (levers.waterPointClosureYears() != null && waterPoints[b] > 0) {
        genes.add(new Gene(Kind.CLOSURE_YEAR, b, block.name() + ": water point closure year"));
      }
    }
    if (ranged(levers.elephantOfftakeFractionPerYear() == null ? null
        : new double[] {levers.elephantOfftakeFractionPerYear().min(),
            levers.elephantOfftakeFractionPerYear().max()})) {
      genes.add(new Gene(Kind.OFFTAKE, -1, "elephant offtake"));
    }
    if (ranged(levers.contraceptionCoverage() == null ? null
        : new double[] {levers.contraceptionCoverage().min(),
            levers.contraceptionCoverage().max()})) {
      genes.add(new Gene(Kind.CONTRACEPTION, -1, "contraception coverage"));
    }
    if (ranged(levers.triggerDensityPerKm2() == null ? null
        : new double[] {levers.triggerDensityPerKm2().min(),
            levers.triggerDensityPerKm2().max()})) {
      genes.add(new Gene(Kind.TRIGGER, -1, "trigger density"));
    }
  }

  private static boolean ranged(double[] range) {
    return range != null && range[0] < range[1];
  }

  /** The genes in order. */
  public List<Gene> genes() {
    return List.copyOf(genes);
  }

  /** Number of genes. */
  public int size() {
    return genes.size();
  }

  /** Block names in scenario order. */
  public List<String> blockNames() {
    return List.copyOf(blockNames);
  }

  /**
   * Decodes genes to a canonical, feasible policy named {@code name}.
   *
   * @param u one value in [0, 1] per gene
   */
  public Policy decode(double[] u, String name) {
    if (u.length != genes.size()) {
      throw new IllegalArgumentException("expected " + genes.size() + " genes, got " + u.length);
    }
    Policy base = scenario.policy();
    int blocks = blockNames.size();
    Double[] interval = new Double[blocks];
    BurnSeason[] season = new BurnSeason[blocks];
    double[] target = new double[blocks];
    int[] open = new int[blocks];
    Integer[] closure = new Integer[blocks];
    for (int b = 0; b < blocks; b++) {
      BurnPlan burn = burnPlan(base, blockNames.get(b));
      interval[b] = burn == null ? null : burn.fireReturnIntervalYears();
      season[b] = burn != null ? burn.season()
          : seasons.isEmpty() ? BurnSeason.EARLY_DRY : seasons.get(0);
      target[b] = burn != null ? burn.targetFractionBurnt()
          : levers.targetFractionBurnt() != null ? levers.targetFractionBurnt().min() : 0;
      WaterPlan water = waterPlan(base, blockNames.get(b));
      open[b] = water == null ? waterPoints[b] : Math.min(water.openPoints(), waterPoints[b]);
      closure[b] = water == null ? null : water.closureYear();
      if (seasons.size() == 1) {
        season[b] = seasons.get(0);
      }
      if (levers.targetFractionBurnt() != null
          && !(levers.targetFractionBurnt().min() < levers.targetFractionBurnt().max())) {
        target[b] = levers.targetFractionBurnt().min();
      }
    }
    ElephantPlan elephants = base.elephants();
    double offtake = fixed(levers.elephantOfftakeFractionPerYear() == null ? null
        : levers.elephantOfftakeFractionPerYear().min(), elephants.offtakeFractionPerYear());
    double coverage = fixed(levers.contraceptionCoverage() == null ? null
        : levers.contraceptionCoverage().min(), elephants.contraceptionCoverage());
    Double trigger = levers.triggerDensityPerKm2() == null ? elephants.triggerDensityPerKm2()
        : Double.valueOf(levers.triggerDensityPerKm2().min());

    for (int i = 0; i < u.length; i++) {
      Gene gene = genes.get(i);
      double x = u[i];
      if (!(x >= 0 && x <= 1)) {
        throw new IllegalArgumentException("gene " + i + " not in [0, 1]: " + x);
      }
      int b = gene.block();
      switch (gene.kind()) {
        case INTERVAL: {
          Levers.YearsRange r = levers.fireReturnIntervalYears();
          int k = level(x, r.max() - r.min() + 1 + (allowNone() ? 1 : 0));
          interval[b] = r.min() + k > r.max() ? null : Double.valueOf(r.min() + k);
          break;
        }
        case SEASON:
          season[b] = seasons.get(level(x, seasons.size()));
          break;
        case TARGET:
          target[b] = between(x, levers.targetFractionBurnt().min(),
              levers.targetFractionBurnt().max(), SHARE_STEP);
          break;
        case OPEN_POINTS:
          open[b] = level(x, waterPoints[b] + 1);
          break;
        case CLOSURE_YEAR: {
          Levers.CalendarYearRange r = levers.waterPointClosureYears();
          int k = level(x, r.max() - r.min() + 2);
          closure[b] = r.min() + k > r.max() ? null : Integer.valueOf(r.min() + k);
          break;
        }
        case OFFTAKE:
          offtake = withOff(x, levers.elephantOfftakeFractionPerYear().min(),
              levers.elephantOfftakeFractionPerYear().max(), OFFTAKE_STEP);
          break;
        case CONTRACEPTION:
          coverage = withOff(x, levers.contraceptionCoverage().min(),
              levers.contraceptionCoverage().max(), SHARE_STEP);
          break;
        case TRIGGER:
          trigger = between(x, levers.triggerDensityPerKm2().min(),
              levers.triggerDensityPerKm2().max(), TRIGGER_STEP);
          break;
        default:
          throw new IllegalStateException(gene.kind().toString());
      }
    }

    List<BurnPlan> burning = new ArrayList<>();
    List<WaterPlan> water = new ArrayList<>();
    for (int b = 0; b < blocks; b++) {
      // A block with no planned burning is left out of the list (that is what absent means),
      // so its season and target, which have no effect, cannot tell two policies apart.
      if (interval[b] != null) {
        burning.add(new BurnPlan(blockNames.get(b), interval[b], season[b], target[b]));
      }
      Integer year = open[b] == 0 ? null : closure[b];
      water.add(new WaterPlan(blockNames.get(b), open[b], year));
    }
    if (offtake == 0 && coverage == 0) {
      trigger = null;
    } else if (trigger != null && trigger == 0) {
      trigger = null; // a trigger of 0 elephants/km2 acts every year, as no trigger does
    }
    return new Policy(name, burning, new ElephantPlan(offtake, coverage, trigger), water);
  }

  /**
   * Genes that decode to {@code policy}, or to the nearest policy the levers allow where it
   * lies outside their bounds: each ordered lever at the middle of its level's interval, each
   * continuous lever at its value's position between the bounds. Used to start the search
   * from policies the managers know (the one in use, no intervention).
   */
  public double[] encode(Policy policy) {
    double[] u = new double[genes.size()];
    for (int i = 0; i < u.length; i++) {
      Gene gene = genes.get(i);
      int b = gene.block();
      String block = b >= 0 ? blockNames.get(b) : null;
      BurnPlan burn = b >= 0 ? burnPlan(policy, block) : null;
      WaterPlan water = b >= 0 ? waterPlan(policy, block) : null;
      ElephantPlan e = policy.elephants();
      switch (gene.kind()) {
        case INTERVAL: {
          Levers.YearsRange r = levers.fireReturnIntervalYears();
          int levels = r.max() - r.min() + 1 + (allowNone() ? 1 : 0);
          Double interval = burn == null ? null : burn.fireReturnIntervalYears();
          int k = interval == null ? levels - 1
              : (int) Math.max(0, Math.min(r.max() - r.min(), Math.round(interval) - r.min()));
          u[i] = (k + 0.5) / levels;
          break;
        }
        case SEASON: {
          int k = burn == null ? 0 : Math.max(0, seasons.indexOf(burn.season()));
          u[i] = (k + 0.5) / seasons.size();
          break;
        }
        case TARGET:
          u[i] = position(burn == null ? levers.targetFractionBurnt().min()
              : burn.targetFractionBurnt(), levers.targetFractionBurnt().min(),
              levers.targetFractionBurnt().max());
          break;
        case OPEN_POINTS: {
          int open = water == null ? waterPoints[b] : Math.min(water.openPoints(), waterPoints[b]);
          u[i] = (open + 0.5) / (waterPoints[b] + 1);
          break;
        }
        case CLOSURE_YEAR: {
          Levers.CalendarYearRange r = levers.waterPointClosureYears();
          int levels = r.max() - r.min() + 2;
          Integer year = water == null ? null : water.closureYear();
          int k = year == null ? levels - 1 : Math.max(0, Math.min(r.max() - r.min(),
              year - r.min()));
          u[i] = (k + 0.5) / levels;
          break;
        }
        case OFFTAKE:
          u[i] = ratePosition(e.offtakeFractionPerYear(), levers.elephantOfftakeFractionPerYear()
              .min(), levers.elephantOfftakeFractionPerYear().max());
          break;
        case CONTRACEPTION:
          u[i] = ratePosition(e.contraceptionCoverage(), levers.contraceptionCoverage().min(),
              levers.contraceptionCoverage().max());
          break;
        case TRIGGER:
          u[i] = position(e.triggerDensityPerKm2() == null ? 0 : e.triggerDensityPerKm2(),
              levers.triggerDensityPerKm2().min(), levers.triggerDensityPerKm2().max());
          break;
        default:
          throw new IllegalStateException(gene.kind().toString());
      }
    }
    return u;
  }

  /** The inverse of {@link #withOff}: 0 in the middle of the off zone. */
  private static double ratePosition(double v, double min, double max) {
    if (min > 0) {
      return position(v, min, max);
    }
    if (v <= 0) {
      return OFF_ZONE / 2;
    }
    return OFF_ZONE + (1 - OFF_ZONE) * position(v, 0, max);
  }

  private static double position(double v, double min, double max) {
    return Math.max(0, Math.min(1, (v - min) / (max - min)));
  }

  private boolean allowNone() {
    return Boolean.TRUE.equals(levers.allowNoPlannedBurning());
  }

  private static double fixed(Double searchedMin, double policyValue) {
    return searchedMin == null ? policyValue : searchedMin;
  }

  /** Level {@code min(floor(u K), K - 1)} of K. */
  static int level(double u, int k) {
    return Math.min((int) Math.floor(u * k), k - 1);
  }

  /**
   * A rate that may be switched off: when {@code min} is 0, genes below {@link #OFF_ZONE} give
   * exactly 0 (the action is not taken at all) and the rest of the interval spans (0, max];
   * otherwise {@link #between}. Without the zone "off" would be a single point the search
   * could only approach, and fronts would fill with token actions (0.1 % offtake).
   */
  static double withOff(double u, double min, double max, double step) {
    if (min > 0) {
      return between(u, min, max, step);
    }
    if (u < OFF_ZONE) {
      return 0;
    }
    return Math.max(step, between((u - OFF_ZONE) / (1 - OFF_ZONE), 0, max, step));
  }

  /** {@code min + u (max - min)} rounded to {@code step}, kept inside [min, max]. */
  static double between(double u, double min, double max, double step) {
    double v = Math.rint((min + u * (max - min)) / step) * step;
    // Remove the binary noise of the product (0.07 rather than 0.07000000000000001).
    v = Double.parseDouble(String.format(java.util.Locale.ROOT, "%.6f", v));
    return Math.max(min, Math.min(max, v));
  }

  private static BurnPlan burnPlan(Policy policy, String block) {
    for (BurnPlan p : policy.burning()) {
      if (p.block().equals(block)) {
        return p;
      }
    }
    return null;
  }

  private static WaterPlan waterPlan(Policy policy, String block) {
    for (WaterPlan p : policy.waterPoints()) {
      if (p.block().equals(block)) {
        return p;
      }
    }
    return null;
  }
}
