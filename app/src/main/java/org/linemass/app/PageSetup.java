package org.linemass.app;

import java.io.StringReader;
import java.util.List;
import org.linemass.app.serve.AnalysisSetup;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.section.AssignmentReader;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.SectionCsvReader;
import org.linemass.engine.section.SectionTable;
import org.linemass.importer.ImportOptions;

/**
 * What {@code linemass serve} analyses with: the drawing options it was started with and the
 * section data, with a page's own section table and rules on top (the same precedence as
 * {@code --section-table} and {@code --assign-file} then {@code -a} on the command line).
 */
public final class PageSetup implements AnalysisSetup {

    private final DrawingOptions options;
    private final SectionCatalog catalog;
    private final ImportOptions importOptions;

    PageSetup(DrawingOptions options, SectionCatalog catalog) throws InputProblem, AnalysisException {
        this.options = options;
        this.catalog = catalog;
        this.importOptions = options.importOptions();
        options.settings(catalog);
    }

    /** The setup of {@code linemass serve} started without drawing options. */
    public static PageSetup defaults() {
        try {
            return new PageSetup(new DrawingOptions(), new EngineSectionCatalog());
        } catch (InputProblem | AnalysisException e) {
            throw new IllegalStateException("the default options are refused: " + e.getMessage(), e);
        }
    }

    @Override
    public ImportOptions importOptions() {
        return importOptions;
    }

    @Override
    public AnalysisSettings settings(SectionTable extraTable, List<LayerAssignment> extraRules)
            throws AnalysisException {
        try {
            return options.settings(catalog, extraTable, extraRules);
        } catch (InputProblem e) {
            throw new AnalysisException(e.getMessage());
        }
    }

    @Override
    public SectionTable readTable(String name, String csv) throws AnalysisException {
        return SectionCsvReader.read(new StringReader(csv), name);
    }

    @Override
    public List<LayerAssignment> readAssignments(String name, String csv) throws AnalysisException {
        return AssignmentReader.read(new StringReader(csv), name);
    }
}
