/**
 * What a set of simulation runs scores: guild persistence, tree structure, intervention cost and
 * the like, aggregated over replicates and then over climate paths. This module is where the
 * policy search's objectives will live (issue 3); it depends on {@code veldplan.model} only.
 */
package veldplan.objectives;
