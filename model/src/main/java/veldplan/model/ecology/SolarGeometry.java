package veldplan.model.ecology;

/**
 * Extraterrestrial radiation, daylength and solar radiation at the surface, after FAO Irrigation
 * and Drainage Paper 56 [1], Chapter 3.
 *
 * <ul>
 *   <li>Extraterrestrial radiation Ra: [1, Eq. 21], with the inverse relative Earth–Sun distance
 *       dr [1, Eq. 23], the solar declination δ [1, Eq. 24] and the sunset hour angle ωs
 *       [1, Eq. 25]. Latitude φ is converted from degrees to radians as in [1, Eq. 22].</li>
 *   <li>Maximum possible daylength N: [1, Eq. 34].</li>
 *   <li>Solar radiation Rs from bright sunshine hours (Angström form) with the default
 *       coefficients as = 0.25, bs = 0.50: [1, Eq. 35].</li>
 *   <li>Solar radiation Rs from the daily temperature range (Hargreaves' radiation formula):
 *       [1, Eq. 50].</li>
 * </ul>
 *
 * <p>Latitude is in decimal degrees, negative in the southern hemisphere, in [−90, 90]. The day of
 * year J runs from 1 (1 January) to 365 or 366. Radiation is in MJ m⁻² day⁻¹; multiply by
 * {@link #MJ_TO_MM_EVAPORATION} for the equivalent evaporation in mm/day. Poleward of the polar
 * circles the argument of the arccos in [1, Eq. 25] leaves [−1, 1]; it is clamped, which gives
 * polar night (ωs = 0) or midnight sun (ωs = π). This never matters at savanna latitudes.
 *
 * <p>References:
 * <ol>
 *   <li>Allen, R.G., Pereira, L.S., Raes, D. &amp; Smith, M. (1998). Crop evapotranspiration:
 *       guidelines for computing crop water requirements. FAO Irrigation and Drainage Paper 56.
 *       FAO, Rome.</li>
 * </ol>
 */
public final class SolarGeometry {
  /**
   * Converts radiation in MJ m⁻² day⁻¹ to its evaporation equivalent in mm/day: 0.408 = 1/λ with
   * the latent heat of vaporisation λ = 2.45 MJ kg⁻¹ [1, Chapter 3].
   */
  public static final double MJ_TO_MM_EVAPORATION = 0.408;

  /** Solar constant Gsc = 0.0820 MJ m⁻² min⁻¹ [1, Eq. 21]. */
  public static final double SOLAR_CONSTANT_MJ_PER_M2_MIN = 0.0820;

  /** Default Angström coefficient as (fraction of Ra reaching the ground on overcast days). */
  public static final double ANGSTROM_AS = 0.25;

  /** Default Angström coefficient bs; as + bs is the fraction on clear days [1, Eq. 35]. */
  public static final double ANGSTROM_BS = 0.50;

  /** Hargreaves radiation adjustment coefficient kRs for interior locations [1, Eq. 50]. */
  public static final double KRS_INTERIOR = 0.16;

  /** Hargreaves radiation adjustment coefficient kRs for coastal locations [1, Eq. 50]. */
  public static final double KRS_COASTAL = 0.19;

  /** Day of year of the 15th of each month in a 365-day year, January first. */
  private static final int[] MID_MONTH_DAY = {15, 46, 74, 105, 135, 166, 196, 227, 258, 288, 319,
      349};

  private SolarGeometry() {}

  /**
   * Extraterrestrial radiation Ra [1, Eq. 21].
   *
   * @param latitudeDeg latitude (decimal degrees, negative south), in [−90, 90]
   * @param dayOfYear   day of year J, in [1, 366]
   * @return Ra (MJ m⁻² day⁻¹), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double extraterrestrialRadiationMJPerM2Day(double latitudeDeg, int dayOfYear) {
    double phi = latitudeRad(latitudeDeg);
    double dr = inverseRelativeDistance(dayOfYear);
    double delta = declinationRad(dayOfYear);
    double omegaS = sunsetHourAngleRad(phi, delta);
    return (24 * 60 / Math.PI) * SOLAR_CONSTANT_MJ_PER_M2_MIN * dr
        * (omegaS * Math.sin(phi) * Math.sin(delta)
            + Math.cos(phi) * Math.cos(delta) * Math.sin(omegaS));
  }

  /**
   * Maximum possible duration of sunshine N = (24/π) ωs [1, Eq. 34].
   *
   * @param latitudeDeg latitude (decimal degrees, negative south), in [−90, 90]
   * @param dayOfYear   day of year J, in [1, 366]
   * @return N (hours), in [0, 24]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double daylengthHours(double latitudeDeg, int dayOfYear) {
    double omegaS = sunsetHourAngleRad(latitudeRad(latitudeDeg), declinationRad(dayOfYear));
    return 24 / Math.PI * omegaS;
  }

  /**
   * Inverse relative distance Earth–Sun dr = 1 + 0.033 cos(2πJ/365) [1, Eq. 23].
   *
   * @param dayOfYear day of year J, in [1, 366]
   * @return dr (dimensionless)
   * @throws IllegalArgumentException if {@code dayOfYear} is out of range
   */
  public static double inverseRelativeDistance(int dayOfYear) {
    Arguments.inClosedRange(dayOfYear, 1, 366, "dayOfYear");
    return 1 + 0.033 * Math.cos(2 * Math.PI * dayOfYear / 365.0);
  }

  /**
   * Solar declination δ = 0.409 sin(2πJ/365 − 1.39) [1, Eq. 24].
   *
   * @param dayOfYear day of year J, in [1, 366]
   * @return δ (radians)
   * @throws IllegalArgumentException if {@code dayOfYear} is out of range
   */
  public static double declinationRad(int dayOfYear) {
    Arguments.inClosedRange(dayOfYear, 1, 366, "dayOfYear");
    return 0.409 * Math.sin(2 * Math.PI * dayOfYear / 365.0 - 1.39);
  }

  /**
   * Sunset hour angle ωs = arccos(−tan φ tan δ) [1, Eq. 25], with the arccos argument clamped to
   * [−1, 1] poleward of the polar circles.
   *
   * @param latitudeDeg latitude (decimal degrees, negative south), in [−90, 90]
   * @param dayOfYear   day of year J, in [1, 366]
   * @return ωs (radians), in [0, π]
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double sunsetHourAngleRad(double latitudeDeg, int dayOfYear) {
    return sunsetHourAngleRad(latitudeRad(latitudeDeg), declinationRad(dayOfYear));
  }

  /**
   * Solar radiation from sunshine hours, Rs = (as + bs n/N) Ra, with as = 0.25 and bs = 0.50
   * [1, Eq. 35].
   *
   * @param raMJ           extraterrestrial radiation Ra (MJ m⁻² day⁻¹), &ge; 0
   * @param sunshineHours  actual duration of bright sunshine n (hours), in [0, N]
   * @param daylengthHours maximum possible duration of sunshine N (hours), &gt; 0
   * @return Rs (MJ m⁻² day⁻¹)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double solarRadiationFromSunshineMJ(double raMJ, double sunshineHours,
      double daylengthHours) {
    Arguments.nonNegative(raMJ, "raMJ");
    Arguments.positive(daylengthHours, "daylengthHours");
    Arguments.inClosedRange(sunshineHours, 0, daylengthHours, "sunshineHours");
    return (ANGSTROM_AS + ANGSTROM_BS * sunshineHours / daylengthHours) * raMJ;
  }

  /**
   * Solar radiation from the daily temperature range, Rs = kRs √(Tmax − Tmin) Ra [1, Eq. 50].
   * FAO-56 suggests kRs ≈ 0.16 for interior and 0.19 for coastal locations.
   *
   * @param raMJ  extraterrestrial radiation Ra (MJ m⁻² day⁻¹), &ge; 0
   * @param tmaxC mean daily maximum air temperature (°C), &ge; {@code tminC}
   * @param tminC mean daily minimum air temperature (°C), finite
   * @param kRs   adjustment coefficient (°C^−0.5), &gt; 0
   * @return Rs (MJ m⁻² day⁻¹)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double solarRadiationFromTemperatureMJ(double raMJ, double tmaxC, double tminC,
      double kRs) {
    Arguments.nonNegative(raMJ, "raMJ");
    Arguments.finite(tminC, "tminC");
    Arguments.finite(tmaxC, "tmaxC");
    Arguments.nonNegative(tmaxC - tminC, "tmaxC - tminC");
    Arguments.positive(kRs, "kRs");
    return kRs * Math.sqrt(tmaxC - tminC) * raMJ;
  }

  /**
   * The day of year of the 15th of a month in a 365-day year (15, 46, 74, …, 349), the day used
   * for monthly values of Ra and N.
   *
   * @param month month, 1 = January … 12 = December
   * @return day of year J of the 15th of that month
   * @throws IllegalArgumentException if {@code month} is not in [1, 12]
   */
  public static int midMonthDayOfYear(int month) {
    Arguments.inClosedRange(month, 1, 12, "month");
    return MID_MONTH_DAY[month - 1];
  }

  private static double latitudeRad(double latitudeDeg) {
    Arguments.inClosedRange(latitudeDeg, -90, 90, "latitudeDeg");
    return Math.PI / 180 * latitudeDeg;
  }

  private static double sunsetHourAngleRad(double phi, double delta) {
    double x = -Math.tan(phi) * Math.tan(delta);
    return Math.acos(Math.max(-1, Math.min(1, x)));
  }
}
