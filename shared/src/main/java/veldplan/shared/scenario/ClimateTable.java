package veldplan.shared.scenario;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Monthly climate for whole consecutive years: rainfall and minimum and maximum temperature,
 * stored in flat {@code double[]} arrays indexed {@code yearIndex * 12 + month0}.
 *
 * <p>The CSV file has the header {@code year,month,rainfall_mm,tmin_c,tmax_c} and one row per
 * month: consecutive months in order, starting in January of the first year and ending in
 * December of the last. Rainfall is the month's total (mm, &gt;= 0); temperatures are the
 * month's mean daily minimum and maximum (degrees C, in [-30, 60], minimum &lt;= maximum).
 * Blank lines and lines starting with {@code #} (for the data's source) are skipped. Cells may
 * have spaces around them; quoting is not supported, since no cell needs it.
 */
public final class ClimateTable {

  /** The header, cell by cell. */
  public static final List<String> COLUMNS =
      List.of("year", "month", "rainfall_mm", "tmin_c", "tmax_c");

  /** Lowest accepted temperature (degrees C), a plausibility bound against typing errors. */
  public static final double MIN_TEMPERATURE_C = -30;

  /** Highest accepted temperature (degrees C), a plausibility bound against typing errors. */
  public static final double MAX_TEMPERATURE_C = 60;

  /** After this many problems in one file, reading stops: the file is probably not climate. */
  static final int MAX_PROBLEMS_PER_FILE = 50;

  private static final String HEADER = String.join(",", COLUMNS);
  private static final Pattern WHOLE = Pattern.compile("[+-]?\\d{1,9}");
  private static final Pattern DECIMAL =
      Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

  private final int firstYear;
  private final int years;
  private final double[] rainfallMm;
  private final double[] tminC;
  private final double[] tmaxC;

  private ClimateTable(int firstYear, double[] rainfallMm, double[] tminC, double[] tmaxC) {
    this.firstYear = firstYear;
    this.years = rainfallMm.length / 12;
    this.rainfallMm = rainfallMm;
    this.tminC = tminC;
    this.tmaxC = tmaxC;
  }

  /**
   * A table from arrays (for tests and generated climate). The arrays are copied; they are
   * indexed {@code yearIndex * 12 + month0} and must have the same length, a positive multiple
   * of 12, with the same value rules as the CSV file.
   *
   * @throws IllegalArgumentException naming the first bad value
   */
  public static ClimateTable of(int firstYear, double[] rainfallMm, double[] tminC,
      double[] tmaxC) {
    int n = rainfallMm.length;
    if (n == 0 || n % 12 != 0 || tminC.length != n || tmaxC.length != n) {
      throw new IllegalArgumentException(String.format(Locale.ROOT,
          "arrays must have the same length, a positive multiple of 12: rainfallMm %d, "
              + "tminC %d, tmaxC %d", n, tminC.length, tmaxC.length));
    }
    for (int i = 0; i < n; i++) {
      if (!(rainfallMm[i] >= 0 && rainfallMm[i] < Double.POSITIVE_INFINITY)) {
        throw new IllegalArgumentException("rainfallMm[" + i + "] is not a finite number >= 0: "
            + rainfallMm[i]);
      }
      if (!inTemperatureRange(tminC[i]) || !inTemperatureRange(tmaxC[i])
          || !(tminC[i] <= tmaxC[i])) {
        throw new IllegalArgumentException("temperatures at index " + i + " must satisfy -30 <= "
            + "tminC <= tmaxC <= 60: tminC " + tminC[i] + ", tmaxC " + tmaxC[i]);
      }
    }
    return new ClimateTable(firstYear, rainfallMm.clone(), tminC.clone(), tmaxC.clone());
  }

  /**
   * Reads and checks a climate CSV file.
   *
   * @throws ScenarioException with every problem found, each with line, column and column name
   */
  public static ClimateTable read(Path file) throws ScenarioException {
    List<ScenarioProblem> problems = new ArrayList<>();
    ClimateTable table = read(file, problems);
    if (!problems.isEmpty()) {
      throw new ScenarioException(file, problems);
    }
    return table;
  }

  /** Reads a climate CSV file, adding its problems to {@code problems}; null if any. */
  static ClimateTable read(Path file, List<ScenarioProblem> problems) {
    byte[] bytes;
    try {
      bytes = Files.readAllBytes(file);
    } catch (NoSuchFileException e) {
      problems.add(ScenarioProblem.ofFile(file, "file not found"));
      return null;
    } catch (AccessDeniedException e) {
      problems.add(ScenarioProblem.ofFile(file, "cannot read the file: permission denied"));
      return null;
    } catch (IOException e) {
      problems.add(ScenarioProblem.ofFile(file, "cannot read the file: " + e.getMessage()));
      return null;
    }
    String text;
    try {
      text = StandardCharsets.UTF_8.newDecoder()
          .onMalformedInput(CodingErrorAction.REPORT)
          .onUnmappableCharacter(CodingErrorAction.REPORT)
          .decode(ByteBuffer.wrap(bytes))
          .toString();
    } catch (CharacterCodingException e) {
      problems.add(ScenarioProblem.ofFile(file, "the file is not UTF-8 text"));
      return null;
    }
    return new Parser(file, problems).parse(text);
  }

  /** First calendar year in the table. */
  public int firstYear() {
    return firstYear;
  }

  /** Number of whole years in the table. */
  public int years() {
    return years;
  }

  /** Last calendar year in the table. */
  public int lastYear() {
    return firstYear + years - 1;
  }

  /** Monthly rainfall (mm) in year {@code firstYear() + yearIndex}, month {@code month0 + 1}. */
  public double rainfallMm(int yearIndex, int month0) {
    assert month0 >= 0 && month0 < 12 : month0;
    return rainfallMm[yearIndex * 12 + month0];
  }

  /** Mean daily minimum temperature (degrees C) in that month. */
  public double tminC(int yearIndex, int month0) {
    assert month0 >= 0 && month0 < 12 : month0;
    return tminC[yearIndex * 12 + month0];
  }

  /** Mean daily maximum temperature (degrees C) in that month. */
  public double tmaxC(int yearIndex, int month0) {
    assert month0 >= 0 && month0 < 12 : month0;
    return tmaxC[yearIndex * 12 + month0];
  }

  private static boolean inTemperatureRange(double value) {
    return value >= MIN_TEMPERATURE_C && value <= MAX_TEMPERATURE_C;
  }

  /** Reads the text of one file; keeps the problems in the caller's list. */
  private static final class Parser {
    private final Path file;
    private final List<ScenarioProblem> problems;
    private final int problemsBefore;
    private int rows;
    private double[] rainfall = new double[120];
    private double[] tmin = new double[120];
    private double[] tmax = new double[120];
    private int firstYear;

    /** The (year, month) the next row must have, once the first row is known. */
    private int expectedYear;
    private int expectedMonth;
    private boolean started;

    /** Place of the last data row, for the "whole years" problem. */
    private int lastLine;
    private int lastMonth;
    private int lastYear;

    Parser(Path file, List<ScenarioProblem> problems) {
      this.file = file;
      this.problems = problems;
      this.problemsBefore = problems.size();
    }

    ClimateTable parse(String text) {
      String[] lines = text.split("\n", -1);
      boolean headerSeen = false;
      for (int index = 0; index < lines.length; index++) {
        int lineNumber = index + 1;
        String line = lines[index];
        if (line.endsWith("\r")) {
          line = line.substring(0, line.length() - 1);
        }
        if (index == 0 && line.startsWith("\uFEFF")) {
          line = line.substring(1);
        }
        String trimmed = line.trim();
        if (trimmed.isEmpty() || trimmed.startsWith("#")) {
          continue;
        }
        if (!headerSeen) {
          headerSeen = true;
          if (!header(line, lineNumber)) {
            return null;
          }
          continue;
        }
        row(line, lineNumber);
        if (problems.size() - problemsBefore >= MAX_PROBLEMS_PER_FILE) {
          problems.add(new ScenarioProblem(file, lineNumber, 0, "", "stopped reading after "
              + MAX_PROBLEMS_PER_FILE + " problems in this file"));
          return null;
        }
      }
      if (!headerSeen) {
        problems.add(new ScenarioProblem(file, 1, 1, "",
            "the file is empty (expected the header \"" + HEADER + "\" and monthly rows)"));
        return null;
      }
      if (rows == 0) {
        if (problems.size() == problemsBefore) {
          problems.add(new ScenarioProblem(file, 0, 0, "",
              "no data rows (expected at least one whole year of monthly rows)"));
        }
        return null;
      }
      if (started && lastMonth != 12) {
        problems.add(new ScenarioProblem(file, lastLine, 1, "month", String.format(Locale.ROOT,
            "the last row is month %d of %d (expected month 12: whole years only)",
            lastMonth, lastYear)));
      }
      if (problems.size() > problemsBefore) {
        return null;
      }
      return new ClimateTable(firstYear, Arrays.copyOf(rainfall, rows),
          Arrays.copyOf(tmin, rows), Arrays.copyOf(tmax, rows));
    }

    private boolean header(String line, int lineNumber) {
      List<Cell> cells = split(line);
      for (int k = 0; k < Math.max(cells.size(), COLUMNS.size()); k++) {
        boolean same = k < cells.size() && k < COLUMNS.size()
            && cells.get(k).text.equals(COLUMNS.get(k));
        if (!same) {
          int column = k < cells.size() ? cells.get(k).column : line.length() + 1;
          problems.add(new ScenarioProblem(file, lineNumber, column, "",
              "found the header " + Texts.quote(line.trim()) + " (expected \"" + HEADER + "\")"));
          return false;
        }
      }
      return true;
    }

    private void row(String line, int lineNumber) {
      List<Cell> cells = split(line);
      if (cells.size() != COLUMNS.size()) {
        problems.add(new ScenarioProblem(file, lineNumber, 1, "", String.format(Locale.ROOT,
            "found %d cells (expected %d: %s)", cells.size(), COLUMNS.size(), HEADER)));
        advance(lineNumber, null, null);
        return;
      }
      Integer year = whole(cells.get(0), lineNumber, "year", Integer.MIN_VALUE,
          Integer.MAX_VALUE);
      Integer month = whole(cells.get(1), lineNumber, "month", 1, 12);
      double rain = decimal(cells.get(2), lineNumber, "rainfall_mm", 0,
          Double.POSITIVE_INFINITY, "mm");
      double low = decimal(cells.get(3), lineNumber, "tmin_c", MIN_TEMPERATURE_C,
          MAX_TEMPERATURE_C, "degrees C");
      double high = decimal(cells.get(4), lineNumber, "tmax_c", MIN_TEMPERATURE_C,
          MAX_TEMPERATURE_C, "degrees C");
      if (low > high) {
        problems.add(new ScenarioProblem(file, lineNumber, cells.get(3).column, "tmin_c",
            "tmin_c " + cells.get(3).text + " is above tmax_c " + cells.get(4).text
                + " (expected tmin_c <= tmax_c, degrees C)"));
      }
      if (year != null && month != null) {
        sequence(year, month, lineNumber, cells);
      }
      advance(lineNumber, year, month);
      store(rain, low, high);
    }

    /** Checks that (year, month) is the month after the previous row's. */
    private void sequence(int year, int month, int lineNumber, List<Cell> cells) {
      if (!started) {
        if (month != 1) {
          problems.add(new ScenarioProblem(file, lineNumber, cells.get(1).column, "month",
              "found month " + month + " in the first row (expected 1: the table must start "
                  + "in January; whole years only)"));
        }
        firstYear = year;
        return;
      }
      if (year != expectedYear || month != expectedMonth) {
        boolean yearWrong = year != expectedYear;
        problems.add(new ScenarioProblem(file, lineNumber,
            cells.get(yearWrong ? 0 : 1).column, yearWrong ? "year" : "month",
            String.format(Locale.ROOT, "found year %d, month %d (expected year %d, month %d: "
                + "rows must be consecutive months)", year, month, expectedYear,
                expectedMonth)));
      }
    }

    /**
     * Moves the expected (year, month) on by one month: from this row's, or, if this row's could
     * not be read, from the previous expectation, so that one bad cell gives one problem.
     */
    private void advance(int lineNumber, Integer year, Integer month) {
      int y;
      int m;
      if (year != null && month != null) {
        y = year;
        m = month;
      } else if (started) {
        y = expectedYear;
        m = expectedMonth;
      } else {
        return;
      }
      started = true;
      lastLine = lineNumber;
      lastYear = y;
      lastMonth = m;
      expectedYear = m == 12 ? y + 1 : y;
      expectedMonth = m == 12 ? 1 : m + 1;
    }

    private void store(double rain, double low, double high) {
      if (rows == rainfall.length) {
        rainfall = Arrays.copyOf(rainfall, rows * 2);
        tmin = Arrays.copyOf(tmin, rows * 2);
        tmax = Arrays.copyOf(tmax, rows * 2);
      }
      rainfall[rows] = rain;
      tmin[rows] = low;
      tmax[rows] = high;
      rows++;
    }

    /** The cell as a whole number in [min, max], or null after adding a problem. */
    private Integer whole(Cell cell, int lineNumber, String column, int min, int max) {
      if (!WHOLE.matcher(cell.text).matches()) {
        problems.add(new ScenarioProblem(file, lineNumber, cell.column, column,
            "found " + cell.shown() + " (expected a whole number)"));
        return null;
      }
      int value = Integer.parseInt(cell.text.startsWith("+") ? cell.text.substring(1)
          : cell.text);
      if (value < min || value > max) {
        problems.add(new ScenarioProblem(file, lineNumber, cell.column, column,
            cell.text + " is out of range (expected " + min + " <= value <= " + max + ")"));
        return null;
      }
      return value;
    }

    /** The cell as a finite number in [min, max], or NaN after adding a problem. */
    private double decimal(Cell cell, int lineNumber, String column, double min, double max,
        String unit) {
      if (!DECIMAL.matcher(cell.text).matches()) {
        problems.add(new ScenarioProblem(file, lineNumber, cell.column, column,
            "found " + cell.shown() + " (expected a number, " + unit + ")"));
        return Double.NaN;
      }
      double value = Double.parseDouble(cell.text);
      if (!(value >= min && value <= max)) {
        String bounds = max == Double.POSITIVE_INFINITY
            ? "value >= " + Texts.number(min)
            : Texts.number(min) + " <= value <= " + Texts.number(max);
        problems.add(new ScenarioProblem(file, lineNumber, cell.column, column,
            cell.text + " is out of range (expected " + bounds + ", " + unit + ")"));
        return Double.NaN;
      }
      return value;
    }

    /** The comma-separated cells of a line, trimmed, with the 1-based column of each. */
    private static List<Cell> split(String line) {
      List<Cell> cells = new ArrayList<>();
      int start = 0;
      while (true) {
        int comma = line.indexOf(',', start);
        int end = comma < 0 ? line.length() : comma;
        int from = start;
        while (from < end && Character.isWhitespace(line.charAt(from))) {
          from++;
        }
        int to = end;
        while (to > from && Character.isWhitespace(line.charAt(to - 1))) {
          to--;
        }
        cells.add(new Cell(line.substring(from, to), from + 1));
        if (comma < 0) {
          return cells;
        }
        start = comma + 1;
      }
    }
  }

  /** One cell: its trimmed text and the 1-based column where the text starts. */
  private static final class Cell {
    final String text;
    final int column;

    Cell(String text, int column) {
      this.text = text;
      this.column = column;
    }

    String shown() {
      return text.isEmpty() ? "an empty cell" : Texts.quote(text);
    }
  }
}
