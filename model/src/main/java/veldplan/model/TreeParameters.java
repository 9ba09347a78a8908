package veldplan.model;

/**
 * Tree sub-model parameters, per height class ({@link TreeClass}). Arrays are copied in and
 * never handed out; processes in this package read them directly.
 *
 * <p>Sources: the class structure and the fire trap follow Higgins et al. (2000) and the height
 * bounds of Asner &amp; Levick (2012) for elephant damage. Basal area per tree comes from stem
 * diameters of 1, 3, 8, 18 and 35 cm and browse production per tree from leaf masses of that
 * order (our calibration, from memory of savanna allometry). Growth and mortality rates are our
 * calibration: residence of about 2.5, 7, 14 and 33 years in the four lower classes under good
 * conditions and no disturbance (height growth of roughly 0.2–0.6 m/yr), mortality falling
 * with size.
 */
public final class TreeParameters {
  final double[] heightM = new double[TreeClass.COUNT];
  final double[] lnHeight = new double[TreeClass.COUNT];
  final double[] basalAreaM2PerTree;
  final double[] browseKgPerTreePerYear;
  final double[] lowBrowseShare;
  final double[] transitionPerYear;
  final double[] mortalityPerYear;
  final double[] elephantBreakageKm2PerElephant;
  final double recruitsPerLargeTreePerYear;
  final double seedRainPerHaPerYear;
  final double maxBasalAreaM2PerHaPerMmAet;
  final double c3TminC;
  final double c3ToptC;
  final double c3TmaxC;
  final double co2ReferencePpm;
  final double co2HalfSaturationPpm;
  final double browsingGrowthLoss;
  final double referenceAetMm;

  /**
   * @param basalAreaM2PerTree stem basal area of one tree per class (m2)
   * @param browseKgPerTreePerYear leaf and shoot production per tree per class (kg DM/yr)
   * @param lowBrowseShare share of each class's leaf below 2 m (low browse); the rest is high
   *     browse, which mainly elephants and the tallest browsers use
   * @param transitionPerYear share of a class growing into the next per year at growth index 1
   *     and no competition; length COUNT - 1
   * @param mortalityPerYear background death per class (fraction/yr)
   * @param elephantBreakageKm2PerElephant u_s in breakage = 1 - exp(-u_s D), D elephants/km2
   *     within reach (km2 per elephant per yr); peaks in 5–9 m (Asner &amp; Levick 2012)
   * @param recruitsPerLargeTreePerYear seedlings established per tree above 5 m per year
   * @param seedRainPerHaPerYear seedlings established per ha per year from outside (trees/ha/yr)
   * @param maxBasalAreaM2PerHaPerMmAet maximum tree basal area per mm of annual actual
   *     evapotranspiration (m2/ha/mm): the water balance caps woody cover, as maximum cover
   *     rises with rainfall in Sankaran et al. (2005, from memory)
   * @param c3TminC base temperature of C3 tree growth (°C)
   * @param c3ToptC optimum temperature of C3 tree growth (°C)
   * @param c3TmaxC ceiling temperature of C3 tree growth (°C)
   * @param co2ReferencePpm CO2 at which growth rates were calibrated (ppm)
   * @param co2HalfSaturationPpm K of the saturating (Michaelis–Menten) CO2 response (ppm)
   * @param browsingGrowthLoss loss of height growth at full browsing pressure (fraction)
   * @param referenceAetMm annual actual evapotranspiration at which the growth index is 1 (mm)
   */
  public TreeParameters(double[] basalAreaM2PerTree, double[] browseKgPerTreePerYear,
      double[] lowBrowseShare, double[] transitionPerYear, double[] mortalityPerYear,
      double[] elephantBreakageKm2PerElephant, double recruitsPerLargeTreePerYear,
      double seedRainPerHaPerYear, double maxBasalAreaM2PerHaPerMmAet, double c3TminC,
      double c3ToptC, double c3TmaxC, double co2ReferencePpm, double co2HalfSaturationPpm,
      double browsingGrowthLoss, double referenceAetMm) {
    this.basalAreaM2PerTree = perClass(basalAreaM2PerTree, "basalAreaM2PerTree");
    this.browseKgPerTreePerYear = perClass(browseKgPerTreePerYear, "browseKgPerTreePerYear");
    this.lowBrowseShare = perClass(lowBrowseShare, "lowBrowseShare");
    if (transitionPerYear.length != TreeClass.COUNT - 1) {
      throw new IllegalArgumentException("transitionPerYear needs " + (TreeClass.COUNT - 1)
          + " values, got " + transitionPerYear.length);
    }
    this.transitionPerYear = transitionPerYear.clone();
    this.mortalityPerYear = perClass(mortalityPerYear, "mortalityPerYear");
    this.elephantBreakageKm2PerElephant =
        perClass(elephantBreakageKm2PerElephant, "elephantBreakageKm2PerElephant");
    this.recruitsPerLargeTreePerYear = recruitsPerLargeTreePerYear;
    this.seedRainPerHaPerYear = seedRainPerHaPerYear;
    this.maxBasalAreaM2PerHaPerMmAet = maxBasalAreaM2PerHaPerMmAet;
    this.c3TminC = c3TminC;
    this.c3ToptC = c3ToptC;
    this.c3TmaxC = c3TmaxC;
    this.co2ReferencePpm = co2ReferencePpm;
    this.co2HalfSaturationPpm = co2HalfSaturationPpm;
    this.browsingGrowthLoss = browsingGrowthLoss;
    this.referenceAetMm = referenceAetMm;
    for (int k = 0; k < TreeClass.COUNT; k++) {
      heightM[k] = TreeClass.of(k).representativeHeightM();
      lnHeight[k] = Math.log(heightM[k]);
    }
  }

  private static double[] perClass(double[] values, String name) {
    if (values.length != TreeClass.COUNT) {
      throw new IllegalArgumentException(name + " needs " + TreeClass.COUNT + " values, got "
          + values.length);
    }
    for (double v : values) {
      if (!(v >= 0) || Double.isInfinite(v)) {
        throw new IllegalArgumentException(name + " must be finite and >= 0: " + v);
      }
    }
    return values.clone();
  }

  /**
   * Default values. C3 cardinal temperatures 5 / 27 / 40 °C: woody savanna plants are C3, with
   * optima below those of C4 grasses (generic C3 0–5 / 20–25 / 35–40 °C in the methods sheet §6,
   * from memory; we take a warmer optimum for tropical trees). CO2: a saturating response with
   * K = 200 ppm around 400 ppm, the concentration of about 2015 (Meinshausen et al. 2020).
   */
  public static TreeParameters defaults() {
    return new TreeParameters(
        new double[] {0.0000785, 0.000707, 0.00503, 0.0254, 0.0962},
        new double[] {0.05, 0.5, 4, 20, 50},
        new double[] {1, 1, 0.3, 0.05, 0},
        new double[] {0.4, 0.15, 0.07, 0.03},
        new double[] {0.12, 0.05, 0.025, 0.012, 0.015},
        new double[] {0, 0.02, 0.1, 0.2, 0.12},
        0.6, 1.0, 0.035, 5, 27, 40, 400, 200, 0.5, 450);
  }

  /** Stem basal area of one tree of class {@code k} (m2). */
  public double basalAreaM2PerTree(int k) {
    return basalAreaM2PerTree[k];
  }
}
