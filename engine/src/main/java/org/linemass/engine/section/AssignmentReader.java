package org.linemass.engine.section;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.error.AnalysisException;

/**
 * Layer-to-section assignments: a CSV file with a header row and columns {@code layer} (a glob with
 * {@code *} and {@code ?}, case-insensitive) and {@code section}, or command-line arguments of the
 * form {@code LAYER=SECTION} (split at the last {@code =}). Later rules win over earlier ones.
 * Whether the section ids exist is checked when they are used. Stateless.
 */
public final class AssignmentReader {

    private AssignmentReader() {
    }

    public static List<LayerAssignment> read(Path file) throws AnalysisException {
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(in, file.toString());
        } catch (IOException e) {
            throw new AnalysisException("cannot read layer assignments " + file + ": " + e.getMessage());
        }
    }

    public static List<LayerAssignment> read(Reader reader, String name) throws AnalysisException {
        try {
            CsvRows csv = CsvRows.read(reader instanceof BufferedReader b ? b : new BufferedReader(reader));
            if (!csv.has("layer") || !csv.has("section")) {
                throw new IllegalArgumentException("line 1: the header needs 'layer' and 'section' columns");
            }
            List<LayerAssignment> out = new ArrayList<>();
            for (CsvRows.Row r : csv.rows()) {
                String layer = r.require("layer");
                LayerGlob.of(layer);
                out.add(new LayerAssignment(layer, r.require("section"), name + " line " + r.line()));
            }
            return out;
        } catch (IllegalArgumentException e) {
            throw new AnalysisException(name + ": " + e.getMessage());
        } catch (IOException e) {
            throw new AnalysisException("cannot read layer assignments " + name + ": " + e.getMessage());
        }
    }

    /**
     * The layer joins of an assignment file: a row whose optional {@code joins} column is not empty
     * ({@code GLOB+GLOB...}) makes the layers of its {@code layer} column join the layers it lists; a
     * joined piece is then reported on the row's layer when it spans it (a {@link LayerJoin} whose lead
     * layer is the row's layer pattern). A file without the column has none.
     */
    public static List<LayerJoin> readJoins(Path file) throws AnalysisException {
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            CsvRows csv = CsvRows.read(in);
            List<LayerJoin> out = new ArrayList<>();
            if (!csv.has("joins")) {
                return out;
            }
            for (CsvRows.Row r : csv.rows()) {
                String joins = r.get("joins").orElse("").trim();
                if (!joins.isEmpty()) {
                    String layer = r.require("layer");
                    out.add(LayerJoin.parse(layer + "+" + joins + "=" + layer, file + " line " + r.line()));
                }
            }
            return out;
        } catch (IllegalArgumentException e) {
            throw new AnalysisException(file + ": " + e.getMessage());
        } catch (IOException e) {
            throw new AnalysisException("cannot read layer assignments " + file + ": " + e.getMessage());
        }
    }

    /** Parses one {@code LAYER=SECTION} argument. */
    public static LayerAssignment parseArgument(String argument) {
        int eq = argument.lastIndexOf('=');
        if (eq <= 0 || eq == argument.length() - 1) {
            throw new IllegalArgumentException("layer assignment must look like LAYER=SECTION, got '" + argument + "'");
        }
        String layer = argument.substring(0, eq).trim();
        String section = argument.substring(eq + 1).trim();
        if (layer.isEmpty() || section.isEmpty()) {
            throw new IllegalArgumentException("layer assignment must look like LAYER=SECTION, got '" + argument + "'");
        }
        return new LayerAssignment(layer, section, "argument " + argument);
    }
}
