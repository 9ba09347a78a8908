/**
 * What a set of simulation runs scores: guild persistence, tree structure, intervention cost and
 * a few more, each a pure function of runs. Every objective is computed in two named steps:
 * {@link veldplan.objectives.ReplicateStep} over the replicates of one climate path (a
 * probability with a Wilson interval, or a mean with a Student-t interval), then
 * {@link veldplan.objectives.PathStep} over the climate paths (mean, worst path or a stated
 * percentile). {@link veldplan.objectives.Catalogue} builds the objectives a scenario asks for.
 * Depends on {@code veldplan.model} only.
 */
package veldplan.objectives;
