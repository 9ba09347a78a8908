package veldplan.optimiser.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicInteger;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import veldplan.model.Ensemble;
import veldplan.model.ManagementPlan;
import veldplan.model.ParametersFromScenario;
import veldplan.model.Seasons;
import veldplan.model.Study;
import veldplan.model.Trajectory;
import veldplan.optimiser.report.SimulationSummary;
import veldplan.optimiser.report.TrajectoryCsv;
import veldplan.optimiser.report.TrajectoryPlots;
import veldplan.shared.io.AtomicFiles;
import veldplan.shared.io.IoConsumer;
import veldplan.shared.scenario.ClimatePath;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioException;
import veldplan.shared.scenario.ScenarioReader;
import veldplan.shared.scenario.Stochastic;

/** {@code veldplan simulate}: runs one policy on every climate path and replicate. */
@Command(name = "simulate", mixinStandardHelpOptions = true,
    description = {
        "Runs one management policy on every climate path and stochastic replicate of a",
        "scenario and writes the yearly trajectories of every block, guild and cost."},
    footer = {"", "Writes OUT/trajectories.csv, OUT/run.json (settings and provenance) and one",
        "chart per indicator in OUT/plots/ (median and 5-95 % range per climate path).",
        "Exit status: 0 done, 1 failure, 2 bad input (nothing written)."})
public final class SimulateCommand implements Callable<Integer> {
  @Spec
  CommandSpec spec;

  @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (.yaml or .json).")
  Path scenarioFile;

  @Option(names = "--policy", paramLabel = "FILE",
      description = "Policy file to simulate instead of the scenario's own policy.")
  Path policyFile;

  @Option(names = "--path", paramLabel = "NAME",
      description = "Simulate only this climate path (default: all).")
  String pathName;

  @Option(names = "--replicates", paramLabel = "N",
      description = "Replicates per climate path (default: the scenario's).")
  Integer replicates;

  @Option(names = "--seed", paramLabel = "S",
      description = "Scenario seed (default: the scenario's).")
  Long seed;

  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads (default: all cores). Results do not depend on it.")
  Integer threads;

  @Option(names = "--out", paramLabel = "DIR", required = true, description = "Output folder.")
  Path out;

  @Option(names = "--no-progress", description = "Do not show the progress bar.")
  boolean noProgress;

  @Option(names = "--no-plots", description = "Do not draw the charts in OUT/plots/.")
  boolean noPlots;

  @Option(names = "--debug", description = "Show stack traces of failures.")
  boolean debug;

  @Override
  public Integer call() {
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter stdout = spec.commandLine().getOut();
    Instant started = Instant.now();
    List<String> optionProblems = new ArrayList<>();
    CommandLineProblems.range(optionProblems, "--replicates", replicates, 1, 100_000);
    CommandLineProblems.range(optionProblems, "--threads", threads, 1, 1024);
    if (Files.exists(out) && !Files.isDirectory(out)) {
      optionProblems.add("--out: " + out + " exists and is not a folder (expected a folder to "
          + "write into, or a name for a new one)");
    }
    if (!optionProblems.isEmpty()) {
      return CommandLineProblems.report(err, optionProblems);
    }

    LoadedScenario loaded;
    Policy policy;
    try {
      loaded = ScenarioReader.load(scenarioFile);
      Scenario sc = loaded.scenario();
      policy = policyFile == null ? sc.policy() : ScenarioReader.readPolicy(policyFile, sc);
      List<String> names = sc.climate().paths().stream().map(ClimatePath::name).toList();
      if (pathName != null && !names.contains(pathName)) {
        return CommandLineProblems.report(err, List.of("--path: no climate path named \"" + pathName
            + "\" in " + scenarioFile + " (expected one of " + String.join(", ", names) + ")"));
      }
      Stochastic st = sc.stochastic();
      sc = sc.withStochastic(new Stochastic(replicates == null ? st.replicates() : replicates,
          seed == null ? st.seed() : seed, st.interannualVariabilityFactor())).withPolicy(policy);
      loaded = new LoadedScenario(loaded.file(), sc, loaded.baseline(), loaded.pathSeries(),
          loaded.sha256());
    } catch (ScenarioException e) {
      err.println(e.report());
      err.flush();
      return ExitCodes.BAD_INPUT;
    }

    // A scenario can pass the reader and still describe something the model cannot use (a soil
    // whose water contents come out in the wrong order, say): that is bad input too, found
    // before anything runs or is written. The message starts with a JSON pointer.
    Study study;
    ManagementPlan plan;
    Path source = scenarioFile;
    try {
      // A path simulated alone keeps the random streams it has in the whole scenario.
      study = ParametersFromScenario.study(loaded, pathName == null ? null : List.of(pathName));
      if (policyFile != null) {
        source = policyFile;
      }
      plan = ParametersFromScenario.plan(policy, loaded.scenario());
    } catch (IllegalArgumentException e) {
      err.println("error: " + source + ": 1 problem");
      err.println("  " + (e.getMessage() != null ? e.getMessage() : "unusable values"));
      if (debug) {
        e.printStackTrace(err);
      }
      err.flush();
      return ExitCodes.BAD_INPUT;
    }

    try {
      int workers = threads != null ? threads : Runtime.getRuntime().availableProcessors();
      int total = study.paths().size() * study.replicates();
      Trajectory[][] runs;
      boolean showBar = !noProgress && System.console() != null;
      if (showBar) {
        try (ProgressBar bar = new ProgressBarBuilder().setTaskName("simulating")
            .setInitialMax(total).setStyle(ProgressBarStyle.ASCII).setUnit(" runs", 1)
            .showSpeed().build()) {
          runs = Ensemble.run(study, plan, workers, bar::step);
        }
      } else {
        AtomicInteger done = new AtomicInteger();
        runs = Ensemble.run(study, plan, workers, done::incrementAndGet);
      }
      List<String> pathNames = new ArrayList<>();
      study.paths().forEach(p -> pathNames.add(p.name()));

      if (showBar) {
        err.println("writing " + out.resolve("trajectories.csv") + " ...");
        err.flush();
      }
      Files.createDirectories(out);
      Path csv = out.resolve("trajectories.csv");
      Path json = out.resolve("run.json");
      Trajectory[][] written = runs;
      Instant finished = Instant.now();
      String provenance = provenance(loaded, policy, pathNames, study, workers, started,
          finished);
      Map<Path, IoConsumer<OutputStream>> files = new LinkedHashMap<>();
      files.put(csv, AtomicFiles.text(
          w -> TrajectoryCsv.write(w, study.parameters(), pathNames, written)));
      files.put(json, AtomicFiles.text(w -> w.write(provenance)));
      Path plots = out.resolve("plots");
      boolean plotsExisted = Files.isDirectory(plots);
      if (!noPlots) {
        Files.createDirectories(plots);
        TrajectoryPlots.charts(study.parameters(), pathNames, written, policy.name())
            .forEach((name, chart) -> files.put(plots.resolve(name), chart));
      }
      try {
        AtomicFiles.writeAllStreams(files);
      } catch (IOException | RuntimeException e) {
        if (!plotsExisted) {
          deleteIfEmpty(plots);
        }
        throw e;
      }

      stdout.println(SimulationSummary.format(study.parameters(), pathNames, runs,
          policy.name()));
      Seasons seasons = study.seasons();
      stdout.printf(Locale.ROOT, "Model years run from %s (the start of the rains); year Y is "
          + "the season that starts in Y. Early-dry burns in %s, late-dry burns in %s.%n",
          Seasons.monthName(seasons.firstMonth()), Seasons.monthName(seasons.earlyBurnMonth()),
          Seasons.monthName(seasons.lateBurnMonth()));
      stdout.printf(Locale.ROOT, "Wrote %s (%d runs), %s%s in %.1f s.%n", csv, total, json,
          noPlots ? "" : " and the charts in " + out.resolve("plots"),
          Duration.between(started, finished).toMillis() / 1000.0);
      stdout.println();
      stdout.println(Cautions.TEXT);
      stdout.flush();
      return ExitCodes.OK;
    } catch (IOException e) {
      err.println("error: could not write to " + out + ": " + e.getMessage());
      // Say where a previous result is if it could not be put back (see AtomicFiles.writeAll).
      for (Throwable note : e.getSuppressed()) {
        err.println("  " + note.getMessage());
      }
      if (debug) {
        e.printStackTrace(err);
      }
      return ExitCodes.FAILURE;
    } catch (RuntimeException e) {
      // The model's message names the climate path, replicate and seed of the failed run.
      err.println("error: the simulation failed: "
          + (e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName()));
      err.println("Scenario " + scenarioFile + ", seed " + study.seed() + ". To reproduce it"
          + (debug ? ":" : ", rerun with --debug for the stack trace:"));
      err.println("  " + reproduction(study));
      err.println("and report it with the scenario" + (policyFile != null ? " and policy" : "")
          + " file.");
      if (debug) {
        e.printStackTrace(err);
      }
      err.flush();
      return ExitCodes.FAILURE;
    }
  }

  /**
   * The command line that repeats this run with a stack trace: the same scenario, policy and
   * climate path, and the seed and number of replicates actually used (a replicate's random
   * numbers depend only on the seed, its path and its number).
   */
  private String reproduction(Study study) {
    List<String> words = new ArrayList<>(List.of("veldplan", "simulate",
        quoted(scenarioFile.toString())));
    if (policyFile != null) {
      words.addAll(List.of("--policy", quoted(policyFile.toString())));
    }
    if (pathName != null) {
      words.addAll(List.of("--path", quoted(pathName)));
    }
    words.addAll(List.of("--replicates", Integer.toString(study.replicates()),
        "--seed", Long.toString(study.seed()), "--out", quoted(out.toString()), "--debug"));
    return String.join(" ", words);
  }

  /** A word for a POSIX shell: as is if plain, else in single quotes. */
  private static String quoted(String word) {
    if (!word.isEmpty() && word.matches("[A-Za-z0-9_./:=+,@%-]+")) {
      return word;
    }
    return "'" + word.replace("'", "'\\''") + "'";
  }

  /** Removes a folder this run created if it is still empty; leaves anything else alone. */
  private static void deleteIfEmpty(Path folder) {
    try {
      Files.deleteIfExists(folder);
    } catch (IOException e) {
      // Not empty, or not ours to remove: leave it.
    }
  }


  private String provenance(LoadedScenario loaded, Policy policy, List<String> pathNames,
      Study study, int workers, Instant started, Instant finished) throws IOException {
    ObjectMapper json = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    ObjectNode root = json.createObjectNode();
    root.put("tool", "veldplan");
    root.put("version", Main.version());
    root.put("command", "simulate");
    root.put("scenarioFile", loaded.file().toString());
    root.put("scenarioSha256", loaded.sha256());
    root.put("policy", policy.name());
    if (policyFile != null) {
      root.put("policyFile", policyFile.toString());
      root.put("policySha256", sha256(policyFile));
    }
    root.put("seed", study.seed());
    root.put("replicates", study.replicates());
    ArrayNode paths = root.putArray("climatePaths");
    pathNames.forEach(paths::add);
    root.put("startYear", study.parameters().startYear());
    root.put("modelYearStartsIn", Seasons.monthName(study.seasons().firstMonth()));
    root.put("earlyDryBurnMonth", Seasons.monthName(study.seasons().earlyBurnMonth()));
    root.put("lateDryBurnMonth", Seasons.monthName(study.seasons().lateBurnMonth()));
    root.put("horizonYears", study.parameters().years());
    root.put("threads", workers);
    root.put("randomNumbers", "counter-based SplitMix64 mixing; seed tree scenario > path > "
        + "replicate > process");
    root.put("java", System.getProperty("java.vm.name") + " " + System.getProperty("java.version"));
    root.put("started", started.toString());
    root.put("finished", finished.toString());
    ArrayNode files = root.putArray("files");
    files.add("trajectories.csv");
    if (!noPlots) {
      files.add("plots/");
    }
    root.put("cautions", Cautions.TEXT.replace(System.lineSeparator(), " "));
    return json.writeValueAsString(root) + "\n";
  }

  private static String sha256(Path file) throws IOException {
    try {
      MessageDigest digest = MessageDigest.getInstance("SHA-256");
      return HexFormat.of().formatHex(digest.digest(Files.readAllBytes(file)));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException(e);
    }
  }
}
