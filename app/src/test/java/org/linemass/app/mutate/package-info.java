/**
 * The mutation campaign: byte-level and group-level mutants of real drawings, each run through
 * the whole command ({@code check} with every report) inside one JVM with a per-input time bound,
 * and every output checked for validity. {@link org.linemass.app.mutate.MutationKinds} is the list
 * of mutation kinds; new kinds are added there. {@code scripts/mutate} runs a campaign.
 */
package org.linemass.app.mutate;
