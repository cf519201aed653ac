/**
 * The one settings object of an analysis ({@link org.linemass.engine.settings.AnalysisSettings}):
 * what the user chose, checked when built, and the single place that turns it and a drawing's
 * extent into the shared {@link org.linemass.tolerance.Tolerances}. Depends on the section table
 * types only, so every stage can read it without reaching back into the engine's front door.
 */
package org.linemass.engine.settings;
