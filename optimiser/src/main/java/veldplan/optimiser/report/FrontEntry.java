package veldplan.optimiser.report;

import veldplan.optimiser.park.PolicyScore;
import veldplan.shared.scenario.Policy;

/**
 * One policy in a front report, with what it scored on the validation replicates.
 *
 * @param id                   short identifier, e.g. "P07", or the reference policy's name
 * @param role                 "front" for a policy the search found, "reference" for the
 *                             scenario's own policy and "no intervention"
 * @param policy               the policy
 * @param score                validation estimates of every reported measure
 * @param meetsThresholds      whether the estimates meet every threshold
 * @param meetsCautiously      whether the cautious ends of the 95 % intervals meet them too
 * @param dominated            whether another front policy is at least as good on every
 *                             objective and better on one, on the validation replicates
 */
public record FrontEntry(String id, String role, Policy policy, PolicyScore score,
    boolean meetsThresholds, boolean meetsCautiously, boolean dominated) {}
