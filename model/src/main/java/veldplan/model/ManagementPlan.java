package veldplan.model;

import java.util.Arrays;
import java.util.List;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.BurnSeason;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.WaterPlan;

/**
 * A management policy decoded into primitive arrays indexed by block, as the yearly loop reads
 * it. Immutable; shared between threads.
 */
public final class ManagementPlan {
  final String name;
  /** Years between planned burns; 0 = no planned burning. */
  final double[] fireReturnIntervalYears;
  final boolean[] lateDrySeason;
  final double[] targetFractionBurnt;
  final int[] openPoints;
  /** Model year (0-based) in which the block's points close; Integer.MAX_VALUE = never. */
  final int[] closureYear;
  final double offtakeFractionPerYear;
  final double contraceptionCoverage;
  /** Density above which elephant actions apply (elephants/km2); NaN = always. */
  final double triggerDensityPerKm2;

  /**
   * @param name                  label for reports
   * @param fireReturnIntervalYears per block: years between planned burns, 0 = none
   * @param lateDrySeason         per block: late- (true) or early- (false) dry-season burning
   * @param targetFractionBurnt   per block: target share burnt in a planned burn
   * @param openPoints            per block: artificial water points kept open
   * @param closureYear           per block: model year of closure, Integer.MAX_VALUE = never
   * @param offtakeFractionPerYear  elephant offtake (fraction/yr)
   * @param contraceptionCoverage   share of breeding females treated
   * @param triggerDensityPerKm2    density above which elephant actions apply, NaN = always
   */
  public ManagementPlan(String name, double[] fireReturnIntervalYears, boolean[] lateDrySeason,
      double[] targetFractionBurnt, int[] openPoints, int[] closureYear,
      double offtakeFractionPerYear, double contraceptionCoverage, double triggerDensityPerKm2) {
    int blocks = fireReturnIntervalYears.length;
    if (lateDrySeason.length != blocks || targetFractionBurnt.length != blocks
        || openPoints.length != blocks || closureYear.length != blocks) {
      throw new IllegalArgumentException("every per-block array needs " + blocks + " values");
    }
    for (int b = 0; b < blocks; b++) {
      if (!(fireReturnIntervalYears[b] == 0 || fireReturnIntervalYears[b] >= 1)) {
        throw new IllegalArgumentException("fire return interval must be 0 (none) or >= 1 year: "
            + fireReturnIntervalYears[b]);
      }
      if (!(targetFractionBurnt[b] >= 0 && targetFractionBurnt[b] <= 1)) {
        throw new IllegalArgumentException("target fraction burnt not in [0, 1]: "
            + targetFractionBurnt[b]);
      }
      if (openPoints[b] < 0) {
        throw new IllegalArgumentException("open water points < 0: " + openPoints[b]);
      }
    }
    if (!(offtakeFractionPerYear >= 0 && offtakeFractionPerYear <= 1)) {
      throw new IllegalArgumentException("offtake not in [0, 1]: " + offtakeFractionPerYear);
    }
    if (!(contraceptionCoverage >= 0 && contraceptionCoverage <= 1)) {
      throw new IllegalArgumentException("coverage not in [0, 1]: " + contraceptionCoverage);
    }
    this.name = name;
    this.fireReturnIntervalYears = fireReturnIntervalYears.clone();
    this.lateDrySeason = lateDrySeason.clone();
    this.targetFractionBurnt = targetFractionBurnt.clone();
    this.openPoints = openPoints.clone();
    this.closureYear = closureYear.clone();
    this.offtakeFractionPerYear = offtakeFractionPerYear;
    this.contraceptionCoverage = contraceptionCoverage;
    this.triggerDensityPerKm2 = triggerDensityPerKm2;
  }

  /**
   * Decodes a scenario policy. Blocks the policy does not mention get no planned burning and keep
   * all their water points open.
   *
   * @param policy      the policy as read from a file (already validated)
   * @param blockNames  block names in model order
   * @param waterPoints artificial water points per block at the start
   * @param startYear   first simulated calendar year
   */
  public static ManagementPlan fromPolicy(Policy policy, List<String> blockNames,
      int[] waterPoints, int startYear) {
    int blocks = blockNames.size();
    double[] interval = new double[blocks];
    boolean[] late = new boolean[blocks];
    double[] target = new double[blocks];
    int[] open = waterPoints.clone();
    int[] closure = new int[blocks];
    Arrays.fill(closure, Integer.MAX_VALUE);
    for (BurnPlan burn : policy.burning()) {
      int b = indexOf(blockNames, burn.block());
      interval[b] = burn.fireReturnIntervalYears() == null ? 0 : burn.fireReturnIntervalYears();
      late[b] = burn.season() == BurnSeason.LATE_DRY;
      target[b] = burn.targetFractionBurnt();
    }
    for (WaterPlan water : policy.waterPoints()) {
      int b = indexOf(blockNames, water.block());
      open[b] = Math.min(water.openPoints(), waterPoints[b]);
      if (water.closureYear() != null) {
        closure[b] = Math.max(0, water.closureYear() - startYear);
      }
    }
    Double trigger = policy.elephants().triggerDensityPerKm2();
    return new ManagementPlan(policy.name(), interval, late, target, open, closure,
        policy.elephants().offtakeFractionPerYear(), policy.elephants().contraceptionCoverage(),
        trigger == null ? Double.NaN : trigger);
  }

  private static int indexOf(List<String> names, String name) {
    int b = names.indexOf(name);
    if (b < 0) {
      throw new IllegalArgumentException("policy names an unknown block: " + name);
    }
    return b;
  }

  /**
   * True when block {@code block} has a planned burn in model year {@code year}: burns fall every
   * {@code interval} years (non-integer intervals alternate), staggered by block so that blocks
   * with the same interval do not all burn in the same year.
   */
  boolean burnsIn(int block, int year) {
    double interval = fireReturnIntervalYears[block];
    if (interval == 0) {
      return false;
    }
    int shifted = year + 1 + block;
    return Math.floor(shifted / interval) > Math.floor((shifted - 1) / interval);
  }

  /** Water points open in {@code block} during model year {@code year}. */
  int openPointsIn(int block, int year) {
    return year >= closureYear[block] ? 0 : openPoints[block];
  }

  /** The plan's label. */
  public String name() {
    return name;
  }

  /** Number of blocks. */
  public int blocks() {
    return fireReturnIntervalYears.length;
  }
}
