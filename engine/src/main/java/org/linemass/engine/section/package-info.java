/**
 * Cross-sections and materials: the built-in section table (reinforcing bar, AWG wire, plain wire,
 * parametric round bar, tube, square, rectangular and flat bar), user section tables in CSV,
 * and layer-to-section assignments.
 *
 * <h2>Section ids</h2>
 * Built-in rows ({@link org.linemass.engine.section.BuiltInSections}, each with its source):
 * {@code RB6} ... {@code RB50} metric reinforcing bar (BS 4449 / EN 10080 nominal masses, minimum bend
 * radius from EN 1992-1-1 Table 8.1N); {@code A615-3} ... {@code A615-18} US bar (ASTM A615 lb/ft,
 * bend radius from ACI 318); {@code AWG0000-CU} ... {@code AWG40-CU} and {@code -AL} round wire by
 * American Wire Gauge (ASTM B258 diameters; copper 8890, aluminium 1350 2705 kg/m3);
 * {@code SW0.5} ... {@code SW12.0} plain round steel wire. Parametric ids
 * ({@link org.linemass.engine.section.ParametricSection}) are typed as {@code SHAPE:MM:MATERIAL}:
 * {@code round:12:steel}, {@code tube:42.4x2.6:steel}, {@code square:10:aluminium-6061},
 * {@code rect:40x10:steel}, {@code flat:40x5:stainless-304}; the material is a built-in material id
 * ({@link org.linemass.engine.section.Materials}) or a density in kg/m3 ({@code round:6:8500}).
 *
 * <h2>User section table (CSV)</h2>
 * A header row, then one section per row ({@link org.linemass.engine.section.SectionCsvReader}):
 * <pre>
 * section,mass_kg_per_m,shape,d_mm,od_mm,wall_mm,w_mm,h_mm,density_kg_m3,min_bend_radius_mm,description,source
 * TRELLIS-WIRE,0.05,,,,,,,,6,garden wire,supplier sheet 2026
 * RAIL,,tube,,42.4,2.6,,,7850,,handrail tube,
 * KICK-PLATE,,flat,,,,100,6,7850,,,
 * </pre>
 * Either {@code mass_kg_per_m}, or {@code shape} ({@code round} with {@code d_mm}; {@code tube} with
 * {@code od_mm} and {@code wall_mm}; {@code square} with {@code w_mm}; {@code rect} and {@code flat} with
 * {@code w_mm} and {@code h_mm}) and {@code density_kg_m3} (or {@code material}, a built-in material id).
 * Optional: {@code min_bend_radius_mm}, {@code description}, {@code source}. Lines starting with
 * {@code #} are comments. A bad row (missing value, not a number, zero or negative mass, density or
 * dimension, a wall over half the diameter, a repeated id) stops the run with a message naming the
 * file and line. User rows override built-in rows with the same id.
 *
 * <h2>Layer assignments</h2>
 * A CSV file with header {@code layer,section} ({@link org.linemass.engine.section.AssignmentReader}),
 * or command-line arguments {@code LAYER=SECTION}. Layers may be globs with {@code *} and {@code ?},
 * compared without case; when several rules match a layer, the last one wins.
 */
package org.linemass.engine.section;
