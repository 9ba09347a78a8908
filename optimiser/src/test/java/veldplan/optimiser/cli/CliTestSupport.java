package veldplan.optimiser.cli;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.Charset;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

/**
 * Helpers for the command-line tests: running {@link Main#execute} in-process with its standard
 * output and error captured, finding the repository's {@code examples/} folder, hashing files and
 * splitting CSV lines.
 */
final class CliTestSupport {

  private CliTestSupport() {}

  /** What one in-process run of the command line did. */
  record Result(int exitCode, String out, String err) {
    /** Both streams, for assertion messages. */
    String transcript() {
      return "exit " + exitCode + "\n--- stdout ---\n" + out + "\n--- stderr ---\n" + err;
    }
  }

  /**
   * Runs the command line in-process. {@link Main#execute} builds its own {@code CommandLine},
   * whose writers wrap {@link System#out} and {@link System#err} when first used, so both are
   * redirected for the duration of the call and restored afterwards. Synchronized because the
   * redirection is global.
   */
  static synchronized Result run(String... args) {
    PrintStream oldOut = System.out;
    PrintStream oldErr = System.err;
    Charset charset = Charset.defaultCharset();
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code;
    try (PrintStream newOut = new PrintStream(out, true, charset);
        PrintStream newErr = new PrintStream(err, true, charset)) {
      System.setOut(newOut);
      System.setErr(newErr);
      code = Main.execute(args);
      newOut.flush();
      newErr.flush();
    } finally {
      System.setOut(oldOut);
      System.setErr(oldErr);
    }
    return new Result(code, out.toString(charset), err.toString(charset));
  }

  /**
   * The repository root: the nearest folder, from the working directory upwards, that holds
   * both {@code examples/} and {@code pom.xml} (tests run with the module folder as working
   * directory, but this does not depend on it).
   */
  static Path repoRoot() {
    Path dir = Path.of("").toAbsolutePath();
    while (dir != null) {
      if (Files.isDirectory(dir.resolve("examples"))
          && Files.isRegularFile(dir.resolve("pom.xml"))) {
        return dir;
      }
      dir = dir.getParent();
    }
    throw new AssertionError("no folder holding examples/ and pom.xml above "
        + Path.of("").toAbsolutePath());
  }

  /** {@code examples/} in the repository root. */
  static Path examplesDir() {
    return repoRoot().resolve("examples");
  }

  /** A file under {@code examples/}, checked to exist. */
  static Path example(String first, String... more) {
    Path file = examplesDir().resolve(Path.of(first, more));
    assertTrue(Files.isRegularFile(file), "example file missing: " + file);
    return file;
  }

  /** A test resource of this module as a file path. */
  static Path resource(String name) {
    URL url = CliTestSupport.class.getResource("/" + name);
    assertNotNull(url, "test resource missing: " + name);
    try {
      return Path.of(url.toURI());
    } catch (URISyntaxException e) {
      throw new AssertionError(e);
    }
  }

  /** Lower-case hex SHA-256 of a file's bytes, computed independently of the tool. */
  static String sha256(Path file) throws IOException {
    try {
      MessageDigest digest = MessageDigest.getInstance("SHA-256");
      return HexFormat.of().formatHex(digest.digest(Files.readAllBytes(file)));
    } catch (NoSuchAlgorithmException e) {
      throw new AssertionError(e);
    }
  }

  /** Splits one CSV line into cells (RFC 4180 quoting; no line breaks inside cells). */
  static List<String> cells(String line) {
    List<String> cells = new ArrayList<>();
    StringBuilder cell = new StringBuilder();
    boolean quoted = false;
    for (int i = 0; i < line.length(); i++) {
      char c = line.charAt(i);
      if (quoted) {
        if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
          cell.append('"');
          i++;
        } else if (c == '"') {
          quoted = false;
        } else {
          cell.append(c);
        }
      } else if (c == '"') {
        quoted = true;
      } else if (c == ',') {
        cells.add(cell.toString());
        cell.setLength(0);
      } else {
        cell.append(c);
      }
    }
    cells.add(cell.toString());
    return cells;
  }
}
