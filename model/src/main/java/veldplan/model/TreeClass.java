package veldplan.model;

/**
 * The five tree height classes of the model, shortest first. Arrays over classes are indexed by
 * {@link #ordinal()}; {@link #COUNT} is their number.
 */
public enum TreeClass {
  /** Seedlings and resprouts below 0.5 m. */
  BELOW_0_5M("h0_0.5m", 0.25),
  /** The fire trap, 0.5–2 m: within flame height of most grass fires. */
  FIRE_TRAP_0_5_TO_2M("h0.5_2m", 1.0),
  /** Saplings and small trees, 2–5 m. */
  FROM_2_TO_5M("h2_5m", 3.2),
  /** Large trees, 5–9 m: the class elephants break most (Asner &amp; Levick 2012). */
  FROM_5_TO_9M("h5_9m", 6.7),
  /** Tall trees above 9 m. */
  ABOVE_9M("h9m_plus", 11.0);

  /** Number of classes. */
  public static final int COUNT = 5;
  /** First class that counts as a large tree (above 5 m). */
  public static final int FIRST_LARGE = 3;
  private static final TreeClass[] ALL = values();

  private final String label;
  private final double representativeHeightM;

  TreeClass(String label, double representativeHeightM) {
    this.label = label;
    this.representativeHeightM = representativeHeightM;
  }

  /** Short label for column names, e.g. "h5_9m". */
  public String label() {
    return label;
  }

  /**
   * Height used for fire topkill (m): the geometric mean of the class bounds (0.5–2 m gives 1 m);
   * the open classes use 0.25 m and 11 m.
   */
  public double representativeHeightM() {
    return representativeHeightM;
  }

  /** All classes without the copy {@code values()} makes. */
  public static TreeClass of(int index) {
    return ALL[index];
  }
}
