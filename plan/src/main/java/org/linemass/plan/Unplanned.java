package org.linemass.plan;

/** Pieces of a mark left out of the plan, and why (no section, no stock row for the section). */
public record Unplanned(String section, String mark, int quantity, String reason) {
}
