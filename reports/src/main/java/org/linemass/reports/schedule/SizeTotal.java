package org.linemass.reports.schedule;

/** The mass of one bar size over the schedule (kilograms; null when some mark of the size has no section). */
public record SizeTotal(String size, Double massKg) {
}
