/**
 * NaN-safe argument checks for programming errors, each naming the argument and its value:
 * {@link veldplan.shared.check.Checks}.
 */
package veldplan.shared.check;
