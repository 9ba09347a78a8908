package veldplan.model.ecology;

/**
 * Probability that a fire kills the stems of a savanna tree down to the ground ("topkill"), from
 * the logistic regressions of Higgins et al. (2007) [1, Appendix C, Table C2], fitted to the
 * long-term burn plots of four sites in the Kruger National Park:
 *
 * <pre>
 *   logit(p) = intercept + a ln(H) + b √I
 * </pre>
 *
 * <p>H is tree height (m) and I fireline intensity. A topkilled tree resprouts: topkill is not
 * death.
 *
 * <p><b>Units caveat.</b> The appendix text gives intensity in "MJ s⁻¹ m⁻¹". With that unit the
 * intensity term would be negligible (0.038 × √2 ≈ 0.05 at 2000 kW/m), while with kW/m
 * (kJ s⁻¹ m⁻¹) it matters (0.038 × √2000 ≈ 1.7), and the reported significance (P &lt; 0.001)
 * fits kW/m. This class takes <b>kW/m</b>, which is an assumption to be checked against the
 * paper, not a verified fact.
 *
 * <p>References:
 * <ol>
 *   <li>Higgins, S.I., Bond, W.J., February, E.C., Bronn, A., Euston-Brown, D.I.W., Enslin, B.,
 *       Govender, N., Rademan, L., O'Regan, S., Potgieter, A.L.F., Scheiter, S., Sowry, R.,
 *       Trollope, L. &amp; Trollope, W.S.W. (2007). Effects of four decades of fire manipulation on
 *       woody vegetation structure in savanna. Ecology 88: 1119–1125. Appendix C.</li>
 * </ol>
 */
public final class Topkill {
  /**
   * Coefficients of one site's topkill regression [1, Table C2]. The constructor throws
   * {@link IllegalArgumentException} if a coefficient is not finite.
   *
   * @param intercept                the intercept of the logit (dimensionless), finite
   * @param lnHeightCoefficient      a, the coefficient of ln(height in m), finite
   * @param sqrtIntensityCoefficient b, the coefficient of √(intensity in kW/m), finite; 0 where the
   *                                 term was not significant
   */
  public record Coefficients(double intercept, double lnHeightCoefficient,
      double sqrtIntensityCoefficient) {
    /**
     * Checks the coefficients.
     *
     * @param intercept                intercept of the logit
     * @param lnHeightCoefficient      a, coefficient of ln(height in m)
     * @param sqrtIntensityCoefficient b, coefficient of √(intensity in kW/m)
     * @throws IllegalArgumentException if a coefficient is not finite
     */
    public Coefficients {
      Arguments.finite(intercept, "intercept");
      Arguments.finite(lnHeightCoefficient, "lnHeightCoefficient");
      Arguments.finite(sqrtIntensityCoefficient, "sqrtIntensityCoefficient");
    }
  }

  /** Mopane site: intercept 1.56, a −2.98, b 0.021 (residual df 2081) [1, Table C2]. */
  public static final Coefficients MOPANE = new Coefficients(1.56, -2.98, 0.021);

  /**
   * Satara site: intercept 2.95, a −3.57; the intensity term was not significant and is 0
   * (residual df 1345) [1, Table C2].
   */
  public static final Coefficients SATARA = new Coefficients(2.95, -3.57, 0);

  /** Skukuza site: intercept 1.17, a −3.44, b 0.038 (residual df 2183) [1, Table C2]. */
  public static final Coefficients SKUKUZA = new Coefficients(1.17, -3.44, 0.038);

  /** Pretoriuskop site: intercept 0.78, a −3.39, b 0.038 (residual df 3360) [1, Table C2]. */
  public static final Coefficients PRETORIUSKOP = new Coefficients(0.78, -3.39, 0.038);

  private Topkill() {}

  /**
   * Topkill probability 1 / (1 + exp(−(intercept + a ln H + b √I))) [1].
   *
   * @param heightM                  tree height H (m), &gt; 0
   * @param intensityKwPerM          fireline intensity I (kW/m; see the units caveat), &ge; 0
   * @param intercept                intercept of the logit
   * @param lnHeightCoefficient      a, the coefficient of ln H
   * @param sqrtIntensityCoefficient b, the coefficient of √I
   * @return p (probability), in [0, 1]
   * @throws IllegalArgumentException if the height or intensity is out of range
   */
  public static double probability(double heightM, double intensityKwPerM, double intercept,
      double lnHeightCoefficient, double sqrtIntensityCoefficient) {
    Arguments.positive(heightM, "heightM");
    Arguments.nonNegative(intensityKwPerM, "intensityKwPerM");
    return probabilityOfTerms(Math.log(heightM), Math.sqrt(intensityKwPerM), intercept,
        lnHeightCoefficient, sqrtIntensityCoefficient);
  }

  /**
   * The same logistic from its two predictors already transformed, for callers that evaluate many
   * heights at one intensity: logit = intercept + a ln(H) + b sqrt(I). No argument checks.
   *
   * @param lnHeight      ln(height in m)
   * @param sqrtIntensity sqrt(fireline intensity in kW/m)
   */
  public static double probabilityOfTerms(double lnHeight, double sqrtIntensity,
      double intercept, double lnHeightCoefficient, double sqrtIntensityCoefficient) {
    double logit = intercept + lnHeightCoefficient * lnHeight
        + sqrtIntensityCoefficient * sqrtIntensity;
    return 1 / (1 + Math.exp(-logit));
  }

  /**
   * The height part of the logistic as a factor, exp(-(intercept + a ln H)): with it,
   * p = 1 / (1 + heightFactor x intensityFactor), see {@link #probabilityOfFactors}. A caller that
   * evaluates many heights at each of many intensities computes this once per height. No
   * argument checks.
   *
   * @param lnHeight            ln(height in m)
   * @param intercept           intercept of the logit
   * @param lnHeightCoefficient a, the coefficient of ln H
   */
  public static double heightFactor(double lnHeight, double intercept,
      double lnHeightCoefficient) {
    return Math.exp(-(intercept + lnHeightCoefficient * lnHeight));
  }

  /**
   * The intensity part of the logistic as a factor, exp(-b sqrt(I)); see {@link #heightFactor}.
   * No argument checks.
   *
   * @param sqrtIntensity            sqrt(fireline intensity in kW/m)
   * @param sqrtIntensityCoefficient b, the coefficient of sqrt(I)
   */
  public static double intensityFactor(double sqrtIntensity, double sqrtIntensityCoefficient) {
    return Math.exp(-sqrtIntensityCoefficient * sqrtIntensity);
  }

  /**
   * The same logistic from its two factors: 1 / (1 + exp(-(intercept + a ln H)) exp(-b sqrt I)),
   * which is 1 / (1 + exp(-logit)) because exp(x + y) = exp(x) exp(y). It equals
   * {@link #probabilityOfTerms} up to rounding (a few units in the last place), with one
   * exponential per intensity instead of one per height and intensity. No argument checks.
   *
   * @param heightFactor    {@link #heightFactor} of the tree's height
   * @param intensityFactor {@link #intensityFactor} of the fire's intensity
   * @return p (probability), in [0, 1]
   */
  public static double probabilityOfFactors(double heightFactor, double intensityFactor) {
    return 1 / (1 + heightFactor * intensityFactor);
  }

  /**
   * Topkill probability with one site's coefficients, see
   * {@link #probability(double, double, double, double, double)}.
   *
   * @param heightM         tree height H (m), &gt; 0
   * @param intensityKwPerM fireline intensity I (kW/m; see the units caveat), &ge; 0
   * @param coefficients    the site's coefficients, for example {@link #SKUKUZA}
   * @return p (probability), in [0, 1]
   * @throws IllegalArgumentException if the height or intensity is out of range
   */
  public static double probability(double heightM, double intensityKwPerM,
      Coefficients coefficients) {
    return probability(heightM, intensityKwPerM, coefficients.intercept(),
        coefficients.lnHeightCoefficient(), coefficients.sqrtIntensityCoefficient());
  }
}
