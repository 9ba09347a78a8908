package veldplan.shared.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading monthly climate CSV files written inline; the numbers are arbitrary test input. */
class ClimateTableTest {

  private static final String HEADER = "year,month,rainfall_mm,tmin_c,tmax_c\n";

  @TempDir
  Path dir;

  /** Rows for whole years; month m of year index y has rainfall 100 y + m, tmin m, tmax m + 10. */
  private static String years(int firstYear, int count) {
    StringBuilder out = new StringBuilder();
    for (int y = 0; y < count; y++) {
      for (int m = 1; m <= 12; m++) {
        out.append(String.format(Locale.ROOT, "%d,%d,%d,%d,%d%n", firstYear + y, m,
            100 * y + m, m, m + 10));
      }
    }
    return out.toString();
  }

  private Path write(String text) throws IOException {
    Path file = dir.resolve("climate.csv");
    Files.writeString(file, text, StandardCharsets.UTF_8);
    return file;
  }

  private List<ScenarioProblem> problems(String text) throws IOException {
    Path file = write(text);
    return assertThrows(ScenarioException.class, () -> ClimateTable.read(file)).problems();
  }

  @Test
  void read_twoWholeYears_accessorsIndexYearAndMonth() throws IOException, ScenarioException {
    ClimateTable table = ClimateTable.read(write(HEADER + years(1995, 2)));

    assertEquals(1995, table.firstYear());
    assertEquals(2, table.years());
    assertEquals(1996, table.lastYear());
    assertEquals(1, table.rainfallMm(0, 0));
    assertEquals(112, table.rainfallMm(1, 11));
    assertEquals(7, table.tminC(1, 6));
    assertEquals(17, table.tmaxC(1, 6));
  }

  @Test
  void read_commentsBlankLinesSpacesCrlfAndBom_accepted() throws IOException, ScenarioException {
    String body = years(2001, 1).replace(",", " , ").replace("\n", "\r\n");
    String text = "\uFEFF# source: invented\r\n\r\n" + HEADER.replace("\n", "\r\n")
        + "# a comment between rows\r\n" + body + "\r\n\r\n";
    ClimateTable table = ClimateTable.read(write(text));

    assertEquals(2001, table.firstYear());
    assertEquals(1, table.years());
    assertEquals(12, table.rainfallMm(0, 11));
  }

  @Test
  void read_lastYearIncomplete_problemAtLastRow() throws IOException {
    String text = HEADER + years(2000, 1) + "2001,1,5,1,11\n2001,2,5,1,11\n";
    List<ScenarioProblem> problems = problems(text);

    assertEquals(1, problems.size());
    assertEquals(15, problems.get(0).line());
    assertEquals("month", problems.get(0).pointer());
    assertTrue(problems.get(0).message().contains("month 2 of 2001 (expected month 12"),
        problems.get(0).message());
  }

  @Test
  void read_firstRowNotJanuary_problem() throws IOException {
    String text = HEADER + years(2000, 1).replaceFirst("2000,1,1,1,11\\R", "");
    List<ScenarioProblem> problems = problems(text);

    assertEquals(1, problems.size());
    assertEquals(2, problems.get(0).line());
    assertTrue(problems.get(0).message().contains("found month 2 in the first row"));
  }

  @Test
  void read_badCells_oneProblemPerCellWithColumnName() throws IOException {
    String rows = years(2000, 1)
        .replace("2000,3,3,3,13", "2000,3,-1,3,13")      // negative rainfall
        .replace("2000,5,5,5,15", "2000,5,5,-31,15")     // tmin below -30
        .replace("2000,7,7,7,17", "2000,7,7,7,61")       // tmax above 60
        .replace("2000,9,9,9,19", "2000,9,9,NaN,19")     // NaN is not a number here
        .replace("2000,11,11,11,21", "2000,11,11,21");   // four cells
    List<ScenarioProblem> problems = problems(HEADER + rows);

    assertEquals(5, problems.size(), problems.toString());
    assertProblem(problems.get(0), 4, 8, "rainfall_mm",
        "-1 is out of range (expected value >= 0, mm)");
    assertProblem(problems.get(1), 6, 10, "tmin_c", "-31 is out of range (expected -30 <= value");
    assertProblem(problems.get(2), 8, 12, "tmax_c", "61 is out of range (expected -30 <= value "
        + "<= 60, degrees C)");
    assertProblem(problems.get(3), 10, 10, "tmin_c", "found \"NaN\" (expected a number");
    assertProblem(problems.get(4), 12, 1, "", "found 4 cells (expected 5");
  }

  @Test
  void read_monthOutOfRangeAndYearNotWhole_problemsWithoutCascade() throws IOException {
    String rows = years(2000, 1)
        .replace("2000,4,4,4,14", "2000,13,4,4,14")
        .replace("2000,6,6,6,16", "2000.5,6,6,6,16");
    List<ScenarioProblem> problems = problems(HEADER + rows);

    assertEquals(2, problems.size(), problems.toString());
    assertProblem(problems.get(0), 5, 6, "month", "13 is out of range (expected 1 <= value <= 12)");
    assertProblem(problems.get(1), 7, 1, "year", "found \"2000.5\" (expected a whole number)");
  }

  @Test
  void read_emptyFileAndHeaderOnly_problems() throws IOException {
    assertTrue(problems("").get(0).message().startsWith("the file is empty"));
    assertTrue(problems(HEADER).get(0).message().startsWith("no data rows"));
  }

  @Test
  void read_notUtf8_problem() throws IOException {
    Path file = dir.resolve("latin1.csv");
    Files.write(file, new byte[] {'y', 'e', 'a', 'r', (byte) 0xE9, '\n'});
    ScenarioException e = assertThrows(ScenarioException.class, () -> ClimateTable.read(file));

    assertEquals(List.of(ScenarioProblem.ofFile(file, "the file is not UTF-8 text")),
        e.problems());
  }

  @Test
  void read_garbage_stopsAfterCap() throws IOException {
    String rows = "x,y,z,w,v\n".repeat(3 * ClimateTable.MAX_PROBLEMS_PER_FILE);
    List<ScenarioProblem> problems = problems(HEADER + rows);

    assertEquals(ClimateTable.MAX_PROBLEMS_PER_FILE + 1, problems.size());
    assertEquals(1, problems.stream()
        .filter(p -> p.message().startsWith("stopped reading after 50 problems")).count());
  }

  @Test
  void of_arrays_copiedAndIndexed() {
    double[] rain = new double[24];
    double[] tmin = new double[24];
    double[] tmax = new double[24];
    rain[13] = 42;
    tmax[13] = 30;
    ClimateTable table = ClimateTable.of(1990, rain, tmin, tmax);
    rain[13] = 0;

    assertEquals(42, table.rainfallMm(1, 1));
    assertEquals(30, table.tmaxC(1, 1));
    assertEquals(1991, table.lastYear());
  }

  @Test
  void of_badArrays_rejected() {
    double[] twelve = new double[12];
    assertThrows(IllegalArgumentException.class,
        () -> ClimateTable.of(2000, new double[11], new double[11], new double[11]));
    assertThrows(IllegalArgumentException.class,
        () -> ClimateTable.of(2000, twelve, twelve, new double[24]));
    double[] nan = new double[12];
    nan[3] = Double.NaN;
    assertThrows(IllegalArgumentException.class, () -> ClimateTable.of(2000, nan, twelve, twelve));
    double[] cold = new double[12];
    cold[0] = 5;
    assertThrows(IllegalArgumentException.class,
        () -> ClimateTable.of(2000, twelve, cold, twelve));
  }

  private static void assertProblem(ScenarioProblem problem, int line, int column,
      String pointer, String fragment) {
    assertEquals(line, problem.line(), problem.toString());
    assertEquals(column, problem.column(), problem.toString());
    assertEquals(pointer, problem.pointer(), problem.toString());
    assertTrue(problem.message().contains(fragment), problem.toString());
  }
}
