package veldplan.shared.scenario;

import java.util.List;

/**
 * The protected area as a set of burn blocks.
 *
 * @param name   the park's name
 * @param blocks burn blocks, at least one; names are unique
 */
public record Park(String name, List<BurnBlock> blocks) {
  public Park {
    blocks = List.copyOf(blocks);
  }
}
