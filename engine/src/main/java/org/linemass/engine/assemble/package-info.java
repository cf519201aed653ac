/**
 * Assembly of the drawing result from the stages' outputs: per-layer materials (section or density
 * field), pieces and marks, findings and totals. Used by the analyzer; every
 * list it produces is in a deterministic order (layers by name, pieces by layer then position).
 */
package org.linemass.engine.assemble;
