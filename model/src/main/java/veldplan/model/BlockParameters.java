package veldplan.model;

/**
 * Per-block constants, arrays indexed by block. Built once from the scenario.
 */
public final class BlockParameters {
  final int count;
  final String[] names;
  final double[] areaHa;
  final double[] areaKm2;
  /** Plant-available water capacity of the root zone (mm): AW (Saxton &amp; Rawls 2006) x depth. */
  final double[] bucketCapacityMm;
  /**
   * Water the surface layer loses to evaporation after a storm before roots take it (mm):
   * ParametersFromScenario.READILY_EVAPORABLE_SHARE x TEW of FAO-56 Eq. 73.
   */
  final double[] evaporableWaterMm;
  final double[] altitudeM;
  final double[] latitudeDeg;
  final double[] rainfallMultiplier;
  final int[] artificialWaterPoints;
  final double[] perennialRiverKm;
  final double[] initialGrassKgPerHa;
  /** [block * TreeClass.COUNT + k] */
  final double[] initialTreesPerHa;

  BlockParameters(String[] names, double[] areaHa, double[] bucketCapacityMm,
      double[] evaporableWaterMm, double[] altitudeM, double[] latitudeDeg,
      double[] rainfallMultiplier, int[] artificialWaterPoints, double[] perennialRiverKm,
      double[] initialGrassKgPerHa, double[] initialTreesPerHa) {
    this.count = names.length;
    this.names = names.clone();
    this.areaHa = areaHa.clone();
    this.areaKm2 = new double[count];
    for (int b = 0; b < count; b++) {
      areaKm2[b] = areaHa[b] / 100.0;
    }
    this.bucketCapacityMm = bucketCapacityMm.clone();
    this.evaporableWaterMm = evaporableWaterMm.clone();
    this.altitudeM = altitudeM.clone();
    this.latitudeDeg = latitudeDeg.clone();
    this.rainfallMultiplier = rainfallMultiplier.clone();
    this.artificialWaterPoints = artificialWaterPoints.clone();
    this.perennialRiverKm = perennialRiverKm.clone();
    this.initialGrassKgPerHa = initialGrassKgPerHa.clone();
    this.initialTreesPerHa = initialTreesPerHa.clone();
  }

  /** Number of blocks. */
  public int count() {
    return count;
  }

  /** Name of block {@code b}. */
  public String name(int b) {
    return names[b];
  }

  /** Area of block {@code b} (ha). */
  public double areaHa(int b) {
    return areaHa[b];
  }

  /** Plant-available water capacity of block {@code b} (mm). */
  public double bucketCapacityMm(int b) {
    return bucketCapacityMm[b];
  }

  /** Total park area (km2). */
  public double totalAreaKm2() {
    double sum = 0;
    for (double a : areaKm2) {
      sum += a;
    }
    return sum;
  }
}
