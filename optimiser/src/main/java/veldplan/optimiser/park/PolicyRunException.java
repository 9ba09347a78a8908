package veldplan.optimiser.park;

import veldplan.shared.scenario.Policy;

/**
 * A simulation of one policy failed (the model's state became invalid: a model bug or inputs
 * outside what it was built for). Carries the policy, so that the command can write it to a
 * policy file with which {@code simulate} reproduces the failure.
 */
public final class PolicyRunException extends IllegalStateException {
  private static final long serialVersionUID = 1L;

  /** The policy whose run failed; not serialised with the exception. */
  private final transient Policy policy;

  /**
   * @param message what went wrong, with the path, replicate and seed
   * @param policy  the policy whose run failed
   * @param cause   the model's exception
   */
  public PolicyRunException(String message, Policy policy, RuntimeException cause) {
    super(message, cause);
    this.policy = policy;
  }

  /** The policy whose run failed. */
  public Policy policy() {
    return policy;
  }
}
