/**
 * Output helpers: {@link veldplan.shared.io.AtomicFiles} writes a file completely or not at all.
 */
package veldplan.shared.io;
