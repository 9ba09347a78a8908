package veldplan.model;

import veldplan.model.ecology.Topkill;

/**
 * Size-structured trees: background death, fire topkill, elephant breakage, growth into the next
 * height class, and recruitment.
 *
 * <h2>Order within the year</h2>
 * Background death, then fire (topkill by height and intensity with the logistic form of Higgins
 * et al. 2007; most topkilled stems resprout into the fire trap, a few die), then elephants
 * (breakage concentrated in 5–9 m trees, Asner &amp; Levick 2012; broken trees coppice into the
 * 0.5–2 m class), then growth of the survivors, then recruitment.
 *
 * <h2>Growth</h2>
 * The share of a class growing into the next is its calibrated rate times the year's growth index
 * (C3 temperature and CO2 responses of transpiration, from the water balance) times
 * tree-on-tree competition, 1 - BA / BAmax, where the maximum basal area is set by the water
 * balance (annual actual evapotranspiration). Browsing slows growth of the classes browsers reach.
 * Above the maximum, extra mortality thins the stand.
 *
 * <h2>Recruitment</h2>
 * Seedlings from trees above 5 m plus seed rain, damped by competition.
 */
final class Trees {
  /** Cap on the share of a class that can move up in a year. */
  private static final double MAX_TRANSITION = 0.9;
  /** Extra mortality per unit of basal area above the water-set maximum (fraction/yr). */
  private static final double SELF_THINNING = 0.1;

  private Trees() {}

  static void update(ModelParameters p, Forcing f, int year, EcosystemState s) {
    TreeParameters t = p.trees();
    FireParameters fp = p.fire();
    int blocks = s.blocks;
    int e = p.herbivores().elephant;
    double[] next = s.nextClasses;
    double[] heightFactor = s.topkillHeightFactor;
    for (int b = 0; b < blocks; b++) {
      int at = year * blocks + b;
      int base = b * TreeClass.COUNT;
      double maxBasalArea = t.maxBasalAreaM2PerHaPerMmAet * f.aetMm[at];
      double basalArea = s.basalAreaM2PerHa[b];
      double ratio = maxBasalArea > 0 ? basalArea / maxBasalArea : 2;
      double competition = Math.max(0, 1 - ratio);
      double thinning = ratio > 1 ? Math.min(0.5, SELF_THINNING * (ratio - 1)) : 0;
      double growth = f.treeGrowthIndex[at] * competition;
      double planned = s.plannedBurntFraction[b];
      double wild = s.wildBurntFraction[b];
      double reach = s.reach[e * blocks + b];
      double elephantsInReach = reach > 0 ? s.elephantsPerKm2[b] / reach : 0;
      double browse = s.browsePressure[b];
      // Topkill in the factored form (see Topkill.probabilityOfFactors): one exponential per
      // fire here, the height factors once per run (EcosystemState.reset).
      double plannedFactor = planned > 0 ? Topkill.intensityFactor(
          Math.sqrt(s.plannedIntensityKwPerM[b]), fp.topkillSqrtIntensity()) : 0;
      double wildFactor = wild > 0 ? Topkill.intensityFactor(
          Math.sqrt(s.wildIntensityKwPerM[b]), fp.topkillSqrtIntensity()) : 0;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        next[k] = 0;
      }
      for (int k = 0; k < TreeClass.COUNT; k++) {
        double n = s.treesPerHa[base + k] * (1 - Math.min(1, t.mortalityPerYear[k] + thinning));
        double topkill = 0;
        if (planned > 0) {
          topkill += planned * Topkill.probabilityOfFactors(heightFactor[k], plannedFactor);
        }
        if (wild > 0) {
          topkill += wild * Topkill.probabilityOfFactors(heightFactor[k], wildFactor);
        }
        double topkilled = n * topkill;
        n -= topkilled;
        double broken = 0;
        // (A class elephants do not break, rate 0, would lose n x reach x 0 = 0: skipped.)
        if (elephantsInReach > 0 && t.elephantBreakageKm2PerElephant[k] > 0) {
          broken = n * reach
              * (1 - Math.exp(-t.elephantBreakageKm2PerElephant[k] * elephantsInReach));
          n -= broken;
        }
        double resprouts = topkilled * (1 - fp.topkillDeathFraction()) + broken;
        int resproutClass = Math.min(k, TreeClass.FIRE_TRAP_0_5_TO_2M.ordinal());
        next[resproutClass] += resprouts;
        if (k < TreeClass.COUNT - 1) {
          double browsed = t.browsingGrowthLoss * browse * t.lowBrowseShare[k];
          double moving = n * Math.min(MAX_TRANSITION,
              t.transitionPerYear[k] * growth * (1 - browsed));
          next[k] += n - moving;
          next[k + 1] += moving;
        } else {
          next[k] += n;
        }
      }
      double large = 0;
      for (int k = TreeClass.FIRST_LARGE; k < TreeClass.COUNT; k++) {
        large += s.treesPerHa[base + k];
      }
      next[0] += (t.recruitsPerLargeTreePerYear * large + t.seedRainPerHaPerYear)
          * competition * Math.min(1, f.treeGrowthIndex[at]);
      System.arraycopy(next, 0, s.treesPerHa, base, TreeClass.COUNT);
    }
  }
}
