package veldplan.optimiser.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Supplier;
import veldplan.shared.io.AtomicFiles;

/**
 * Writes checkpoints off the search thread, so that the search waits neither for the JSON nor
 * for the disk (each write is an atomic replace forced to disk, which can take tens of
 * milliseconds). Writes
 * coalesce: when the disk is slower than the generations, only the newest checkpoint is
 * written. A run killed between two writes continues from the last one written, and ends with
 * the same front, because any checkpoint of the run continues it exactly.
 */
final class CheckpointWriter implements AutoCloseable {
  private final Path file;
  private final ExecutorService thread = Executors.newSingleThreadExecutor(r -> {
    Thread t = new Thread(r, "veldplan-checkpoint");
    t.setDaemon(true);
    return t;
  });
  private final AtomicReference<Supplier<String>> pending = new AtomicReference<>();
  private final AtomicReference<IOException> failure = new AtomicReference<>();

  CheckpointWriter(Path file) {
    this.file = file;
  }

  /**
   * Queues a checkpoint; returns at once. Its text is made on the writer's thread, so it must
   * come from an immutable snapshot (a {@code SearchState} is one).
   *
   * @throws IllegalStateException if an earlier write failed
   */
  void write(Supplier<String> json) {
    IOException e = failure.get();
    if (e != null) {
      throw new IllegalStateException("could not write the checkpoint " + file + ": "
          + e.getMessage(), e);
    }
    if (pending.getAndSet(json) == null) {
      thread.execute(() -> {
        Supplier<String> newest = pending.getAndSet(null);
        if (newest != null) {
          try {
            AtomicFiles.writeString(file, newest.get());
          } catch (IOException | RuntimeException io) {
            failure.compareAndSet(null, io instanceof IOException ? (IOException) io
                : new IOException(io.getMessage(), io));
          }
        }
      });
    }
  }

  /** Waits until every queued checkpoint is on disk. */
  @Override
  public void close() {
    thread.shutdown();
    try {
      if (!thread.awaitTermination(5, TimeUnit.MINUTES)) {
        throw new IllegalStateException("the checkpoint " + file + " is still being written");
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }
}
