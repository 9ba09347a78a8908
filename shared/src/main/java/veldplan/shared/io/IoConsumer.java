package veldplan.shared.io;

import java.io.IOException;

/**
 * A consumer that may throw {@link IOException}, for writing content to a stream or writer.
 *
 * @param <T> the type of the value consumed
 */
@FunctionalInterface
public interface IoConsumer<T> {

  /** Consumes {@code value}, for example by writing to it. */
  void accept(T value) throws IOException;
}
