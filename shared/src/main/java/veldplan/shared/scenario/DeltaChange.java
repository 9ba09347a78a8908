package veldplan.shared.scenario;

/**
 * Delta change at one anchor year: baseline rainfall is scaled, baseline temperatures shifted.
 *
 * @param year                   calendar year of the anchor
 * @param rainfallChangePercent  change in rainfall (% of baseline; -20 means 20 % drier)
 * @param temperatureChangeC     change in Tmin and Tmax (degrees C)
 */
public record DeltaChange(
    @Range(min = 1800, max = 2300, unit = "calendar year") int year,
    @Range(min = -90, max = 200, unit = "% of baseline") double rainfallChangePercent,
    @Range(min = -10, max = 10, unit = "degrees C") double temperatureChangeC) {}
