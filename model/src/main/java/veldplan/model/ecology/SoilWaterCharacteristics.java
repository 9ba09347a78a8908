package veldplan.model.ecology;

/**
 * Soil water characteristics of one soil, as estimated by {@link SaxtonRawls#of}. Volumetric water
 * contents are in m³ of water per m³ of soil. The constructor throws
 * {@link IllegalArgumentException} unless 0 &lt; θ1500 &lt; θ33 &lt; θS &lt; 1 and the other values
 * are positive and finite.
 *
 * @param wiltingPoint                   water content at 1500 kPa, θ1500 (m³/m³), in (0, 1)
 * @param fieldCapacity                  water content at 33 kPa, θ33 (m³/m³), above the wilting
 *                                       point
 * @param saturation                     saturated water content θS (m³/m³), above field capacity
 *                                       and below 1
 * @param availableWater                 plant-available water θ33 − θ1500 (m³/m³), &gt; 0; × 1000
 *                                       gives mm of water per metre of rooting depth
 * @param saturatedConductivityMmPerHour saturated hydraulic conductivity Ks (mm/h), &gt; 0
 * @param bulkDensityGPerCm3             normal (unadjusted) bulk density ρN (g/cm³), &gt; 0
 */
public record SoilWaterCharacteristics(double wiltingPoint, double fieldCapacity,
    double saturation, double availableWater, double saturatedConductivityMmPerHour,
    double bulkDensityGPerCm3) {

  /**
   * Checks the values.
   *
   * @param wiltingPoint                   θ1500 (m³/m³)
   * @param fieldCapacity                  θ33 (m³/m³)
   * @param saturation                     θS (m³/m³)
   * @param availableWater                 θ33 − θ1500 (m³/m³)
   * @param saturatedConductivityMmPerHour Ks (mm/h)
   * @param bulkDensityGPerCm3             ρN (g/cm³)
   * @throws IllegalArgumentException unless 0 &lt; θ1500 &lt; θ33 &lt; θS &lt; 1 and the other
   *     values are positive and finite
   */
  public SoilWaterCharacteristics {
    Arguments.inClosedRange(wiltingPoint, Double.MIN_VALUE, 1, "wiltingPoint");
    if (!(fieldCapacity > wiltingPoint && saturation > fieldCapacity && saturation < 1)) {
      throw new IllegalArgumentException("water contents are not ordered 0 < wiltingPoint "
          + "< fieldCapacity < saturation < 1: " + wiltingPoint + ", " + fieldCapacity + ", "
          + saturation);
    }
    Arguments.positive(availableWater, "availableWater");
    Arguments.positive(saturatedConductivityMmPerHour, "saturatedConductivityMmPerHour");
    Arguments.positive(bulkDensityGPerCm3, "bulkDensityGPerCm3");
  }
}
