package org.linemass.engine.section;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.linemass.engine.error.AnalysisException;

/**
 * Reads a user section table in CSV. Format: a header row, then one section per row.
 * <ul>
 * <li>{@code section} (required): the id users assign to layers</li>
 * <li>either {@code mass_kg_per_m}, or {@code shape} ({@code round}, {@code tube}, {@code square},
 * {@code rect}, {@code flat}) with its dimensions in mm ({@code d_mm} for round; {@code od_mm} and
 * {@code wall_mm} for tube; {@code w_mm} for square; {@code w_mm} and {@code h_mm} for rect and
 * flat) and {@code density_kg_m3} (or {@code material}, a built-in material id)</li>
 * <li>optional: {@code min_bend_radius_mm}, {@code description}, {@code source}, and {@code d_mm}
 * beside a mass to record a round bar's diameter</li>
 * </ul>
 * Lines starting with {@code #} and blank lines are skipped. Any bad row (missing column or value,
 * non-number, zero or negative mass, density or dimension, duplicate id) stops the read with an
 * {@link AnalysisException} naming the file and line. Stateless.
 */
public final class SectionCsvReader {

    private SectionCsvReader() {
    }

    public static SectionTable read(Path file) throws AnalysisException {
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(in, file.toString());
        } catch (IOException e) {
            throw new AnalysisException("cannot read section table " + file + ": " + e.getMessage());
        }
    }

    /** Reads from any reader; {@code name} is the file name used in messages. */
    public static SectionTable read(Reader reader, String name) throws AnalysisException {
        try {
            CsvRows csv = CsvRows.read(reader instanceof BufferedReader b ? b : new BufferedReader(reader));
            if (!csv.has("section")) {
                throw new IllegalArgumentException("line 1: the header has no 'section' column");
            }
            if (!csv.has("mass_kg_per_m") && !csv.has("shape")) {
                throw new IllegalArgumentException("line 1: the header needs a 'mass_kg_per_m' or a 'shape' column");
            }
            List<Section> out = new ArrayList<>();
            Map<String, Integer> seen = new HashMap<>();
            for (CsvRows.Row r : csv.rows()) {
                Section s = row(r, name);
                Integer before = seen.put(s.id().toUpperCase(Locale.ROOT), r.line());
                if (before != null) {
                    throw new IllegalArgumentException("line " + r.line() + ": section " + s.id()
                            + " already defined on line " + before);
                }
                out.add(s);
            }
            return SectionTable.of(out);
        } catch (IllegalArgumentException e) {
            throw new AnalysisException(name + ": " + e.getMessage());
        } catch (IOException e) {
            throw new AnalysisException("cannot read section table " + name + ": " + e.getMessage());
        }
    }

    private static Section row(CsvRows.Row r, String file) {
        String id = r.require("section");
        Double bend = r.get("min_bend_radius_mm").isPresent() ? r.positive("min_bend_radius_mm") / 1000 : null;
        String source = r.get("source").orElse("user table " + fileName(file) + " line " + r.line());
        if (r.get("mass_kg_per_m").isPresent()) {
            double kgPerM = r.positive("mass_kg_per_m");
            Double d = r.get("d_mm").isPresent() ? r.positive("d_mm") / 1000 : null;
            return new Section(id, r.get("description").orElse(id), "", kgPerM, d, bend, source);
        }
        Shape shape;
        try {
            shape = Shape.parse(r.require("shape"));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(e.getMessage().startsWith("line") ? e.getMessage()
                    : "line " + r.line() + ": " + e.getMessage(), e);
        }
        double[] mm = switch (shape) {
            case ROUND -> new double[] {r.positive("d_mm")};
            case TUBE -> new double[] {r.positive("od_mm"), r.positive("wall_mm")};
            case SQUARE -> new double[] {r.positive("w_mm")};
            case RECT, FLAT -> new double[] {r.positive("w_mm"), r.positive("h_mm")};
        };
        double density;
        String material = "";
        if (r.get("density_kg_m3").isPresent()) {
            density = r.positive("density_kg_m3");
            material = r.get("material").orElse("");
        } else if (r.get("material").isPresent()) {
            String m = r.require("material");
            Material mat = Materials.find(m).orElseThrow(() -> new IllegalArgumentException("line " + r.line()
                    + ": " + Materials.unknownMessage(m) + ", or give density_kg_m3 instead"));
            density = mat.densityKgM3();
            material = mat.id();
        } else {
            throw new IllegalArgumentException("line " + r.line() + ": a shape row needs density_kg_m3 (or material)");
        }
        double area;
        try {
            area = shape.areaM2(mm);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("line " + r.line() + ": " + e.getMessage(), e);
        }
        String description = r.get("description").orElse(shape.describe(mm) + (material.isEmpty() ? "" : ", " + material));
        return new Section(id, description, material, density * area, shape.diameterM(mm), bend, source);
    }

    private static String fileName(String file) {
        Path p = Path.of(file).getFileName();
        return p == null ? file : p.toString();
    }
}
