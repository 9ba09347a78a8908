package veldplan.shared.scenario;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * A scenario, policy or climate file has problems: every problem found, not only the first.
 *
 * <p>This is a checked exception because a bad input file is an expected user error: the command
 * line prints {@link #report()} and exits with a non-zero code, without a stack trace.
 */
public final class ScenarioException extends Exception {

  private static final long serialVersionUID = 1L;

  /** The file the user named (the scenario file); problems may also be in files it refers to. */
  private final Path file;

  /** The problems, sorted: those in {@link #file} first, then by file, line and column. */
  private final List<ScenarioProblem> problems;

  /**
   * Creates the exception.
   *
   * @param file     the file the user named, shown in the first line of the report
   * @param problems the problems, at least one
   */
  public ScenarioException(Path file, List<ScenarioProblem> problems) {
    this.file = Objects.requireNonNull(file, "file");
    if (problems.isEmpty()) {
      throw new IllegalArgumentException("a ScenarioException needs at least one problem");
    }
    List<ScenarioProblem> sorted = new ArrayList<>(problems);
    // Stable sort: problems at the same place keep the order in which they were found.
    sorted.sort(Comparator
        .comparing((ScenarioProblem p) -> !p.file().equals(file))
        .thenComparing(p -> p.file().toString())
        .thenComparingInt(ScenarioProblem::line)
        .thenComparingInt(ScenarioProblem::column));
    this.problems = List.copyOf(sorted);
  }

  /** The file the user named. */
  public Path file() {
    return file;
  }

  /** The problems, those in {@link #file()} first, each file's problems by line and column. */
  public List<ScenarioProblem> problems() {
    return problems;
  }

  /**
   * The report for the user, one line per problem. Problems in another file (a climate CSV)
   * start with that file's name:
   *
   * <pre>
   * error: examples/x/scenario.yaml: 2 problems
   *   line 14, column 7, /park/blocks/0/sandFractoin: unknown field; did you mean "sandFraction"?
   *   examples/x/baseline.csv: line 5, column 9, rainfall_mm: found "n/a" (expected a number, mm)
   * </pre>
   */
  public String report() {
    StringBuilder out = new StringBuilder();
    out.append("error: ").append(file).append(": ").append(problems.size())
        .append(problems.size() == 1 ? " problem" : " problems");
    for (ScenarioProblem problem : problems) {
      out.append('\n').append("  ");
      if (!problem.file().equals(file)) {
        out.append(problem.file()).append(": ");
      }
      out.append(problem.describe());
    }
    return out.toString();
  }

  /** The same text as {@link #report()}. */
  @Override
  public String getMessage() {
    return report();
  }
}
