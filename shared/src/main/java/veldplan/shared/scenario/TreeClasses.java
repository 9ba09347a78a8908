package veldplan.shared.scenario;

/**
 * Trees per hectare in the model's five height classes. The 0.5–2 m class is the fire trap; the
 * two classes above 5 m are the large trees; the 5–9 m class is the one elephants break most
 * (Asner &amp; Levick 2012).
 *
 * @param below0_5m  seedlings and resprouts below 0.5 m (trees/ha)
 * @param from0_5to2m fire-trap class, 0.5–2 m (trees/ha)
 * @param from2to5m  saplings and small trees, 2–5 m (trees/ha)
 * @param from5to9m  large trees, 5–9 m (trees/ha)
 * @param above9m    tall trees above 9 m (trees/ha)
 */
public record TreeClasses(
    @Range(min = 0, max = 1e5, unit = "trees/ha") double below0_5m,
    @Range(min = 0, max = 1e5, unit = "trees/ha") double from0_5to2m,
    @Range(min = 0, max = 1e5, unit = "trees/ha") double from2to5m,
    @Range(min = 0, max = 1e4, unit = "trees/ha") double from5to9m,
    @Range(min = 0, max = 1e4, unit = "trees/ha") double above9m) {

  /** The five classes in model order, shortest first. */
  public double[] toArray() {
    return new double[] {below0_5m, from0_5to2m, from2to5m, from5to9m, above9m};
  }
}
