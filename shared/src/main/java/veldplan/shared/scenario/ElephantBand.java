package veldplan.shared.scenario;

/**
 * A band of elephant density the managers aim to stay within.
 *
 * @param min lower edge (elephants/km2 over the whole park)
 * @param max upper edge (elephants/km2 over the whole park)
 */
public record ElephantBand(
    @Range(min = 0, max = 20, unit = "elephants/km2") double min,
    @Range(min = 0, max = 20, unit = "elephants/km2") double max) {}
