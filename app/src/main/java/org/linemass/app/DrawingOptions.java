package org.linemass.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.linemass.drawing.LengthUnit;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.section.AssignmentReader;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.LayerJoin;
import org.linemass.engine.section.SectionTable;
import org.linemass.engine.shape.BendStandard;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.dxf.DxfMarkupWriter;
import picocli.CommandLine.Option;

/**
 * Options that decide how a drawing is read and analysed: units, layers, sections and
 * tolerances. {@link #importOptions} and {@link #settings} turn them into the engine's settings.
 */
public final class DrawingOptions {

    @Option(names = "--units", paramLabel = "UNIT", converter = Converters.Unit.class,
            description = "Drawing unit to use instead of the file's own (mm, cm, m, in, ft, ...).")
    LengthUnit units;

    @Option(names = "--only-layer", paramLabel = "GLOB",
            description = "Count only layers matching GLOB (* and ?, case-insensitive); repeatable.")
    List<String> onlyLayers = new ArrayList<>();

    /** Glob of the layer {@code --markup-dxf} adds (with its numeric suffixes); never counted unless asked for. */
    static final String MARKUP_LAYERS = DxfMarkupWriter.LAYER + "*";

    @Option(names = "--skip-layer", paramLabel = "GLOB", description = "Do not count layers matching GLOB; repeatable. "
            + "The layer a marked-up copy adds (" + DxfMarkupWriter.LAYER + ") is never counted.")
    List<String> skipLayers = new ArrayList<>();

    @Option(names = "--count-hidden-layers", description = "Also count layers that are switched off or frozen.")
    boolean hiddenLayers;

    @Option(names = "--paper-space", description = "Also read entities drawn in paper space (the sheet layouts) "
            + "into model space; by default only model space counts and paper-space entities are only counted.")
    boolean paperSpace;

    @Option(names = "--invisible", description = "Also read invisible entities (group code 60 = 1, drawn by no CAD "
            + "program; dynamic-block states are stored this way); by default they are left out and counted.")
    boolean invisible;

    @Option(names = "--face-edges", description = "Also read the visible edges of 3DFACE entities as wire (wireframe "
            + "models written as faces); by default faces are listed per layer as material that was not weighed.")
    boolean faceEdges;

    @Option(names = "--mlines-and-leaders", description = "Also read MLINE element lines and LEADER paths as wire; by "
            + "default these drafting entities are counted in a note, not weighed.")
    boolean mlinesAndLeaders;

    @Option(names = "--section-table", paramLabel = "CSV",
            description = "Extra section rows (CSV); they replace built-in rows with the same id.")
    Path sectionTable;

    @Option(names = "--assign-file", paramLabel = "CSV", description = "Layer-to-section rules from a CSV file; repeatable.")
    List<Path> assignFiles = new ArrayList<>();

    @Option(names = {"-a", "--assign"}, paramLabel = "LAYER=SECTION",
            description = "Layers matching LAYER (a glob) are made of SECTION; repeatable, later rules win.")
    List<String> assign = new ArrayList<>();

    @Option(names = "--join-layers", paramLabel = "GLOB+GLOB[=LAYER]",
            description = "Pieces on layers matching any of the GLOBs join one another end to end (a bar and its "
                    + "hooks drawn on two layers); a joined piece is reported on LAYER, or else on the layer with the "
                    + "longest run, and takes its section. Repeatable. Default: ends join on one layer only.")
    List<String> joinLayers = new ArrayList<>();

    @Option(names = "--bend-standard", paramLabel = "STANDARD",
            description = "Minimum bend radii the bending schedule checks bars against: auto (default; BS 8666:2005 "
                    + "Table 2 for its sizes, ACI 318-19 for ASTM A615 sizes), bs8666 or aci318. Shape codes stay "
                    + "BS 8666's.")
    String bendStandard = "auto";

    @Option(names = "--density", paramLabel = "LAYER=EXPR",
            description = "Layers matching LAYER (a glob) have the linear density EXPR in kg/m instead of their "
                    + "section's constant one: a formula in x, y, z (world position, m) and s (m along the piece from "
                    + "its start), e.g. 'TAPER*=0.888*(1-0.25*s)'; repeatable, the most specific glob wins.")
    List<String> density = new ArrayList<>();

    @Option(names = "--join", paramLabel = "LENGTH", converter = Converters.Length.class,
            description = "Ends closer than this are joined, e.g. 0.01mm (default 0.01 mm).")
    Double joinM;

    @Option(names = "--gap-limit", paramLabel = "LENGTH", converter = Converters.Length.class,
            description = "Openings up to this size are reported as gaps, e.g. 2mm (default 5 mm).")
    Double gapLimitM;

    @Option(names = "--mirror-alike", description = "Count mirror images as identical pieces (same mark).")
    boolean mirrorAlike;

    @Option(names = "--limit-block-depth", paramLabel = "N", description = "Deepest nesting of block inserts read "
            + "(default ${DEFAULT-VALUE}); deeper inserts are skipped with an error finding.")
    int maxBlockDepth = ImportOptions.DEFAULTS.maxBlockDepth();

    @Option(names = "--limit-line-bytes", paramLabel = "N", description = "Longest text line (ASCII) or string "
            + "(binary) accepted, in bytes (default ${DEFAULT-VALUE}).")
    int maxLineBytes = ImportOptions.DEFAULTS.maxLineBytes();

    @Option(names = "--limit-spline-points", paramLabel = "N", description = "Most control points, knots or fit "
            + "points of one SPLINE (default ${DEFAULT-VALUE}).")
    int maxControlPoints = ImportOptions.DEFAULTS.maxControlPoints();

    @Option(names = "--limit-vertices", paramLabel = "N", description = "Most vertices of one polyline "
            + "(default ${DEFAULT-VALUE}).")
    int maxVertices = ImportOptions.DEFAULTS.maxVertices();

    @Option(names = "--limit-expanded", paramLabel = "N", description = "Most world segments expanded from blocks "
            + "for joining and checks (default ${DEFAULT-VALUE}); beyond it totals still come from block "
            + "instancing, pieces and checks are skipped and the reports say so.")
    long maxExpandedSegments = AnalysisSettings.DEFAULT_MAX_EXPANDED_SEGMENTS;

    @Option(names = "--threads", paramLabel = "N", description = "Threads each drawing's joining, checks and "
            + "pieces may use (default: one per processor for a single drawing, one when several drawings "
            + "run side by side with --jobs); the reports are the same for any number.")
    Integer threads;

    private int threads() throws InputProblem {
        if (threads == null) {
            return Runtime.getRuntime().availableProcessors();
        }
        if (threads < 1) {
            throw new InputProblem("--threads must be 1 or more, got " + threads);
        }
        return threads;
    }

    /** Whether the user set --threads (otherwise a run of several drawings gives each one thread). */
    boolean threadsGiven() {
        return threads != null;
    }

    /** Import options with the unit override, if any, and the resource limits. */
    ImportOptions importOptions() throws InputProblem {
        try {
            return new ImportOptions(java.util.Optional.ofNullable(units), maxBlockDepth, maxLineBytes,
                    maxControlPoints, maxVertices, paperSpace, invisible, faceEdges, mlinesAndLeaders);
        } catch (IllegalArgumentException e) {
            throw new InputProblem(e.getMessage());
        }
    }

    /**
     * The analysis settings: built-in sections overridden by the user's table, file rules first and
     * command-line rules after them (so the command line wins).
     */
    AnalysisSettings settings(SectionCatalog catalog) throws AnalysisException, InputProblem {
        return settings(catalog, null, List.of());
    }

    /**
     * As {@link #settings(SectionCatalog)}, with the rows of {@code extraTable} (may be null) over
     * all other sections and {@code extraRules} after all other rules (so they win): the sections and
     * picks a user of the local page adds on top of the options the server was started with.
     */
    AnalysisSettings settings(SectionCatalog catalog, SectionTable extraTable, List<LayerAssignment> extraRules)
            throws AnalysisException, InputProblem {
        SectionTable table = catalog.builtIn();
        if (sectionTable != null) {
            table = table.overriddenBy(catalog.readTable(sectionTable));
        }
        if (extraTable != null) {
            table = table.overriddenBy(extraTable);
        }
        List<LayerAssignment> rules = new ArrayList<>();
        for (Path p : assignFiles) {
            rules.addAll(catalog.readAssignments(p));
        }
        for (String a : assign) {
            rules.add(parseAssignment(a));
        }
        rules.addAll(extraRules);
        java.util.Map<String, String> densities = densities();
        long expansionLimit = checkedExpansionLimit();
        for (String g : onlyLayers) {
            requirePattern("--only-layer", g);
        }
        for (String g : skipLayers) {
            requirePattern("--skip-layer", g);
        }
        for (LayerAssignment r : rules) {
            requirePattern("--assign", r.layerGlob());
        }
        for (String g : densities.keySet()) {
            requirePattern("--density", g);
        }
        List<LayerJoin> joins = new ArrayList<>();
        for (Path p : assignFiles) {
            joins.addAll(AssignmentReader.readJoins(p));
        }
        for (String j : joinLayers) {
            try {
                joins.add(LayerJoin.parse(j, "--join-layers " + j));
            } catch (IllegalArgumentException e) {
                throw new InputProblem("bad --join-layers: " + e.getMessage());
            }
        }
        BendStandard standard;
        try {
            standard = BendStandard.parse(bendStandard);
        } catch (IllegalArgumentException e) {
            throw new InputProblem("bad --bend-standard: " + e.getMessage());
        }
        try {
            // the settings check the tolerances themselves (the gap limit covers the join tolerance)
            return new AnalysisSettings(Optional.ofNullable(joinM), Optional.ofNullable(gapLimitM), Optional.empty(),
                    AnalysisSettings.defaults(table).integrationRelative(), mirrorAlike, onlyLayers, skipped(),
                    hiddenLayers, table, rules, densities, expansionLimit, joins, standard,
                    AnalysisSettings.DEFAULT_LISTED_NOTES, threads());
        } catch (IllegalArgumentException e) {
            throw new InputProblem("bad --join or --gap-limit: " + e.getMessage());
        }
    }

    /** {@code --density LAYER=EXPR} rules by glob; the first '=' splits, since exp4j formulas have none. */
    java.util.Map<String, String> densities() throws InputProblem {
        java.util.Map<String, String> m = new java.util.LinkedHashMap<>();
        for (String d : density) {
            int eq = d.indexOf('=');
            if (eq <= 0 || eq == d.length() - 1) {
                throw new InputProblem("--density '" + d + "': expected LAYER=EXPR, e.g. 'RAIL*=0.888*(1+0.1*z)'");
            }
            m.put(d.substring(0, eq).trim(), d.substring(eq + 1).trim());
        }
        return m;
    }

    /**
     * A layer pattern the user gave is bad input when it is empty: checked here so that the engine,
     * which compiles the patterns, never sees one (an argument error there would be a bug).
     */
    private static void requirePattern(String option, String glob) throws InputProblem {
        if (glob == null || glob.isEmpty()) {
            throw new InputProblem(option + ": empty layer pattern");
        }
    }

    private long checkedExpansionLimit() throws InputProblem {
        if (maxExpandedSegments < 0) {
            throw new InputProblem("--limit-expanded must be 0 or more, got " + maxExpandedSegments);
        }
        return maxExpandedSegments;
    }

    /**
     * The layers not to count: those given with --skip-layer, and the layer a marked-up copy adds
     * ({@link #MARKUP_LAYERS}), so that checking a marked-up drawing again does not count its
     * circles and labels as wire; unless --only-layer names that layer on purpose.
     */
    List<String> skipped() {
        List<String> all = new ArrayList<>(skipLayers);
        boolean wanted = onlyLayers.stream().anyMatch(g -> g.toUpperCase(Locale.ROOT).startsWith("LINEMASS"));
        if (!wanted) {
            all.add(MARKUP_LAYERS);
        }
        return all;
    }

    /**
     * Every file a run with these options reads: the drawings, the section table and the layer
     * assignment files; no report may be written onto any of them.
     */
    org.linemass.reports.io.ProtectedFiles protectedFiles(List<Path> drawings) {
        org.linemass.reports.io.ProtectedFiles p = new org.linemass.reports.io.ProtectedFiles();
        p.addAll(drawings, "input drawing");
        if (sectionTable != null) {
            p.add(sectionTable, "section table");
        }
        p.addAll(assignFiles, "assignment file");
        return p;
    }

    /** {@code LAYER=SECTION}; the layer glob may itself contain '=', so the last '=' splits. */
    static LayerAssignment parseAssignment(String text) throws InputProblem {
        int eq = text.lastIndexOf('=');
        if (eq <= 0 || eq == text.length() - 1) {
            throw new InputProblem("--assign '" + text + "': expected LAYER=SECTION, e.g. FRAME*=round:8:steel");
        }
        return new LayerAssignment(text.substring(0, eq).trim(), text.substring(eq + 1).trim(),
                "command line --assign " + text);
    }
}
