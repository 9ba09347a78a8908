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
  /** [predator * herbivores + herbivore]: 1 if hunted, else 0. Elephants are never prey. */
  final double[] hunts;

  PredatorParameters(String[] names, double[] bodyMassKg, double[] killKgPerYear,
      double[] halfSaturationKgPerKm2, double[] maxGrowthRatePerYear,
      double[] switchingExponent, double[] noiseSd, double[] initialAbundance,
      double[] quasiExtinctionAbundance, double[] hunts) {
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
    this.hunts = hunts.clone();
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
