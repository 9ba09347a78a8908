package veldplan.shared.io;

import java.io.BufferedOutputStream;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes output files atomically: a reader sees either the old file or the complete new one,
 * never a half-written file, and a failure while writing leaves the old file as it was.
 *
 * <p>The content goes to a temporary file in the target's directory (so that the final move
 * stays within one file system), is forced to disk, and is then moved over the target with
 * {@link StandardCopyOption#ATOMIC_MOVE}. On any failure the temporary file is deleted. If the
 * file system cannot move atomically, the {@link java.nio.file.AtomicMoveNotSupportedException}
 * is thrown rather than falling back to a non-atomic copy. {@link #writeAll} replaces several
 * files all or nothing, keeping backups of the previous files until every move has succeeded.
 * Temporary files and backups have hidden names (starting with a dot) next to their targets.
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
   * Writes several files as one step, all or nothing as far as the file system allows.
   *
   * <p>Each file is first written in full to a temporary file beside its target and forced to
   * disk; if any content fails, every temporary file is deleted and no target is touched. Then
   * each existing target but the last is moved aside to a hidden backup name in its own folder
   * (the last needs no backup: its move is the final step), and the new files are moved into
   * place. If any of these moves fails, the new files already moved in are removed, every backup
   * is moved back to its target, and the exception is thrown: the targets are then as they were
   * before the call. On success the backups are deleted.
   *
   * <p>Between moving an old file aside and moving its new one in, a reader may find that target
   * missing, but never half-written; once the call has returned, the targets are all new or all
   * as before. If putting a backup back fails as well (a failing disk, say), the backup is kept
   * and a suppressed exception of the one thrown names it.
   *
   * @param contents target file and how to write it, in the order of the moves
   * @throws IOException if a file cannot be written or moved
   * @throws IllegalArgumentException if two entries name the same target
   */
  public static void writeAll(Map<Path, IoConsumer<Writer>> contents) throws IOException {
    writeAll(contents, AtomicFiles::atomicMove);
  }

  /**
   * Moves one file to another name in the same folder, replacing what is there. Package-private
   * so that tests can make a chosen move fail.
   */
  @FunctionalInterface
  interface Mover {
    /** Moves {@code source} to {@code target} atomically, replacing {@code target}. */
    void move(Path source, Path target) throws IOException;
  }

  /** {@link #writeAll(Map)} with the moves made by {@code mover}. */
  static void writeAll(Map<Path, IoConsumer<Writer>> contents, Mover mover) throws IOException {
    writeAllStreams(asStreams(contents), mover);
  }

  /**
   * Like {@link #writeAll(Map)} for binary content (images, say) and text mixed: each target's
   * content is written to an output stream.
   *
   * @param contents target file and how to write it, in the order of the moves
   * @throws IOException if a file cannot be written or moved; no target is then changed
   */
  public static void writeAllStreams(Map<Path, IoConsumer<OutputStream>> contents)
      throws IOException {
    writeAllStreams(contents, AtomicFiles::atomicMove);
  }

  /** Text content as stream content, UTF-8. */
  public static IoConsumer<OutputStream> text(IoConsumer<Writer> content) {
    return stream -> {
      Writer writer = new BufferedWriter(new OutputStreamWriter(stream, StandardCharsets.UTF_8));
      content.accept(writer);
      writer.flush();
    };
  }

  private static Map<Path, IoConsumer<OutputStream>> asStreams(
      Map<Path, IoConsumer<Writer>> contents) {
    Map<Path, IoConsumer<OutputStream>> streams = new LinkedHashMap<>();
    for (Map.Entry<Path, IoConsumer<Writer>> entry : contents.entrySet()) {
      streams.put(entry.getKey(), text(entry.getValue()));
    }
    return streams;
  }

  static void writeAllStreams(Map<Path, IoConsumer<OutputStream>> contents, Mover mover)
      throws IOException {
    // Target (absolute) -> temporary holding its new content, in the order of the moves.
    Map<Path, Path> temporaries = new LinkedHashMap<>();
    try {
      for (Map.Entry<Path, IoConsumer<OutputStream>> entry : contents.entrySet()) {
        Path absolute = entry.getKey().toAbsolutePath().normalize();
        Path directory = absolute.getParent();
        if (directory == null) {
          throw new IOException("target has no parent directory: " + entry.getKey());
        }
        if (temporaries.containsKey(absolute)) {
          throw new IllegalArgumentException("the same target twice: " + entry.getKey());
        }
        Path temporary = createTemporary(directory, absolute.getFileName().toString(), "tmp");
        temporaries.put(absolute, temporary);
        try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
            StandardOpenOption.TRUNCATE_EXISTING)) {
          OutputStream stream = new BufferedOutputStream(Channels.newOutputStream(channel));
          entry.getValue().accept(stream);
          stream.flush();
          channel.force(true);
        }
      }
      for (Path target : temporaries.keySet()) {
        if (Files.isDirectory(target)) {
          throw new IOException(target + " is a folder, not a file");
        }
      }
    } catch (IOException | RuntimeException | Error e) {
      deleteQuietly(temporaries.values());
      throw e;
    }

    // Target -> backup holding its previous content; only targets actually moved aside.
    Map<Path, Path> backups = new LinkedHashMap<>();
    // Targets whose new content has been moved in.
    List<Path> movedIn = new ArrayList<>();
    try {
      // The last target needs no backup: its move is the last step, and a move that fails
      // leaves its target as it was. So a single file is replaced in one step, as by write.
      Path last = null;
      for (Path target : temporaries.keySet()) {
        last = target;
      }
      for (Path target : temporaries.keySet()) {
        if (!target.equals(last) && Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
          // Reserving the name with an empty file keeps two writers from picking the same one.
          Path backup = createTemporary(target.getParent(), target.getFileName().toString(),
              "bak");
          try {
            mover.move(target, backup);
          } catch (IOException | RuntimeException | Error e) {
            deleteQuietly(List.of(backup));
            throw e;
          }
          backups.put(target, backup);
        }
      }
      for (Map.Entry<Path, Path> entry : temporaries.entrySet()) {
        mover.move(entry.getValue(), entry.getKey());
        movedIn.add(entry.getKey());
      }
    } catch (IOException | RuntimeException | Error e) {
      rollBack(temporaries, backups, movedIn, mover, e);
      throw e;
    }

    deleteQuietly(backups.values());
    forceDirectories(temporaries.keySet());
  }

  /**
   * Undoes a failed set of moves: removes the new files moved in where there was no previous
   * file, puts every backup back over its target (which replaces a new file moved in there in
   * one step, so the target is never missing while it is put back), and deletes the remaining
   * temporary files. Whatever cannot be undone is recorded on {@code failure}; a backup that
   * cannot be put back is kept.
   */
  private static void rollBack(Map<Path, Path> temporaries, Map<Path, Path> backups,
      List<Path> movedIn, Mover mover, Throwable failure) {
    for (Path target : movedIn) {
      if (!backups.containsKey(target)) {
        try {
          Files.deleteIfExists(target);
        } catch (IOException | RuntimeException e) {
          failure.addSuppressed(new IOException("could not remove the new " + target
              + " after the failure", e));
        }
      }
    }
    for (Map.Entry<Path, Path> entry : backups.entrySet()) {
      try {
        mover.move(entry.getValue(), entry.getKey());
      } catch (IOException | RuntimeException e) {
        failure.addSuppressed(new IOException("could not put back the previous "
            + entry.getKey() + "; it is kept as " + entry.getValue(), e));
      }
    }
    deleteQuietly(temporaries.values());
    forceDirectories(temporaries.keySet());
  }

  /** Deletes the files that still exist, ignoring failures (the names start with a dot). */
  private static void deleteQuietly(Collection<Path> files) {
    for (Path file : files) {
      try {
        Files.deleteIfExists(file);
      } catch (IOException | RuntimeException e) {
        // The original failure or the result matters more; the leftover name starts with a dot.
      }
    }
  }

  /** Moves within one folder in one step, replacing the target; never copies. */
  static void atomicMove(Path source, Path target) throws IOException {
    Files.move(source, target, StandardCopyOption.ATOMIC_MOVE,
        StandardCopyOption.REPLACE_EXISTING);
  }

  /** Writes {@code text} to {@code target} atomically, in UTF-8. */
  public static void writeString(Path target, String text) throws IOException {
    write(target, writer -> writer.write(text));
  }

  /**
   * Creates an empty, hidden file next to the target, named after it with a random part and
   * {@code extension} ({@code tmp} for new content, {@code bak} for a previous file).
   */
  private static Path createTemporary(Path directory, String targetName, String extension)
      throws IOException {
    for (int attempt = 0; attempt < NAME_ATTEMPTS; attempt++) {
      String name = String.format(Locale.ROOT, ".%s.%016x.%s", targetName,
          ThreadLocalRandom.current().nextLong(), extension);
      try {
        return Files.createFile(directory.resolve(name));
      } catch (FileAlreadyExistsException e) {
        // Try another name.
      }
    }
    throw new IOException("could not create a temporary file for " + targetName + " in "
        + directory);
  }

  /** Forces the folders of the targets to disk, each once. */
  private static void forceDirectories(Collection<Path> targets) {
    Set<Path> directories = new LinkedHashSet<>();
    for (Path target : targets) {
      directories.add(target.getParent());
    }
    directories.forEach(AtomicFiles::forceDirectory);
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
