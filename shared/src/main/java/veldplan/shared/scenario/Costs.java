package veldplan.shared.scenario;

/**
 * Unit costs of management, in one currency, and the discount rate for present values.
 *
 * @param currency                        currency code for reports (e.g. "USD")
 * @param burningPerHa                    planned burning, per hectare burnt
 * @param offtakePerAnimal                removal of one elephant (cull or translocation)
 * @param contraceptionPerFemalePerYear   darting and boosters for one treated female for a year
 * @param waterPointUpkeepPerYear         upkeep of one open artificial water point for a year
 * @param waterPointClosure               one-off cost of closing one water point
 * @param discountRatePercent             annual discount rate (%)
 */
public record Costs(
    String currency,
    @Range(min = 0, max = 1e6, unit = "currency/ha") double burningPerHa,
    @Range(min = 0, max = 1e8, unit = "currency/animal") double offtakePerAnimal,
    @Range(min = 0, max = 1e7, unit = "currency/female/yr") double contraceptionPerFemalePerYear,
    @Range(min = 0, max = 1e8, unit = "currency/point/yr") double waterPointUpkeepPerYear,
    @Range(min = 0, max = 1e8, unit = "currency/point") double waterPointClosure,
    @Range(min = 0, max = 30, unit = "%/yr") double discountRatePercent) {}
