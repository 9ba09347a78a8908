package veldplan.model.climate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class Co2PathwaysTest {

  private static final Co2Pathways CO2 = Co2Pathways.load();

  /**
   * Every value of the decadal table. Source: Meinshausen et al. (2020), The shared
   * socio-economic pathway (SSP) greenhouse gas concentrations and their extensions to 2500,
   * Geosci. Model Dev. 13: 3571–3605 — global annual-mean CO2 of the CMIP6 input4MIPs files, as
   * read from the two independent public copies described in the project's methods sheet,
   * section 7.2 (a simple-climate-model input table derived from the RCMIP concentration set,
   * and an atmospheric-model CO2 look-up table built from the input4MIPs SSP2-4.5 file).
   * Tolerance ±0.05 ppm as the sheet suggests.
   */
  @ParameterizedTest(name = "{0}: {1} {2} {3} {4}")
  @CsvSource({
      // year, SSP1-2.6, SSP2-4.5, SSP3-7.0, SSP5-8.5  (Meinshausen et al. 2020, methods sheet §7.2)
      "2020, 414.23, 414.39, 415.15, 414.89",
      "2030, 439.56, 444.14, 451.16, 451.51",
      "2040, 458.20, 475.34, 493.22, 500.02",
      "2050, 469.31, 506.88, 540.58, 562.78",
      "2060, 473.75, 537.09, 593.23, 643.04",
      "2070, 473.11, 563.93, 651.54, 743.66",
      "2080, 467.39, 585.07, 716.01, 864.37",
      "2090, 456.92, 597.74, 787.49, 998.32",
      "2100, 445.63, 602.78, 867.19, 1135.21"})
  void decadalTableOfMeinshausenEtAl2020(int year, double ssp126, double ssp245, double ssp370,
      double ssp585) {
    assertEquals(ssp126, CO2.ppm("SSP1-2.6", year), 0.05);
    assertEquals(ssp245, CO2.ppm("SSP2-4.5", year), 0.05);
    assertEquals(ssp370, CO2.ppm("SSP3-7.0", year), 0.05);
    assertEquals(ssp585, CO2.ppm("SSP5-8.5", year), 0.05);
  }

  /**
   * Historical values 2014 = 397.55 ppm and 2015 = 399.95 ppm (Meinshausen et al. 2020, via the
   * same public copies, methods sheet §7.2).
   */
  @Test
  void historicalAnchors() {
    for (String p : Co2Pathways.NAMES) {
      assertEquals(397.55, CO2.ppm(p, 2014), 0.05, p);
      assertEquals(399.95, CO2.ppm(p, 2015), 0.05, p);
    }
  }

  /**
   * Meinshausen et al. (2020), abstract: "CO2 concentrations by 2100 range from 393 to 1135 ppm
   * for the lowest (SSP1-1.9) and highest (SSP5-8.5)" — printed to the ppm, so ±0.5 ppm.
   */
  @Test
  void ssp585In2100MatchesThePaperAbstract() {
    assertEquals(1135, CO2.ppm("SSP5-8.5", 2100), 0.5);
  }

  /**
   * Annual values between decades: SSP5-8.5 in 2075 and 2085 are 801.69 and 930.67 ppm
   * (Meinshausen et al. 2020 annual series, as quoted in methods sheet §7.2); the shipped table
   * is annual, so these are exact rows rather than interpolations.
   */
  @Test
  void annualValuesBetweenDecades() {
    assertEquals(801.69, CO2.ppm("SSP5-8.5", 2075), 0.05);
    assertEquals(930.67, CO2.ppm("SSP5-8.5", 2085), 0.05);
  }

  @Test
  void coversAtLeast2015To2100() {
    assertTrue(CO2.firstYear() <= 2015, "first year " + CO2.firstYear());
    assertTrue(CO2.lastYear() >= 2100, "last year " + CO2.lastYear());
  }

  @Test
  void holdsEndValuesConstantOutsideTheTable() {
    for (String p : Co2Pathways.NAMES) {
      assertEquals(CO2.ppm(p, CO2.firstYear()), CO2.ppm(p, 1900), 0.0, p);
      assertEquals(CO2.ppm(p, CO2.lastYear()), CO2.ppm(p, 3000), 0.0, p);
    }
  }

  @Test
  void namesAreTheFourShippedPathways() {
    assertEquals(List.of("SSP1-2.6", "SSP2-4.5", "SSP3-7.0", "SSP5-8.5"), Co2Pathways.NAMES);
  }

  @Test
  void unknownPathwayIsRejectedWithItsName() {
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> CO2.ppm("RCP8.5", 2050));
    assertTrue(e.getMessage().contains("RCP8.5"), e.getMessage());
    assertThrows(IllegalArgumentException.class, () -> CO2.ppm("ssp2-4.5", 2050));
    assertThrows(IllegalArgumentException.class, () -> CO2.ppm(null, 2050));
  }

  /** Linear interpolation between rows, checked on a hand-made two-decade table [D]. */
  @Test
  void interpolatesLinearlyBetweenRows() throws IOException {
    String csv = "# test\n"
        + "year,SSP1-2.6,SSP2-4.5,SSP3-7.0,SSP5-8.5\n"
        + "2000,400,400,400,400\n"
        + "2010,410,420,430,500\n";
    Co2Pathways t = Co2Pathways.parse(new BufferedReader(new StringReader(csv)));
    assertEquals(400.0, t.ppm("SSP1-2.6", 2000), 1e-12);
    assertEquals(404.0, t.ppm("SSP1-2.6", 2004), 1e-12);
    assertEquals(412.0, t.ppm("SSP3-7.0", 2004), 1e-12);
    assertEquals(470.0, t.ppm("SSP5-8.5", 2007), 1e-12);
    assertEquals(420.0, t.ppm("SSP2-4.5", 2010), 1e-12);
    assertEquals(400.0, t.ppm("SSP2-4.5", 1990), 1e-12);
    assertEquals(500.0, t.ppm("SSP5-8.5", 2020), 1e-12);
  }

  @Test
  void seriesMatchesYearByYearLookUp() {
    double[] s = CO2.series("SSP2-4.5", 2025, 50);
    assertEquals(50, s.length);
    for (int y = 0; y < 50; y++) {
      assertEquals(CO2.ppm("SSP2-4.5", 2025 + y), s[y], 0.0);
    }
  }

  @Test
  void malformedTablesAreRejected() {
    assertThrows(IllegalStateException.class, () -> Co2Pathways.parse(
        new BufferedReader(new StringReader("year,a,b\n2000,1,2\n"))));
    assertThrows(IllegalStateException.class, () -> Co2Pathways.parse(new BufferedReader(
        new StringReader("year,SSP1-2.6,SSP2-4.5,SSP3-7.0,SSP5-8.5\n2000,1,2,3\n"))));
    assertThrows(IllegalStateException.class, () -> Co2Pathways.parse(new BufferedReader(
        new StringReader("year,SSP1-2.6,SSP2-4.5,SSP3-7.0,SSP5-8.5\n"
            + "2001,1,2,3,4\n2000,1,2,3,4\n"))));
  }
}
