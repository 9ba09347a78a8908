package veldplan.model;

/**
 * Predator guild parameters, arrays indexed by predator.
 */
public final class PredatorParameters {
  final int count;
  final String[] names;
  final double[] bodyMassKg;
  /** Live prey killed per predator per year at saturation (kg/yr). */
  final double[] killKgPerYear;
  /** Prey biomass density at which kills are half the saturated rate (kg/km2). */
  final double[] halfSaturationKgPerKm2;
  final double[] maxGrowthRatePerYear;
  final double[] switchingExponent;
  final double[] noiseSd;
  final double[] initialAbundance;
  final double[] quasiExtinctionAbundance;
  /** [predator][herbivore]: 1 if hunted, else 0 (the preference c of prey switching). */
  final double[][] preference;
  /** Holling handling time: 1 / maximum kill (yr per kg of prey). */
  final double[] handlingTimeYears;
  /** Holling attack rate that halves kills at the half-saturation density. */
  final double[] attackRate;
  /** Holling type of the functional response, 2 or 3. */
  final int[] responseType;
  /** Area over which prey biomass density is taken (km2): the park. */
  final double parkKm2;

  PredatorParameters(String[] names, double[] bodyMassKg, double[] killKgPerYear,
      double[] halfSaturationKgPerKm2, double[] maxGrowthRatePerYear,
      double[] switchingExponent, double[] noiseSd, double[] initialAbundance,
      double[] quasiExtinctionAbundance, double[] hunts, int[] responseType, double parkKm2) {
    this.count = names.length;
    this.names = names.clone();
    this.bodyMassKg = bodyMassKg.clone();
    this.killKgPerYear = killKgPerYear.clone();
    this.halfSaturationKgPerKm2 = halfSaturationKgPerKm2.clone();
    this.maxGrowthRatePerYear = maxGrowthRatePerYear.clone();
    this.switchingExponent = switchingExponent.clone();
    this.noiseSd = noiseSd.clone();
    this.initialAbundance = initialAbundance.clone();
    this.quasiExtinctionAbundance = quasiExtinctionAbundance.clone();
    int herbivores = count == 0 ? 0 : hunts.length / count;
    this.preference = new double[count][herbivores];
    for (int q = 0; q < count; q++) {
      System.arraycopy(hunts, q * herbivores, preference[q], 0, herbivores);
    }
    this.responseType = responseType.clone();
    this.parkKm2 = parkKm2;
    this.handlingTimeYears = new double[count];
    this.attackRate = new double[count];
    for (int q = 0; q < count; q++) {
      if (responseType[q] != 2 && responseType[q] != 3) {
        throw new IllegalArgumentException("functional response type must be 2 or 3: "
            + responseType[q]);
      }
      // Type II: a D / (1 + a h D) is half of 1/h at D = 1 / (a h); type III: at D^2 = 1 / (a h).
      handlingTimeYears[q] = 1 / killKgPerYear[q];
      double half = halfSaturationKgPerKm2[q];
      attackRate[q] = 1 / (handlingTimeYears[q] * (responseType[q] == 3 ? half * half : half));
    }
  }

  /** Number of predator guilds. */
  public int count() {
    return count;
  }

  /** Name of predator {@code p}. */
  public String name(int p) {
    return names[p];
  }

  /** Quasi-extinction threshold of predator {@code p} (head). */
  public double quasiExtinctionAbundance(int p) {
    return quasiExtinctionAbundance[p];
  }

  /** Maximum rate of increase of predator {@code p} (1/yr). */
  public double maxGrowthRatePerYear(int p) {
    return maxGrowthRatePerYear[p];
  }
}
