package veldplan.optimiser.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import veldplan.shared.scenario.ScenarioReader;

/**
 * The optimise command on the example park with a small search: what it writes and prints, that
 * the same seed gives the same front whatever the thread count, that an interrupted run (killed
 * with SIGKILL) continues with --resume to the identical front, and its errors.
 */
class OptimiseCommandTest {
  /** A small search: 8 policies x (1 + 5) generations, 2 + 3 replicates per path. */
  static List<String> small(Path out, String... more) {
    return sized(out, 8, 5, more);
  }

  static List<String> sized(Path out, int population, int generations, String... more) {
    List<String> args = new ArrayList<>(List.of("optimise",
        CliTestSupport.example("duskveld", "scenario.yaml").toString(), "--out", out.toString(),
        "--population", Integer.toString(population), "--generations",
        Integer.toString(generations), "--replicates", "2", "--validation-replicates", "3",
        "--no-progress", "--no-plots"));
    args.addAll(List.of(more));
    return args;
  }

  static CliTestSupport.Result run(List<String> args) {
    return CliTestSupport.run(args.toArray(String[]::new));
  }

  @Test
  void writesTheFrontAndPrintsThePick(@TempDir Path dir) throws Exception {
    Path out = dir.resolve("out");
    List<String> args = small(out, "--threads", "2");
    args.remove("--no-plots");
    CliTestSupport.Result r = run(args);
    assertEquals(0, r.exitCode(), r.transcript());
    // One chart per pair of the three objectives, each a readable PNG.
    for (String chart : List.of("front-large-trees-kept-vs-guilds-persist.png",
        "front-management-cost-vs-guilds-persist.png",
        "front-management-cost-vs-large-trees-kept.png")) {
      java.awt.image.BufferedImage image =
          javax.imageio.ImageIO.read(out.resolve("plots").resolve(chart).toFile());
      assertEquals(900, image.getWidth(), chart);
    }
    for (String f : List.of("front.csv", "front.json", "run.json")) {
      assertTrue(Files.isRegularFile(out.resolve(f)), f);
    }
    assertFalse(Files.exists(out.resolve("checkpoint.json")), "finished runs leave no checkpoint");
    List<String> csv = Files.readAllLines(out.resolve("front.csv"));
    List<String> header = CliTestSupport.cells(csv.get(0));
    assertTrue(header.contains("ironsand_fire_return_interval_years"), header.toString());
    assertTrue(header.contains("guilds_persist_probability_lo95"), header.toString());
    assertTrue(header.contains("management_cost_usd_pv_path_hot_dry"), header.toString());
    assertTrue(csv.stream().anyMatch(l -> l.startsWith("status quo,reference,")), csv.toString());
    assertTrue(csv.stream().anyMatch(l -> l.startsWith("no intervention,reference,")));
    long front = csv.stream().filter(l -> l.contains(",front,")).count();
    assertTrue(front >= 1, csv.toString());
    try (var files = Files.list(out.resolve("policies"))) {
      List<Path> policies = files.toList();
      assertEquals(front, policies.size());
      var scenario = ScenarioReader.read(CliTestSupport.example("duskveld", "scenario.yaml"));
      for (Path p : policies) {
        ScenarioReader.readPolicy(p, scenario);   // each is a valid policy file
      }
    }
    JsonNode run = new ObjectMapper().readTree(out.resolve("run.json").toFile());
    assertEquals("optimise", run.get("command").asText());
    assertEquals(8 * 6, run.get("outcome").get("evaluations").asLong());
    assertTrue(r.out().contains("Pareto front:"), r.out());
    assertTrue(r.out().contains("licensed"), "cautions printed: " + r.out());
  }

  @Test
  void sameSeedSameFrontWhateverTheThreads(@TempDir Path dir) throws IOException {
    Path one = dir.resolve("one");
    Path two = dir.resolve("two");
    assertEquals(0, run(small(one, "--threads", "1")).exitCode());
    assertEquals(0, run(small(two, "--threads", "2")).exitCode());
    assertArrayEquals(Files.readAllBytes(one.resolve("front.csv")),
        Files.readAllBytes(two.resolve("front.csv")));
    assertArrayEquals(Files.readAllBytes(one.resolve("front.json")),
        Files.readAllBytes(two.resolve("front.json")));
  }

  /**
   * Kills a run with SIGKILL once its checkpoint shows a few generations, continues it with
   * --resume, and compares the front with that of an uninterrupted run.
   */
  @Test
  void killedRunResumesToTheIdenticalFront(@TempDir Path dir) throws Exception {
    Path whole = dir.resolve("whole");
    assertEquals(0, run(sized(whole, 8, 40, "--threads", "1")).exitCode());

    Path killed = dir.resolve("killed");
    List<String> command = new ArrayList<>(List.of(
        Path.of(System.getProperty("java.home"), "bin", "java").toString(),
        "--add-modules", "jdk.incubator.vector", "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"),
        Main.class.getName()));
    command.addAll(sized(killed, 8, 40, "--threads", "1"));
    Process p = new ProcessBuilder(command).redirectErrorStream(true)
        .redirectOutput(dir.resolve("killed.log").toFile()).start();
    Path checkpoint = killed.resolve("checkpoint.json");
    ObjectMapper json = new ObjectMapper();
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
    int generation = -1;
    while (System.nanoTime() < deadline && p.isAlive() && generation < 3) {
      Thread.sleep(20);
      if (Files.isRegularFile(checkpoint)) {
        try {
          generation = json.readTree(checkpoint.toFile()).get("state").get("generation").asInt();
        } catch (IOException e) {
          // Being replaced right now; the write is atomic, so try again.
        }
      }
    }
    assertTrue(p.isAlive(), "the run ended before it could be killed: "
        + Files.readString(dir.resolve("killed.log")));
    p.destroyForcibly();   // SIGKILL on Linux and macOS
    p.waitFor(30, TimeUnit.SECONDS);
    assertEquals(137, p.exitValue(), "killed by SIGKILL");
    assertFalse(Files.exists(killed.resolve("front.csv")), "killed before the end");
    assertTrue(Files.isRegularFile(checkpoint));

    CliTestSupport.Result resumed = run(sized(killed, 8, 40, "--threads", "2", "--resume"));
    assertEquals(0, resumed.exitCode(), resumed.transcript());
    assertArrayEquals(Files.readAllBytes(whole.resolve("front.csv")),
        Files.readAllBytes(killed.resolve("front.csv")));
    assertArrayEquals(Files.readAllBytes(whole.resolve("front.json")),
        Files.readAllBytes(killed.resolve("front.json")));
  }

  @Test
  void anUnfinishedRunIsNotOverwritten(@TempDir Path dir) throws IOException {
    Path out = dir.resolve("out");
    Files.createDirectories(out);
    Files.writeString(out.resolve("checkpoint.json"), "{}");
    CliTestSupport.Result r = run(small(out));
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("holds an unfinished run"), r.err());
    assertEquals("{}", Files.readString(out.resolve("checkpoint.json")));
  }

  @Test
  void resumeNeedsACheckpoint(@TempDir Path dir) {
    CliTestSupport.Result r = run(small(dir.resolve("none"), "--resume"));
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("--resume:"), r.err());
  }

  @Test
  void badOptionsAreListedTogether(@TempDir Path dir) {
    CliTestSupport.Result r = run(sized(dir.resolve("o"), 7, 5, "--over-paths", "p120",
        "--threads", "0"));
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("--population: 7 is odd"), r.err());
    assertTrue(r.err().contains("--over-paths: \"p120\""), r.err());
    assertTrue(r.err().contains("--threads: 0"), r.err());
    assertFalse(Files.exists(dir.resolve("o")), "nothing written");
  }

  @Test
  void aScenarioWithoutAnOptimisationSectionIsBadInput(@TempDir Path dir) throws IOException {
    Path copy = dir.resolve("scenario.yaml");
    String text = Files.readString(CliTestSupport.example("duskveld", "scenario.yaml"));
    Files.writeString(copy, text.substring(0, text.indexOf("\noptimisation:")) + "\n");
    Files.copy(CliTestSupport.example("duskveld", "baseline-climate.csv"),
        dir.resolve("baseline-climate.csv"));
    CliTestSupport.Result r = CliTestSupport.run("optimise", copy.toString(), "--out",
        dir.resolve("o").toString());
    assertEquals(2, r.exitCode(), r.transcript());
    assertTrue(r.err().contains("/optimisation: missing"), r.err());
    assertFalse(Files.exists(dir.resolve("o")));
  }

  @Test
  void aFailedSimulation_leavesItsPolicyInAFileThatSimulateReads(@TempDir Path dir)
      throws Exception {
    Path scenarioFile = CliTestSupport.example("duskveld", "scenario.yaml");
    veldplan.shared.scenario.Scenario scenario = ScenarioReader.load(scenarioFile).scenario();
    veldplan.shared.scenario.Policy policy = scenario.policy();
    RuntimeException failure = new IllegalStateException("evaluation failed",
        new veldplan.optimiser.park.PolicyRunException("model state invalid", policy,
            new IllegalStateException("negative grass")));
    java.io.StringWriter text = new java.io.StringWriter();
    Path file = OptimiseCommand.writeFailedPolicy(failure, dir, scenarioFile,
        new java.io.PrintWriter(text, true));
    assertEquals(dir.resolve("failed-policy.yaml"), file);
    assertEquals(policy, ScenarioReader.readPolicy(file, scenario));
    assertTrue(text.toString().contains("--policy " + file), text.toString());

    // Any other failure writes nothing.
    Path other = dir.resolve("other");
    Files.createDirectories(other);
    assertEquals(null, OptimiseCommand.writeFailedPolicy(new IllegalStateException("disk"),
        other, scenarioFile, new java.io.PrintWriter(new java.io.StringWriter(), true)));
    try (var listing = Files.list(other)) {
      assertEquals(0, listing.count());
    }
  }
}
