/**
 * Fuzz tests of the importer (Jazzer's JUnit integration): in the normal test run they replay the
 * committed inputs under {@code src/test/resources/org/linemass/importer/fuzz/<Test>Inputs/<method>/};
 * with {@code JAZZER_FUZZ=1} (see {@code scripts/fuzz}) they fuzz one method per JVM.
 */
package org.linemass.importer.fuzz;
