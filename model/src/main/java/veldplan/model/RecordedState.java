package veldplan.model;

/**
 * The arrays of a state that a {@link Trajectory} records, and how the entries of one run are
 * spaced in them: entry i of lane r at {@code i * stride + r}. An {@link EcosystemState} holds
 * one run (stride 1, lane 0); a {@link LaneState} holds {@link LaneState#LANES} (stride LANES).
 */
final class RecordedState {
  final int stride;
  final double[] grassProductionKgPerHa;
  final double[] fuelKgPerHa;
  final double[] plannedBurntFraction;
  final double[] wildBurntFraction;
  final double[] plannedIntensityKwPerM;
  final double[] wildIntensityKwPerM;
  final double[] basalAreaM2PerHa;
  final double[] treesPerHa;
  final double[] browsePressure;
  final double[] elephantsPerKm2;
  final double[] abundance;
  final double[] predatorAbundance;

  RecordedState(int stride, double[] grassProductionKgPerHa, double[] fuelKgPerHa,
      double[] plannedBurntFraction, double[] wildBurntFraction,
      double[] plannedIntensityKwPerM, double[] wildIntensityKwPerM, double[] basalAreaM2PerHa,
      double[] treesPerHa, double[] browsePressure, double[] elephantsPerKm2,
      double[] abundance, double[] predatorAbundance) {
    this.stride = stride;
    this.grassProductionKgPerHa = grassProductionKgPerHa;
    this.fuelKgPerHa = fuelKgPerHa;
    this.plannedBurntFraction = plannedBurntFraction;
    this.wildBurntFraction = wildBurntFraction;
    this.plannedIntensityKwPerM = plannedIntensityKwPerM;
    this.wildIntensityKwPerM = wildIntensityKwPerM;
    this.basalAreaM2PerHa = basalAreaM2PerHa;
    this.treesPerHa = treesPerHa;
    this.browsePressure = browsePressure;
    this.elephantsPerKm2 = elephantsPerKm2;
    this.abundance = abundance;
    this.predatorAbundance = predatorAbundance;
  }
}
