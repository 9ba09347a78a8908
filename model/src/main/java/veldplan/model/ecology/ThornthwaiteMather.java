package veldplan.model.ecology;

/**
 * Monthly soil-water bucket after Thornthwaite &amp; Mather [1, 2], with the negative-exponential
 * form of their soil-moisture retention tables [3].
 *
 * <pre>
 *   P − PET &ge; 0 (wetting):  ST = min(STmax, ST' + P − PET);  surplus = the excess over STmax;
 *                            AET = PET
 *   P − PET &lt; 0 (drying):   ST = ST' exp(−(PET − P) / STmax)
 *                            (equivalently ST = STmax exp(−APWL / STmax), with the accumulated
 *                            potential water loss APWL);  AET = P + (ST' − ST);  surplus = 0
 * </pre>
 *
 * <p>ST' is the storage at the start of the month and ST at its end; STmax is the plant-available
 * water capacity, rooting depth × (θ33 − θ1500) from {@link SaxtonRawls}. All water amounts are
 * in mm per month (or per whatever step P and PET are given for). Over any sequence of months the
 * bucket conserves water: ΣP = ΣAET + Σsurplus + (ST_end − ST_start).
 *
 * <p>References:
 * <ol>
 *   <li>Thornthwaite, C.W. &amp; Mather, J.R. (1955). The water balance. Publications in
 *       Climatology 8(1). Drexel Institute of Technology.</li>
 *   <li>Thornthwaite, C.W. &amp; Mather, J.R. (1957). Instructions and tables for computing
 *       potential evapotranspiration and the water balance. Publications in Climatology 10(3).
 *       </li>
 *   <li>Pastor, J. &amp; Post, W.M. (1984). Calculating Thornthwaite's and Mather's AET using an
 *       approximating function. Canadian Journal of Forest Research 14: 466–467 (attribution and
 *       title from memory).</li>
 * </ol>
 */
public final class ThornthwaiteMather {
  private ThornthwaiteMather() {}

  /**
   * Storage after an accumulated potential water loss, ST = STmax exp(−APWL / STmax) [3].
   *
   * @param capacityMm                       plant-available water capacity STmax (mm), &gt; 0
   * @param accumulatedPotentialWaterLossMm  APWL, the running sum of PET − P since the bucket was
   *                                         last full (mm), &ge; 0
   * @return ST (mm), in (0, STmax]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double storageFromAccumulatedLossMm(double capacityMm,
      double accumulatedPotentialWaterLossMm) {
    Arguments.positive(capacityMm, "capacityMm");
    Arguments.nonNegative(accumulatedPotentialWaterLossMm, "accumulatedPotentialWaterLossMm");
    return capacityMm * Math.exp(-accumulatedPotentialWaterLossMm / capacityMm);
  }

  /**
   * Storage at the end of a month [1, 3]: wetting min(STmax, ST' + P − PET) when P &ge; PET,
   * drying ST' exp(−(PET − P)/STmax) when P &lt; PET.
   *
   * @param capacityMm      plant-available water capacity STmax (mm), &gt; 0
   * @param storageMm       storage at the start of the month ST' (mm), in [0, STmax]
   * @param precipitationMm precipitation (or infiltrated water) in the month P (mm), &ge; 0
   * @param petMm           potential evapotranspiration in the month PET (mm), &ge; 0
   * @return storage at the end of the month ST (mm), in [0, STmax]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double storageAfterMonth(double capacityMm, double storageMm,
      double precipitationMm, double petMm) {
    checkBucket(capacityMm, storageMm, precipitationMm, petMm);
    double net = precipitationMm - petMm;
    if (net >= 0) {
      return Math.min(capacityMm, storageMm + net);
    }
    return storageMm * Math.exp(net / capacityMm);
  }

  /**
   * Actual evapotranspiration in a month [1]: PET when P &ge; PET, otherwise P + (ST' − ST).
   *
   * @param storageBeforeMm storage at the start of the month ST' (mm), &ge; 0
   * @param storageAfterMm  storage at the end of the month ST (mm), from
   *                        {@link #storageAfterMonth}, &ge; 0
   * @param precipitationMm precipitation in the month P (mm), &ge; 0
   * @param petMm           potential evapotranspiration in the month PET (mm), &ge; 0
   * @return AET (mm), in [0, PET]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double actualEvapotranspirationMm(double storageBeforeMm, double storageAfterMm,
      double precipitationMm, double petMm) {
    Arguments.nonNegative(storageBeforeMm, "storageBeforeMm");
    Arguments.nonNegative(storageAfterMm, "storageAfterMm");
    Arguments.nonNegative(precipitationMm, "precipitationMm");
    Arguments.nonNegative(petMm, "petMm");
    if (precipitationMm >= petMm) {
      return petMm;
    }
    return precipitationMm + (storageBeforeMm - storageAfterMm);
  }

  /**
   * Water surplus in a month [1]: the part of P − PET that does not fit in the bucket,
   * max(0, ST' + P − PET − STmax) when P &ge; PET, and 0 otherwise. It leaves as runoff or deep
   * drainage.
   *
   * @param capacityMm      plant-available water capacity STmax (mm), &gt; 0
   * @param storageBeforeMm storage at the start of the month ST' (mm), in [0, STmax]
   * @param precipitationMm precipitation in the month P (mm), &ge; 0
   * @param petMm           potential evapotranspiration in the month PET (mm), &ge; 0
   * @return surplus (mm), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double surplusMm(double capacityMm, double storageBeforeMm,
      double precipitationMm, double petMm) {
    checkBucket(capacityMm, storageBeforeMm, precipitationMm, petMm);
    double net = precipitationMm - petMm;
    if (net < 0) {
      return 0;
    }
    return Math.max(0, storageBeforeMm + net - capacityMm);
  }

  private static void checkBucket(double capacityMm, double storageMm, double precipitationMm,
      double petMm) {
    Arguments.positive(capacityMm, "capacityMm");
    Arguments.inClosedRange(storageMm, 0, capacityMm, "storageMm");
    Arguments.nonNegative(precipitationMm, "precipitationMm");
    Arguments.nonNegative(petMm, "petMm");
  }
}
