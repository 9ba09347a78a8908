package veldplan.shared.scenario;

/**
 * Elephant management.
 *
 * @param offtakeFractionPerYear  share of the population removed each year (culling or
 *                                translocation)
 * @param contraceptionCoverage   share of breeding females treated each year
 * @param triggerDensityPerKm2    offtake and contraception act only in years when density is
 *                                above this (elephants/km2); absent = act every year
 */
public record ElephantPlan(
    @Range(min = 0, max = 0.5, unit = "fraction per year") double offtakeFractionPerYear,
    @Range(min = 0, max = 1, unit = "fraction of breeding females") double contraceptionCoverage,
    @Optional @Range(min = 0, max = 20, unit = "elephants/km2") Double triggerDensityPerKm2) {}
