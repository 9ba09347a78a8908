package veldplan.shared.scenario;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Objects;

/**
 * Where each field name and value of a parsed scenario or policy file sits in the file, by JSON
 * pointer. The reader fills it while it reads the tokens; the validator uses it to give each
 * semantic problem a line and column.
 *
 * <p>A pointer that has no entry (for example a field that is missing) falls back to its nearest
 * ancestor that has one, so a problem always gets the most precise place that is known.
 */
public final class SourceLocations {

  /** A 1-based line and column. */
  private record Place(int line, int column) {}

  /** The file the pointers refer to. */
  private final Path file;

  /** Where each value starts (for an object or list, its first token). */
  private final Map<String, Place> values = new HashMap<>();

  /** Where each field name starts. */
  private final Map<String, Place> keys = new HashMap<>();

  private SourceLocations(Path file) {
    this.file = Objects.requireNonNull(file, "file");
  }

  /**
   * Locations for a file whose places are not known (a scenario built in code, or a file not
   * yet read): every problem gets line 0 and column 0.
   */
  public static SourceLocations none(Path file) {
    return new SourceLocations(file);
  }

  /** The file the pointers refer to. */
  public Path file() {
    return file;
  }

  /** A problem placed at the value that {@code pointer} names (or its nearest known ancestor). */
  public ScenarioProblem at(String pointer, String message) {
    Place place = find(values, pointer);
    return problem(place, pointer, message);
  }

  /**
   * A problem placed at the field name that {@code pointer} ends in; falls back to the value and
   * then to the nearest known ancestor.
   */
  public ScenarioProblem atKey(String pointer, String message) {
    Place place = keys.get(pointer);
    if (place == null) {
      place = find(values, pointer);
    }
    return problem(place, pointer, message);
  }

  /** Records where the value at {@code pointer} starts. */
  void putValue(String pointer, int line, int column) {
    values.put(pointer, new Place(Math.max(0, line), Math.max(0, column)));
  }

  /** Records where the field name that {@code pointer} ends in starts. */
  void putKey(String pointer, int line, int column) {
    keys.put(pointer, new Place(Math.max(0, line), Math.max(0, column)));
  }

  private ScenarioProblem problem(Place place, String pointer, String message) {
    return place == null
        ? new ScenarioProblem(file, 0, 0, pointer, message)
        : new ScenarioProblem(file, place.line(), place.column(), pointer, message);
  }

  private static Place find(Map<String, Place> map, String pointer) {
    String at = pointer;
    while (true) {
      Place place = map.get(at);
      if (place != null || at.isEmpty()) {
        return place;
      }
      at = at.substring(0, at.lastIndexOf('/'));
    }
  }
}
