package veldplan.shared.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

  @TempDir
  Path dir;

  private List<String> names() throws IOException {
    try (Stream<Path> files = Files.list(dir)) {
      return files.map(p -> p.getFileName().toString()).sorted().collect(Collectors.toList());
    }
  }

  @Test
  void writeString_newFile_contentInUtf8() throws IOException {
    Path target = dir.resolve("out.csv");
    AtomicFiles.writeString(target, "year,\u00b0C\n");

    assertEquals("year,\u00b0C\n", Files.readString(target, StandardCharsets.UTF_8));
    assertEquals(List.of("out.csv"), names());
  }

  @Test
  void writeAll_secondContentFails_neitherTargetTouchedAndNoTemporaryLeft() throws IOException {
    Path first = dir.resolve("trajectories.csv");
    Path second = dir.resolve("run.json");
    Files.writeString(first, "old csv");
    Files.writeString(second, "old json");
    Map<Path, IoConsumer<Writer>> contents = new LinkedHashMap<>();
    contents.put(first, w -> w.write("new csv"));
    contents.put(second, w -> {
      w.write("half");
      throw new IOException("disk full");
    });
    assertThrows(IOException.class, () -> AtomicFiles.writeAll(contents));
    assertEquals("old csv", Files.readString(first));
    assertEquals("old json", Files.readString(second));
    try (Stream<Path> files = Files.list(dir)) {
      assertEquals(2, files.count(), "temporary files left behind");
    }
  }

  @Test
  void writeAll_bothContentsFine_bothReplaced() throws IOException {
    Path first = dir.resolve("a.txt");
    Path second = dir.resolve("b.txt");
    Files.writeString(first, "old a");
    Map<Path, IoConsumer<Writer>> contents = new LinkedHashMap<>();
    contents.put(first, w -> w.write("new a"));
    contents.put(second, w -> w.write("new b"));
    AtomicFiles.writeAll(contents);
    assertEquals("new a", Files.readString(first));
    assertEquals("new b", Files.readString(second));
    assertEquals(List.of("a.txt", "b.txt"), names(), "temporary or backup files left behind");
  }

  // ---------------------------------------------------------------------------------------------
  // A move fails part-way through writeAll: the targets are put back as they were.

  /** Which move fails, and what the test then sees. */
  private static class FailingMover implements AtomicFiles.Mover {
    private final String failingTarget;
    private final String failingSourceEnding;
    final IOException failure = new IOException("move failed (simulated)");
    final List<String> moves = new ArrayList<>();

    /**
     * Fails the move whose target is named {@code target} (null: none) and whose source's name
     * ends with {@code sourceEnding}.
     */
    FailingMover(String target, String sourceEnding) {
      this.failingTarget = target;
      this.failingSourceEnding = sourceEnding;
    }

    @Override
    public void move(Path source, Path target) throws IOException {
      moves.add(source.getFileName() + " -> " + target.getFileName());
      if (target.getFileName().toString().equals(failingTarget)
          && source.getFileName().toString().endsWith(failingSourceEnding)) {
        throw failure;
      }
      AtomicFiles.atomicMove(source, target);
    }
  }

  private static Map<Path, IoConsumer<Writer>> newContents(Path... targets) {
    Map<Path, IoConsumer<Writer>> contents = new LinkedHashMap<>();
    for (Path target : targets) {
      contents.put(target, w -> w.write("new " + target.getFileName()));
    }
    return contents;
  }

  @Test
  void writeAll_secondMoveFails_bothOldFilesIntactAndNothingLeftBehind() throws IOException {
    Path first = dir.resolve("trajectories.csv");
    Path second = dir.resolve("run.json");
    Files.writeString(first, "old csv");
    Files.writeString(second, "old json");
    FailingMover mover = new FailingMover("run.json", ".tmp");

    IOException thrown = assertThrows(IOException.class,
        () -> AtomicFiles.writeAll(newContents(first, second), mover));

    assertSame(mover.failure, thrown);
    assertTrue(movedIn(mover, "trajectories.csv"),
        "the first new file was never moved in, so the test proves nothing: " + mover.moves);
    assertEquals("old csv", Files.readString(first));
    assertEquals("old json", Files.readString(second));
    assertEquals(List.of("run.json", "trajectories.csv"), names(),
        "temporary or backup files left behind");
  }

  @Test
  void writeAll_middleOfThreeMovesFails_allOldFilesIntactAndNothingLeftBehind()
      throws IOException {
    Path a = Files.writeString(dir.resolve("a.txt"), "old a");
    Path b = Files.writeString(dir.resolve("b.txt"), "old b");
    Path c = Files.writeString(dir.resolve("c.txt"), "old c");
    FailingMover mover = new FailingMover("b.txt", ".tmp");

    assertThrows(IOException.class, () -> AtomicFiles.writeAll(newContents(a, b, c), mover));

    assertTrue(movedIn(mover, "a.txt"), "a.txt was never replaced: " + mover.moves);
    assertEquals("old a", Files.readString(a));
    assertEquals("old b", Files.readString(b));
    assertEquals("old c", Files.readString(c));
    assertEquals(List.of("a.txt", "b.txt", "c.txt"), names());
  }

  @Test
  void writeAll_secondMoveFailsAndFirstTargetWasNew_firstRemovedAgain() throws IOException {
    Path first = dir.resolve("trajectories.csv");
    Path second = Files.writeString(dir.resolve("run.json"), "old json");
    FailingMover mover = new FailingMover("run.json", ".tmp");

    assertThrows(IOException.class,
        () -> AtomicFiles.writeAll(newContents(first, second), mover));

    assertTrue(movedIn(mover, "trajectories.csv"), "never moved in: " + mover.moves);
    assertFalse(Files.exists(first), "the new trajectories.csv was left without its run.json");
    assertEquals("old json", Files.readString(second));
    assertEquals(List.of("run.json"), names());
  }

  @Test
  void writeAll_movingAnOldFileAsideFails_nothingChangedAndNothingLeftBehind()
      throws IOException {
    Path a = Files.writeString(dir.resolve("a.txt"), "old a");
    Path b = Files.writeString(dir.resolve("b.txt"), "old b");
    Path c = Files.writeString(dir.resolve("c.txt"), "old c");
    FailingMover mover = new FailingMover(null, "") {
      @Override
      public void move(Path source, Path target) throws IOException {
        if (source.getFileName().toString().equals("b.txt")) {
          throw failure;
        }
        super.move(source, target);
      }
    };

    assertThrows(IOException.class, () -> AtomicFiles.writeAll(newContents(a, b, c), mover));

    assertEquals("old a", Files.readString(a));
    assertEquals("old b", Files.readString(b));
    assertEquals("old c", Files.readString(c));
    assertEquals(List.of("a.txt", "b.txt", "c.txt"), names());
  }

  @Test
  void writeAll_puttingBackFailsToo_backupKeptAndNamedInTheException() throws IOException {
    Path first = Files.writeString(dir.resolve("trajectories.csv"), "old csv");
    Path second = Files.writeString(dir.resolve("run.json"), "old json");
    FailingMover mover = new FailingMover("run.json", ".tmp") {
      @Override
      public void move(Path source, Path target) throws IOException {
        if (source.getFileName().toString().endsWith(".bak")) {
          throw new IOException("restore failed (simulated)");
        }
        super.move(source, target);
      }
    };

    IOException thrown = assertThrows(IOException.class,
        () -> AtomicFiles.writeAll(newContents(first, second), mover));

    assertSame(mover.failure, thrown);
    List<Path> backups;
    try (Stream<Path> files = Files.list(dir)) {
      backups = files.filter(p -> p.getFileName().toString().endsWith(".bak")).toList();
    }
    assertEquals(1, backups.size(), "expected the one backup kept: " + names());
    assertTrue(backups.get(0).getFileName().toString().startsWith("."), "backup not hidden");
    assertEquals("old csv", Files.readString(backups.get(0)), "backup content");
    assertEquals(1, thrown.getSuppressed().length, "suppressed: "
        + Arrays.toString(thrown.getSuppressed()));
    String note = thrown.getSuppressed()[0].getMessage();
    assertTrue(note.contains(first.toString()) && note.contains(backups.get(0).toString()),
        "the exception does not say where the previous file is: " + note);
    assertEquals("old json", Files.readString(second));
    assertFalse(names().stream().anyMatch(n -> n.endsWith(".tmp")), "temporaries left: "
        + names());
  }

  @Test
  void writeAll_secondTargetIsNonEmptyFolder_firstOldFileIntactAndNothingLeftBehind()
      throws IOException {
    Path first = Files.writeString(dir.resolve("trajectories.csv"), "old csv");
    Path second = Files.createDirectory(dir.resolve("run.json"));
    Files.writeString(second.resolve("inside.txt"), "keep");

    IOException thrown = assertThrows(IOException.class,
        () -> AtomicFiles.writeAll(newContents(first, second)));

    assertTrue(thrown.getMessage().contains(second.toString()), thrown.getMessage());
    assertEquals("old csv", Files.readString(first));
    assertEquals("keep", Files.readString(second.resolve("inside.txt")));
    assertEquals(List.of("run.json", "trajectories.csv"), names());
  }

  /** Whether the mover moved a new (temporary) file onto {@code target}. */
  private static boolean movedIn(FailingMover mover, String target) {
    return mover.moves.stream().anyMatch(m -> m.endsWith(".tmp -> " + target));
  }

  @Test
  void write_existingFile_replaced() throws IOException {
    Path target = dir.resolve("out.csv");
    Files.writeString(target, "old content that is longer than the new\n");
    AtomicFiles.write(target, w -> {
      w.write("new");
      w.write('\n');
    });

    assertEquals("new\n", Files.readString(target));
    assertEquals(List.of("out.csv"), names());
  }

  @Test
  void write_writerThrowsIoException_oldFileIntactAndNoTemporaryLeft() throws IOException {
    Path target = dir.resolve("front.csv");
    Files.writeString(target, "previous result\n");
    IOException failure = new IOException("disk full (simulated)");

    IOException thrown = assertThrows(IOException.class, () -> AtomicFiles.write(target, w -> {
      w.write("half a line".repeat(10_000));   // more than the writer's buffer
      throw failure;
    }));

    assertSame(failure, thrown);
    assertEquals("previous result\n", Files.readString(target));
    assertEquals(List.of("front.csv"), names());
  }

  @Test
  void write_writerThrowsRuntimeException_oldFileIntactAndNoTemporaryLeft() throws IOException {
    Path target = dir.resolve("front.csv");
    Files.writeString(target, "previous result\n");

    assertThrows(IllegalStateException.class, () -> AtomicFiles.write(target, w -> {
      w.write("partial");
      throw new IllegalStateException("bug in the writer (simulated)");
    }));

    assertEquals("previous result\n", Files.readString(target));
    assertEquals(List.of("front.csv"), names());
  }

  @Test
  void write_failureWithoutPreviousFile_nothingCreated() throws IOException {
    Path target = dir.resolve("new.csv");

    assertThrows(IOException.class, () -> AtomicFiles.write(target, w -> {
      throw new IOException("simulated");
    }));

    assertFalse(Files.exists(target));
    assertEquals(List.of(), names());
  }

  @Test
  void write_missingDirectory_throwsAndCreatesNothing() throws IOException {
    Path target = dir.resolve("no-such-dir").resolve("out.csv");

    assertThrows(IOException.class, () -> AtomicFiles.writeString(target, "x"));
    assertEquals(List.of(), names());
  }
}
