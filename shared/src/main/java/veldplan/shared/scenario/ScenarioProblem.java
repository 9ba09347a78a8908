package veldplan.shared.scenario;

import java.nio.file.Path;
import java.util.Objects;

/**
 * One problem found in a scenario, policy or climate file: where it is and what is wrong.
 *
 * <p>The message says what was found and what was expected, with the unit where there is one,
 * e.g. {@code 1.3 is out of range (expected 0 <= value <= 1, fraction)}.
 *
 * @param file    the file the problem is in
 * @param line    1-based line, or 0 if unknown (for example a file that cannot be read)
 * @param column  1-based column, or 0 if unknown
 * @param pointer where in the document: a JSON pointer (RFC 6901) such as
 *                {@code /park/blocks/0/areaHa} for scenario and policy files, the column name
 *                such as {@code rainfall_mm} for climate CSV files, or {@code ""} for the document
 *                or file as a whole
 * @param message what was found and what was expected
 */
public record ScenarioProblem(Path file, int line, int column, String pointer, String message) {

  /** Checks the arguments: file, pointer and message non-null; line and column not negative. */
  public ScenarioProblem {
    Objects.requireNonNull(file, "file");
    Objects.requireNonNull(pointer, "pointer");
    Objects.requireNonNull(message, "message");
    if (line < 0 || column < 0) {
      throw new IllegalArgumentException(
          "line and column must be >= 0: line " + line + ", column " + column);
    }
  }

  /** A problem about a file as a whole (missing, unreadable), with no place inside it. */
  public static ScenarioProblem ofFile(Path file, String message) {
    return new ScenarioProblem(file, 0, 0, "", message);
  }

  /**
   * The problem without its file name: {@code line 14, column 7, /park/name: message}. Parts
   * that are unknown (line 0, column 0, empty pointer) are left out.
   */
  public String describe() {
    StringBuilder out = new StringBuilder();
    if (line > 0) {
      out.append("line ").append(line);
      if (column > 0) {
        out.append(", column ").append(column);
      }
    }
    if (!pointer.isEmpty()) {
      if (out.length() > 0) {
        out.append(", ");
      }
      out.append(pointer);
    }
    if (out.length() > 0) {
      out.append(": ");
    }
    return out.append(message).toString();
  }

  /** The problem with its file name first: {@code file: line 14, column 7, /park/name: message}. */
  @Override
  public String toString() {
    return file + ": " + describe();
  }
}
