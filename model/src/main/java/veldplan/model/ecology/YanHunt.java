package veldplan.model.ecology;

/**
 * Temperature response of plant growth or development from three cardinal temperatures, the beta
 * function of Yan &amp; Hunt (1999) [1] in its general form with a base temperature Tmin:
 *
 * <pre>
 *   f(T) = ((Tmax − T)/(Tmax − Topt)) ((T − Tmin)/(Topt − Tmin))^((Topt − Tmin)/(Tmax − Topt))
 *          for Tmin &lt; T &lt; Tmax, and 0 otherwise.
 * </pre>
 *
 * <p>With Tmin = 0 this is the equation published in [1] (there written with Rmax, the rate at
 * Topt, as a factor; here the rate is relative, so f(Topt) = 1). The general form equals the beta
 * function of Yin et al. (1995) [2] with unit curvature (as reproduced in secondary sources).
 * f rises from 0 at Tmin to 1 at Topt and falls to 0 at Tmax.
 *
 * <p>Apply f to monthly (or finer) mean temperatures and weight the results; f is non-linear, so
 * applying it to an annual mean gives a different and wrong answer.
 *
 * <p>References:
 * <ol>
 *   <li>Yan, W. &amp; Hunt, L.A. (1999). An equation for modelling the temperature response of
 *       plants using only the cardinal temperatures. Annals of Botany 84: 607–614.
 *       doi:10.1006/anbo.1999.0955</li>
 *   <li>Yin, X., Kropff, M.J., McLaren, G. &amp; Visperas, R.M. (1995). A nonlinear model for crop
 *       development as a function of temperature. Agricultural and Forest Meteorology 77:
 *       1–16.</li>
 * </ol>
 */
public final class YanHunt {
  private YanHunt() {}

  /**
   * Relative rate f(T) in [0, 1] [1].
   *
   * @param tempC temperature T (°C), not NaN
   * @param tminC base temperature Tmin (°C), below {@code toptC}
   * @param toptC optimum temperature Topt (°C), below {@code tmaxC}
   * @param tmaxC ceiling temperature Tmax (°C), finite
   * @return f(T), in [0, 1]; 0 at and outside Tmin and Tmax, 1 at Topt
   * @throws IllegalArgumentException if the temperature is NaN or the cardinal temperatures are
   *     not finite and strictly increasing
   */
  public static double relativeRate(double tempC, double tminC, double toptC, double tmaxC) {
    if (!(tminC < toptC && toptC < tmaxC && tminC >= -Double.MAX_VALUE
        && tmaxC <= Double.MAX_VALUE)) {
      throw new IllegalArgumentException("cardinal temperatures are not finite and increasing "
          + "(tminC < toptC < tmaxC): " + tminC + ", " + toptC + ", " + tmaxC);
    }
    if (tempC != tempC) {
      throw new IllegalArgumentException("tempC is NaN");
    }
    if (tempC <= tminC || tempC >= tmaxC) {
      return 0;
    }
    double exponent = (toptC - tminC) / (tmaxC - toptC);
    return (tmaxC - tempC) / (tmaxC - toptC) * Math.pow((tempC - tminC) / (toptC - tminC),
        exponent);
  }
}
