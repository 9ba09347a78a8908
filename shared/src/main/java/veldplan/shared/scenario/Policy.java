package veldplan.shared.scenario;

import java.util.List;

/**
 * A management policy: planned burning per block, elephant management and water points.
 * A block missing from {@code burning} gets no planned burning; a block missing from
 * {@code waterPoints} keeps all its artificial water points open.
 *
 * @param name        label used in reports
 * @param burning     planned burning per block
 * @param elephants   elephant offtake and contraception
 * @param waterPoints artificial water points per block
 */
public record Policy(
    String name,
    List<BurnPlan> burning,
    ElephantPlan elephants,
    List<WaterPlan> waterPoints) {

  public Policy {
    burning = List.copyOf(burning);
    waterPoints = List.copyOf(waterPoints);
  }
}
