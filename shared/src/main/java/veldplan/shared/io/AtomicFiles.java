package veldplan.shared.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes output files atomically: a reader sees either the old file or the complete new one,
 * never a half-written file, and a failure while writing leaves the old file as it was.
 *
 * <p>The content goes to a temporary file in the target's directory (so that the final move
 * stays within one file system), is forced to disk, and is then moved over the target with
 * {@link StandardCopyOption#ATOMIC_MOVE}. On any failure the temporary file is deleted. If the
 * file system cannot move atomically, the {@link java.nio.file.AtomicMoveNotSupportedException}
 * is thrown rather than falling back to a non-atomic copy.
 *
 * <p>The temporary file is created with the default permissions of a new file (subject to the
 * umask), not the owner-only permissions of {@link Files#createTempFile}, so the result is as
 * readable as any other output.
 */
public final class AtomicFiles {

  /** Attempts at finding an unused temporary name before giving up. */
  private static final int NAME_ATTEMPTS = 100;

  private AtomicFiles() {}

  /**
   * Writes {@code target} atomically, in UTF-8, with what {@code content} writes.
   *
   * @param target  the file to create or replace; its directory must exist
   * @param content writes the file's content; it must not close the writer
   * @throws IOException if writing, forcing or moving fails, or {@code content} throws; the
   *                     previous {@code target}, if any, is then unchanged
   */
  public static void write(Path target, IoConsumer<Writer> content) throws IOException {
    writeAll(Map.of(target, content));
  }

  /**
   * Writes several files as one step: each is first written in full to a temporary file beside
   * its target and forced to disk; only when all are written are they moved into place. If any
   * content fails, every temporary file is deleted and no target is touched.
   *
   * @param contents target file and how to write it, in the order of the moves
   * @throws IOException if a file cannot be written or moved
   */
  public static void writeAll(Map<Path, IoConsumer<Writer>> contents) throws IOException {
    Map<Path, Path> temporaries = new LinkedHashMap<>();
    boolean moved = false;
    try {
      for (Map.Entry<Path, IoConsumer<Writer>> entry : contents.entrySet()) {
        Path absolute = entry.getKey().toAbsolutePath();
        Path directory = absolute.getParent();
        if (directory == null) {
          throw new IOException("target has no parent directory: " + entry.getKey());
        }
        Path temporary = createTemporary(directory, absolute.getFileName().toString());
        temporaries.put(absolute, temporary);
        try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
            StandardOpenOption.TRUNCATE_EXISTING)) {
          Writer writer = new BufferedWriter(
              Channels.newWriter(channel, StandardCharsets.UTF_8.newEncoder(), -1));
          entry.getValue().accept(writer);
          writer.flush();
          channel.force(true);
        }
      }
      for (Map.Entry<Path, Path> entry : temporaries.entrySet()) {
        if (Files.isDirectory(entry.getKey())) {
          throw new IOException(entry.getKey() + " is a folder, not a file");
        }
      }
      for (Map.Entry<Path, Path> entry : temporaries.entrySet()) {
        Files.move(entry.getValue(), entry.getKey(), StandardCopyOption.ATOMIC_MOVE,
            StandardCopyOption.REPLACE_EXISTING);
      }
      moved = true;
    } finally {
      if (!moved) {
        for (Path temporary : temporaries.values()) {
          try {
            Files.deleteIfExists(temporary);
          } catch (IOException | RuntimeException e) {
            // The original failure matters more; the leftover name starts with a dot.
          }
        }
      }
    }
    for (Path target : temporaries.keySet()) {
      forceDirectory(target.getParent());
    }
  }

  /** Writes {@code text} to {@code target} atomically, in UTF-8. */
  public static void writeString(Path target, String text) throws IOException {
    write(target, writer -> writer.write(text));
  }

  /** Creates an empty, hidden temporary file next to the target, with a random suffix. */
  private static Path createTemporary(Path directory, String targetName) throws IOException {
    for (int attempt = 0; attempt < NAME_ATTEMPTS; attempt++) {
      String name = String.format(Locale.ROOT, ".%s.%016x.tmp", targetName,
          ThreadLocalRandom.current().nextLong());
      try {
        return Files.createFile(directory.resolve(name));
      } catch (FileAlreadyExistsException e) {
        // Try another name.
      }
    }
    throw new IOException("could not create a temporary file for " + targetName + " in "
        + directory);
  }

  /**
   * Forces the directory entry of the move to disk where the platform allows it (Linux and
   * macOS); elsewhere opening a directory fails and the move's durability is left to the OS.
   */
  private static void forceDirectory(Path directory) {
    try (FileChannel channel = FileChannel.open(directory, StandardOpenOption.READ)) {
      channel.force(true);
    } catch (IOException | RuntimeException e) {
      // Not supported on this platform: the file itself is already complete and in place.
    }
  }
}
