package veldplan.shared.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
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
