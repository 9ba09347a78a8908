package veldplan.optimiser.cli;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicLong;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import veldplan.objectives.Objective;
import veldplan.objectives.PathStep;
import veldplan.optimiser.park.Limit;
import veldplan.optimiser.park.PolicyRunException;
import veldplan.optimiser.park.PolicySearch;
import veldplan.optimiser.report.FrontEntry;
import veldplan.optimiser.report.FrontPlots;
import veldplan.optimiser.report.FrontReport;
import veldplan.optimiser.report.PolicyFile;
import veldplan.optimiser.search.GenerationReport;
import veldplan.optimiser.search.SearchResult;
import veldplan.optimiser.search.SearchState;
import veldplan.shared.io.AtomicFiles;
import veldplan.shared.io.IoConsumer;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Optimisation;
import veldplan.shared.scenario.OverPaths;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioException;
import veldplan.shared.scenario.ScenarioReader;
import veldplan.shared.scenario.SearchSettings;

/** {@code veldplan optimise}: searches the Pareto front of management policies. */
@Command(name = "optimise", aliases = "optimize", mixinStandardHelpOptions = true,
    description = {
        "Searches the management policies of a scenario (the levers and bounds of",
        "its optimisation section) with NSGA-II on every climate path and replicate,",
        "then scores the Pareto front on fresh replicates and picks the",
        "minimum-input policy that meets the thresholds."},
    footer = {"",
        "Writes OUT/front.csv, OUT/front.json, OUT/run.json, one policy file per",
        "front policy in OUT/policies/ (usable with simulate --policy) and the front",
        "charts in OUT/plots/. While it runs, OUT/checkpoint.json holds the last",
        "generation: an interrupted run continues with --resume.",
        "Exit status: 0 done, 1 failure, 2 bad input (nothing written)."})
public final class OptimiseCommand implements Callable<Integer> {
  /** Format tag of checkpoint files. */
  static final String CHECKPOINT_FORMAT = "veldplan-optimise-checkpoint/1";

  @Spec
  CommandSpec spec;

  @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file with an"
      + " optimisation section (.yaml or .json).")
  Path scenarioFile;

  @Option(names = "--out", paramLabel = "DIR", required = true, description = "Output folder.")
  Path out;

  @Option(names = "--generations", paramLabel = "N",
      description = "Generations after the first (default: the scenario's).")
  Integer generations;

  @Option(names = "--population", paramLabel = "N",
      description = "Policies per generation, even (default: the scenario's).")
  Integer population;

  @Option(names = "--replicates", paramLabel = "N",
      description = "Replicates per climate path in the search (default: the scenario's).")
  Integer replicates;

  @Option(names = "--validation-replicates", paramLabel = "N",
      description = "Fresh replicates per path for scoring the front (default: the scenario's).")
  Integer validationReplicates;

  @Option(names = "--over-paths", paramLabel = "RULE",
      description = "Aggregation over climate paths: mean, worst, or pNN for the NN-th"
          + " percentile on the worse side (default: the scenario's).")
  String overPaths;

  @Option(names = "--seed", paramLabel = "S",
      description = "Scenario seed (default: the scenario's); it also seeds the search.")
  Long seed;

  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads (default: all cores). Results do not depend on it.")
  Integer threads;

  @Option(names = "--resume", description = "Continue the interrupted run whose checkpoint is"
      + " in OUT.")
  boolean resume;

  @Option(names = "--no-progress", description = "Do not show progress.")
  boolean noProgress;

  @Option(names = "--no-plots", description = "Do not draw the front charts in OUT/plots/.")
  boolean noPlots;

  @Option(names = "--debug", description = "Show stack traces of failures.")
  boolean debug;

  private static final ObjectMapper JSON = new ObjectMapper()
      .enable(SerializationFeature.INDENT_OUTPUT)
      .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

  @Override
  public Integer call() {
    PrintWriter err = spec.commandLine().getErr();
    PrintWriter stdout = spec.commandLine().getOut();
    Instant started = Instant.now();
    List<String> problems = new ArrayList<>();
    CommandLineProblems.range(problems, "--generations", generations, 0, 100_000);
    CommandLineProblems.range(problems, "--population", population, 4, 100_000);
    if (population != null && population % 2 != 0) {
      problems.add("--population: " + population + " is odd (expected an even number: parents"
          + " are paired)");
    }
    CommandLineProblems.range(problems, "--replicates", replicates, 1, 100_000);
    CommandLineProblems.range(problems, "--validation-replicates", validationReplicates, 1,
        100_000);
    CommandLineProblems.range(problems, "--threads", threads, 1, 1024);
    PathStep overPathsRule = null;
    if (overPaths != null) {
      overPathsRule = parseOverPaths(overPaths);
      if (overPathsRule == null) {
        problems.add("--over-paths: \"" + overPaths + "\" (expected mean, worst, or pNN with"
            + " 0 <= NN <= 100, e.g. p90)");
      }
    }
    Path checkpointFile = out.resolve("checkpoint.json");
    if (Files.exists(out) && !Files.isDirectory(out)) {
      problems.add("--out: " + out + " exists and is not a folder (expected a folder to write"
          + " into, or a name for a new one)");
    } else if (resume && !Files.isRegularFile(checkpointFile)) {
      problems.add("--resume: " + checkpointFile + " does not exist (expected the checkpoint of"
          + " an interrupted run in the --out folder)");
    } else if (!resume && Files.isRegularFile(checkpointFile)) {
      problems.add("--out: " + out + " holds an unfinished run (" + checkpointFile + "): continue"
          + " it with --resume, or choose another --out");
    }
    if (!problems.isEmpty()) {
      return CommandLineProblems.report(err, problems);
    }

    LoadedScenario loaded;
    try {
      loaded = ScenarioReader.load(scenarioFile);
    } catch (ScenarioException e) {
      err.println(e.report());
      err.flush();
      return ExitCodes.BAD_INPUT;
    }
    Scenario sc = loaded.scenario();
    if (sc.optimisation() == null) {
      err.println("error: " + scenarioFile + ": 1 problem");
      err.println("  /optimisation: missing (expected an optimisation section with objectives,"
          + " overPaths, constraints, levers and search; see examples/README.md)");
      err.flush();
      return ExitCodes.BAD_INPUT;
    }

    // Settings: command line over checkpoint over scenario.
    Checkpoint checkpoint = null;
    if (resume) {
      try {
        checkpoint = JSON.readValue(checkpointFile.toFile(), Checkpoint.class);
      } catch (IOException | RuntimeException e) {
        err.println("error: " + checkpointFile + ": not a readable checkpoint ("
            + e.getMessage().lines().findFirst().orElse("") + ")");
        err.flush();
        return ExitCodes.BAD_INPUT;
      }
      if (!CHECKPOINT_FORMAT.equals(checkpoint.format())) {
        return CommandLineProblems.report(err, List.of(checkpointFile + ": format \""
            + checkpoint.format() + "\" (expected \"" + CHECKPOINT_FORMAT + "\")"));
      }
    }
    Optimisation o = sc.optimisation();
    SearchSettings base = checkpoint != null ? checkpoint.search() : o.search();
    SearchSettings search = new SearchSettings(
        population != null ? population : base.population(),
        generations != null ? generations : base.generations(),
        replicates != null ? replicates : base.replicates(),
        validationReplicates != null ? validationReplicates : base.validationReplicates());
    long runSeed = seed != null ? seed : checkpoint != null ? checkpoint.seed()
        : sc.stochastic().seed();
    PathStep pathStep = overPathsRule != null ? overPathsRule
        : checkpoint != null ? parseOverPaths(checkpoint.overPaths())
        : new PathStep(o.overPaths(), o.pathPercentile() == null ? Double.NaN
            : o.pathPercentile());
    if (search.population() % 2 != 0) {
      return CommandLineProblems.report(err, List.of(scenarioFile
          + ": /optimisation/search/population: " + search.population()
          + " is odd (expected an even number: parents are paired)"));
    }
    if (checkpoint != null) {
      List<String> mismatch = new ArrayList<>();
      if (!checkpoint.scenarioSha256().equals(loaded.sha256())) {
        mismatch.add("the scenario file changed since the checkpoint was written (SHA-256 "
            + checkpoint.scenarioSha256().substring(0, 12) + "... then, "
            + loaded.sha256().substring(0, 12) + "... now)");
      }
      SearchSettings was = checkpoint.search();
      if (was.population() != search.population() || was.replicates() != search.replicates()
          || checkpoint.seed() != runSeed
          || !checkpoint.overPaths().equals(describe(pathStep))) {
        mismatch.add("population, replicates, seed and --over-paths must stay as they were"
            + " (checkpoint: population " + was.population() + ", replicates "
            + was.replicates() + ", seed " + checkpoint.seed() + ", over paths "
            + checkpoint.overPaths() + ")");
      }
      if (search.generations() < checkpoint.state().generation()) {
        mismatch.add("--generations " + search.generations() + " is below the "
            + checkpoint.state().generation() + " generations already done");
      }
      if (!mismatch.isEmpty()) {
        List<String> lines = new ArrayList<>();
        mismatch.forEach(m -> lines.add("--resume: " + m));
        return CommandLineProblems.report(err, lines);
      }
    }
    int workers = threads != null ? threads : Runtime.getRuntime().availableProcessors();
    PolicySearch.Settings settings = new PolicySearch.Settings(search.population(),
        search.generations(), search.replicates(), search.validationReplicates(), runSeed,
        pathStep, workers);

    PolicySearch run;
    try {
      run = new PolicySearch(loaded, settings);
    } catch (IllegalArgumentException e) {
      err.println("error: " + scenarioFile + ": 1 problem");
      err.println("  " + (e.getMessage() != null ? e.getMessage() : "unusable values"));
      if (debug) {
        e.printStackTrace(err);
      }
      err.flush();
      return ExitCodes.BAD_INPUT;
    }

    boolean bar = !noProgress && System.console() != null;
    boolean log = !noProgress && !bar;
    try (run) {
      Files.createDirectories(out);
      String sha = loaded.sha256();
      String over = describe(pathStep);
      SearchResult result;
      Instant searchStart = Instant.now();
      long totalGenerations = search.generations();
      err.printf(Locale.ROOT, "Searching: %d policies x %d generations, %d climate paths x %d"
          + " replicates each, %d genes, %d threads.%n", search.population(),
          search.generations() + 1, run.study().paths().size(), search.replicates(),
          run.space().size(), workers);
      err.flush();
      ProgressBar progress = bar ? new ProgressBarBuilder().setTaskName("generation")
          .setInitialMax(totalGenerations + 1).setStyle(ProgressBarStyle.ASCII)
          .setUnit(" gen", 1).build() : null;
      if (progress != null && checkpoint != null) {
        progress.stepTo(checkpoint.state().generation() + 1);
      }
      CheckpointWriter checkpoints = new CheckpointWriter(checkpointFile);
      try {
        AtomicLong lastEvaluations = new AtomicLong(
            checkpoint == null ? 0 : checkpoint.state().evaluations());
        AtomicLong lastNanos = new AtomicLong(System.nanoTime());
        result = run.search(checkpoint == null ? null : checkpoint.state(), () -> { },
            (report, state) -> {
              Checkpoint c = new Checkpoint(CHECKPOINT_FORMAT, sha, search, runSeed, over, state);
              checkpoints.write(() -> checkpointJson(c));
              long now = System.nanoTime();
              double rate = (report.evaluations() - lastEvaluations.getAndSet(
                  report.evaluations())) / Math.max(1e-9, (now - lastNanos.getAndSet(now)) / 1e9);
              if (progress != null) {
                progress.stepTo(report.generation() + 1);
                progress.setExtraMessage(String.format(Locale.ROOT, "%.0f eval/s, front %d,"
                    + " HV %.3f", rate, report.feasibleArchiveSize(), report.hypervolume()));
              } else if (log) {
                err.println("generation " + (report.generation()) + "/" + report.generations()
                    + ": " + progressLine(report, rate));
                err.flush();
              }
            });
      } finally {
        checkpoints.close();
        if (progress != null) {
          progress.close();
        }
      }
      Duration searchTime = Duration.between(searchStart, Instant.now());

      List<Policy> front = run.front(result);
      long checkRuns = run.validationRuns(front.size());
      err.printf(Locale.ROOT, "Scoring %d front policies and 2 reference policies on %d fresh"
          + " replicates per path (%d runs).%n", front.size(), search.validationReplicates(),
          checkRuns);
      err.flush();
      Instant checkStart = Instant.now();
      FrontReport report;
      if (bar) {
        try (ProgressBar p = new ProgressBarBuilder().setTaskName("scoring")
            .setInitialMax(checkRuns).setStyle(ProgressBarStyle.ASCII).setUnit(" runs", 1)
            .showSpeed().build()) {
          report = run.validate(front, p::step);
        }
      } else {
        report = run.validate(front, () -> { });
      }
      Duration checkTime = Duration.between(checkStart, Instant.now());
      Instant finished = Instant.now();

      Map<Path, IoConsumer<OutputStream>> files = new LinkedHashMap<>();
      FrontReport written = report;
      files.put(out.resolve("front.csv"), AtomicFiles.text(written::writeCsv));
      String frontJson = report.json();
      files.put(out.resolve("front.json"), AtomicFiles.text(w -> w.write(frontJson)));
      String runJson = runJson(loaded, run, settings, result, report, searchTime, checkTime,
          started, finished);
      files.put(out.resolve("run.json"), AtomicFiles.text(w -> w.write(runJson)));
      Path policies = out.resolve("policies");
      Files.createDirectories(policies);
      Set<Path> policyFiles = new HashSet<>();
      for (FrontEntry e : report.front()) {
        Path file = policies.resolve(e.id() + ".yaml");
        policyFiles.add(file);
        String yaml = policyYaml(e, sc.name());
        files.put(file, AtomicFiles.text(w -> w.write(yaml)));
      }
      if (!noPlots) {
        Path plots = out.resolve("plots");
        Files.createDirectories(plots);
        FrontPlots.charts(report).forEach((name, chart) -> files.put(plots.resolve(name), chart));
      }
      AtomicFiles.writeAllStreams(files);
      removeStalePolicies(policies, policyFiles);
      Files.deleteIfExists(checkpointFile);

      stdout.print(report.text());
      stdout.println();
      stdout.printf(Locale.ROOT, "Search: %d evaluations (%d policies simulated), %.1f s, of"
          + " which %.1f %% outside the simulations; check on fresh replicates %.1f s.%n",
          result.evaluations(), result.simulatedEvaluations(), searchTime.toMillis() / 1000.0,
          100 * result.bookkeepingShare(), checkTime.toMillis() / 1000.0);
      stdout.printf(Locale.ROOT, "Wrote %s, %s, %s and %d policy files in %s.%n",
          out.resolve("front.csv"), out.resolve("front.json"), out.resolve("run.json"),
          policyFiles.size(), policies);
      stdout.println();
      stdout.println(Cautions.TEXT);
      stdout.flush();
      return ExitCodes.OK;
    } catch (IOException e) {
      err.println("error: could not write to " + out + ": " + e.getMessage());
      for (Throwable note : e.getSuppressed()) {
        err.println("  " + note.getMessage());
      }
      if (debug) {
        e.printStackTrace(err);
      }
      err.flush();
      return ExitCodes.FAILURE;
    } catch (RuntimeException e) {
      err.println("error: the search failed: "
          + (e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName()));
      writeFailedPolicy(e, out, scenarioFile, err);
      err.println("The last completed generation is in " + checkpointFile + "; rerun with"
          + " --resume" + (debug ? "" : " --debug for the stack trace") + ".");
      if (debug) {
        e.printStackTrace(err);
      }
      err.flush();
      return ExitCodes.FAILURE;
    }
  }

  /**
   * If a simulation failed behind {@code e}, writes its policy to {@code out/failed-policy.yaml}
   * and says how to repeat its runs; otherwise does nothing.
   *
   * @return the file written, or null
   */
  static Path writeFailedPolicy(Throwable e, Path out, Path scenarioFile, PrintWriter err) {
    PolicyRunException failed = policyRunFailure(e);
    if (failed == null) {
      return null;
    }
    Path file = out.resolve("failed-policy.yaml");
    String yaml = PolicyFile.yaml(failed.policy(), List.of(
        "The policy whose simulation failed during a veldplan search; see the message"
            + " printed with it.",
        "Repeat its runs with: veldplan simulate SCENARIO --policy THIS_FILE --out DIR --debug"));
    try {
      AtomicFiles.writeAllStreams(Map.of(file, AtomicFiles.text(w -> w.write(yaml))));
    } catch (IOException | RuntimeException io) {
      err.println("(could not write the failed policy to " + file + ": " + io.getMessage() + ")");
      return null;
    }
    err.println("The policy is in " + file + "; ./veldplan simulate " + scenarioFile
        + " --policy " + file + " --out DIR --debug repeats its runs.");
    return file;
  }

  /** The failed policy run behind {@code e}, if a simulation failed; otherwise null. */
  private static PolicyRunException policyRunFailure(Throwable e) {
    for (Throwable t = e; t != null; t = t.getCause()) {
      if (t instanceof PolicyRunException p) {
        return p;
      }
    }
    return null;
  }

  /** What a checkpoint file holds: the settings that must not change, and the search state. */
  record Checkpoint(String format, String scenarioSha256, SearchSettings search, long seed,
      String overPaths, SearchState state) {}

  private static String checkpointJson(Checkpoint c) {
    try {
      return JSON.writeValueAsString(c) + "\n";
    } catch (IOException e) {
      throw new IllegalStateException("could not write the checkpoint: " + e.getMessage(), e);
    }
  }

  static String progressLine(GenerationReport r, double evaluationsPerSecond) {
    double elapsed = r.elapsedNanos() / 1e9;
    int done = r.generation() + 1;
    int total = r.generations() + 1;
    double eta = done > 0 ? elapsed / done * (total - done) : Double.NaN;
    return String.format(Locale.ROOT, "%.0f eval/s, front %d%s, hypervolume %.4f, ETA %s",
        evaluationsPerSecond, r.feasibleArchiveSize(),
        r.feasibleArchiveSize() == 0 ? " (none feasible yet: " + r.archiveSize() + " closest)"
            : "", r.hypervolume(), clock(eta));
  }

  private static String clock(double seconds) {
    if (Double.isNaN(seconds)) {
      return "?";
    }
    long s = Math.round(seconds);
    return String.format(Locale.ROOT, "%d:%02d", s / 60, s % 60);
  }

  /** mean, worst, pNN. */
  static PathStep parseOverPaths(String text) {
    if (text.equals("mean")) {
      return PathStep.MEAN;
    }
    if (text.equals("worst")) {
      return PathStep.WORST;
    }
    if (text.matches("p\\d{1,3}(\\.\\d+)?")) {
      double q = Double.parseDouble(text.substring(1));
      return q <= 100 ? new PathStep(OverPaths.PERCENTILE, q) : null;
    }
    return null;
  }

  /** The inverse of {@link #parseOverPaths}. */
  static String describe(PathStep step) {
    switch (step.kind()) {
      case MEAN:
        return "mean";
      case WORST:
        return "worst";
      default:
        double q = step.percentile();
        return "p" + (q == Math.rint(q) ? Long.toString((long) q) : Double.toString(q));
    }
  }



  private static void removeStalePolicies(Path folder, Set<Path> keep) throws IOException {
    try (DirectoryStream<Path> files = Files.newDirectoryStream(folder, "P*.yaml")) {
      for (Path f : files) {
        if (!keep.contains(f)) {
          Files.deleteIfExists(f);
        }
      }
    }
  }

  private static String policyYaml(FrontEntry e, String scenarioName) {
    return PolicyFile.yaml(e.policy(), List.of("Policy " + e.id() + " of a veldplan search on \""
        + scenarioName + "\" (see front.csv and front.json beside this folder).",
        "Simulate it with: veldplan simulate SCENARIO --policy THIS_FILE --out DIR", "",
        Cautions.TEXT));
  }

  private String runJson(LoadedScenario loaded, PolicySearch run, PolicySearch.Settings s,
      SearchResult result, FrontReport report, Duration searchTime, Duration checkTime,
      Instant started, Instant finished) throws IOException {
    ObjectNode root = JSON.createObjectNode();
    root.put("tool", "veldplan");
    root.put("version", Main.version());
    root.put("command", "optimise");
    root.put("scenarioFile", loaded.file().toString());
    root.put("scenarioSha256", loaded.sha256());
    root.put("seed", s.seed());
    root.put("searchSeed", run.nsga2Settings().seed());
    ObjectNode search = root.putObject("search");
    search.put("algorithm", "NSGA-II (Deb et al. 2002): mu+lambda selection by non-dominated"
        + " sorting with constrained domination and per-front crowding distance; SBX and"
        + " polynomial mutation");
    search.put("population", s.population());
    search.put("generations", s.generations());
    search.put("crossoverProbability", run.nsga2Settings().crossoverProbability());
    search.put("crossoverEta", run.nsga2Settings().crossoverEta());
    search.put("mutationProbabilityPerGene", run.nsga2Settings().mutationProbability(
        run.space().size()));
    search.put("mutationEta", run.nsga2Settings().mutationEta());
    search.put("genes", run.space().size());
    ArrayNode genes = search.putArray("geneLabels");
    run.space().genes().forEach(g -> genes.add(g.label()));
    search.put("replicatesPerPath", s.replicates());
    search.put("validationReplicatesPerPath", s.validationReplicates());
    search.put("overPaths", s.pathStep().describe());
    search.put("costCeilingForNormalisation", run.costCeiling());
    search.put("hypervolumeReferencePoint", "1.1 in every normalised objective (0 = best, 1 ="
        + " worst plausible value)");
    ArrayNode objectives = search.putArray("objectives");
    List<Objective> measures = run.searchMeasures();
    for (int k = 0; k < report.objectives(); k++) {
      Objective m = measures.get(k);
      ObjectNode n = objectives.addObject();
      n.put("name", m.name());
      n.put("unit", m.unit());
      n.put("direction", m.direction().name().toLowerCase(Locale.ROOT));
      n.put("best", m.best());
      n.put("worst", m.worst());
    }
    ArrayNode thresholds = search.putArray("thresholds");
    for (Limit l : report.limits()) {
      ObjectNode n = thresholds.addObject();
      n.put("measure", report.measures().get(l.measure()).name());
      if (Double.isFinite(l.atLeast())) {
        n.put("atLeast", l.atLeast());
      }
      if (Double.isFinite(l.atMost())) {
        n.put("atMost", l.atMost());
      }
    }
    ObjectNode outcome = root.putObject("outcome");
    outcome.put("evaluations", result.evaluations());
    outcome.put("policiesSimulatedInSearch", result.simulatedEvaluations());
    outcome.put("archiveSize", result.archive().size());
    outcome.put("frontSize", report.front().size());
    FrontEntry pick = report.pick();
    if (pick == null) {
      outcome.putNull("minimumInputPolicy");
    } else {
      outcome.put("minimumInputPolicy", pick.id());
    }
    ObjectNode timing = root.putObject("timingSeconds");
    timing.put("search", searchTime.toMillis() / 1000.0);
    timing.put("searchInsideSimulations", result.evaluateNanos() / 1e9);
    timing.put("searchBookkeepingShare", result.bookkeepingShare());
    timing.put("validation", checkTime.toMillis() / 1000.0);
    root.put("threads", s.threads());
    root.put("randomNumbers", "replicates: counter-based SplitMix64 seed tree scenario > path"
        + " > replicate > process; search: generation g draws from (search seed, g)");
    root.put("java", System.getProperty("java.vm.name") + " "
        + System.getProperty("java.version"));
    root.put("started", started.toString());
    root.put("finished", finished.toString());
    ArrayNode files = root.putArray("files");
    files.add("front.csv");
    files.add("front.json");
    files.add("policies/");
    if (!noPlots) {
      files.add("plots/");
    }
    root.put("cautions", Cautions.TEXT.replace(System.lineSeparator(), " "));
    return JSON.writeValueAsString(root) + "\n";
  }

}
