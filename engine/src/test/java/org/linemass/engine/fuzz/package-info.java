/**
 * Fuzz tests of the engine's file readers (section table and layer assignment CSV) with Jazzer's
 * JUnit integration: regression replay of the committed inputs in the normal test run, real
 * fuzzing of one method per JVM with {@code JAZZER_FUZZ=1} (see {@code scripts/fuzz}).
 */
package org.linemass.engine.fuzz;
