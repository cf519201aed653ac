package org.linemass.app;

import java.nio.file.Path;
import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.SectionTable;

/** Where section data come from: the built-in table and the user's CSV files. */
public interface SectionCatalog {

    /** The built-in section table, each row with its source. */
    SectionTable builtIn();

    /** A user section table read from a CSV file; AnalysisException names file and row on bad data. */
    SectionTable readTable(Path csv) throws AnalysisException;

    /** Layer-to-section rules read from a CSV file; AnalysisException names file and row on bad data. */
    List<LayerAssignment> readAssignments(Path csv) throws AnalysisException;
}
