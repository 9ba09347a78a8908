package veldplan.model.climate;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Annual global-mean CO2 concentrations (ppm) of the four SSP pathways the tool ships with:
 * SSP1-2.6, SSP2-4.5, SSP3-7.0 and SSP5-8.5 of Meinshausen et al. (2020, Geosci. Model Dev.
 * 13: 3571–3605), read from the classpath resource {@code veldplan/model/climate/ssp-co2-ppm.csv}.
 * The resource's comment header records where the values came from.
 *
 * <p>Between rows the concentration is interpolated linearly in calendar year (rows are annual,
 * so whole years return the tabulated value). Before the first row and after the last row the
 * end value is held constant.
 *
 * <p>Instances are immutable and safe to share between threads.
 */
public final class Co2Pathways {

  /** Pathway names, in column order, exactly as written in scenario files. */
  public static final List<String> NAMES =
      List.of("SSP1-2.6", "SSP2-4.5", "SSP3-7.0", "SSP5-8.5");

  static final String RESOURCE = "/veldplan/model/climate/ssp-co2-ppm.csv";

  private static volatile Co2Pathways cached;

  private final int[] years;
  /** ppm[pathway][row]. */
  private final double[][] ppm;

  private Co2Pathways(int[] years, double[][] ppm) {
    this.years = years;
    this.ppm = ppm;
  }

  /**
   * The shipped table. The resource is parsed once and the result shared.
   *
   * @throws IllegalStateException if the resource is missing or malformed (a packaging bug)
   */
  public static Co2Pathways load() {
    Co2Pathways c = cached;
    if (c == null) {
      synchronized (Co2Pathways.class) {
        c = cached;
        if (c == null) {
          c = readResource();
          cached = c;
        }
      }
    }
    return c;
  }

  private static Co2Pathways readResource() {
    try (InputStream in = Co2Pathways.class.getResourceAsStream(RESOURCE)) {
      if (in == null) {
        throw new IllegalStateException("CO2 table " + RESOURCE + " is not on the classpath");
      }
      return parse(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)));
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read CO2 table " + RESOURCE, e);
    }
  }

  static Co2Pathways parse(BufferedReader reader) throws IOException {
    String expectedHeader = "year," + String.join(",", NAMES);
    boolean headerSeen = false;
    List<Integer> ys = new ArrayList<>();
    List<double[]> rows = new ArrayList<>();
    String line;
    int lineNo = 0;
    while ((line = reader.readLine()) != null) {
      lineNo++;
      String t = line.strip();
      if (t.isEmpty() || t.startsWith("#")) {
        continue;
      }
      if (!headerSeen) {
        if (!t.equals(expectedHeader)) {
          throw new IllegalStateException("CO2 table line " + lineNo + ": expected header '"
              + expectedHeader + "' but found '" + t + "'");
        }
        headerSeen = true;
        continue;
      }
      String[] f = t.split(",", -1);
      if (f.length != NAMES.size() + 1) {
        throw new IllegalStateException("CO2 table line " + lineNo + ": expected "
            + (NAMES.size() + 1) + " fields but found " + f.length);
      }
      try {
        int year = Integer.parseInt(f[0].strip());
        if (!ys.isEmpty() && year <= ys.get(ys.size() - 1)) {
          throw new IllegalStateException("CO2 table line " + lineNo + ": year " + year
              + " is not after the previous row's year " + ys.get(ys.size() - 1));
        }
        double[] v = new double[NAMES.size()];
        for (int p = 0; p < v.length; p++) {
          v[p] = Double.parseDouble(f[p + 1].strip());
          if (!(v[p] > 0) || Double.isInfinite(v[p])) {
            throw new IllegalStateException("CO2 table line " + lineNo + ": " + NAMES.get(p)
                + " value " + f[p + 1] + " is not a positive finite number");
          }
        }
        ys.add(year);
        rows.add(v);
      } catch (NumberFormatException e) {
        throw new IllegalStateException("CO2 table line " + lineNo + ": not a number: " + t, e);
      }
    }
    if (!headerSeen || ys.isEmpty()) {
      throw new IllegalStateException("CO2 table has no header or no data rows");
    }
    int n = ys.size();
    int[] years = new int[n];
    double[][] ppm = new double[NAMES.size()][n];
    for (int i = 0; i < n; i++) {
      years[i] = ys.get(i);
      for (int p = 0; p < NAMES.size(); p++) {
        ppm[p][i] = rows.get(i)[p];
      }
    }
    return new Co2Pathways(years, ppm);
  }

  /** First calendar year in the table. */
  public int firstYear() {
    return years[0];
  }

  /** Last calendar year in the table. */
  public int lastYear() {
    return years[years.length - 1];
  }

  /**
   * CO2 concentration of a pathway in a calendar year.
   *
   * @param pathway      one of {@link #NAMES}, e.g. "SSP2-4.5"
   * @param calendarYear any year; outside the table the end value is held constant
   * @return concentration (ppm)
   * @throws IllegalArgumentException if the pathway is not one of {@link #NAMES}
   */
  public double ppm(String pathway, int calendarYear) {
    int p = pathway == null ? -1 : NAMES.indexOf(pathway);
    if (p < 0) {
      throw new IllegalArgumentException("unknown CO2 pathway '" + pathway + "'; expected one of "
          + String.join(", ", NAMES));
    }
    double[] v = ppm[p];
    int n = years.length;
    if (calendarYear <= years[0]) {
      return v[0];
    }
    if (calendarYear >= years[n - 1]) {
      return v[n - 1];
    }
    int lo = 0;
    int hi = n - 1;
    // Here years[0] < calendarYear < years[n - 1]; keep years[lo] <= calendarYear < years[hi].
    while (hi - lo > 1) {
      int mid = (lo + hi) >>> 1;
      if (years[mid] <= calendarYear) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    if (years[lo] == calendarYear) {
      return v[lo];
    }
    double w = (double) (calendarYear - years[lo]) / (years[hi] - years[lo]);
    return v[lo] + w * (v[hi] - v[lo]);
  }

  /**
   * Concentrations for consecutive calendar years, as the simulator's yearly arrays need.
   *
   * @param pathway   one of {@link #NAMES}
   * @param startYear first calendar year
   * @param years     number of years (at least 0)
   * @return array of length {@code years}; element y is the value for {@code startYear + y}
   */
  public double[] series(String pathway, int startYear, int years) {
    if (years < 0) {
      throw new IllegalArgumentException("years must be >= 0, was " + years);
    }
    double[] out = new double[years];
    for (int y = 0; y < years; y++) {
      out[y] = ppm(pathway, startYear + y);
    }
    return out;
  }
}
