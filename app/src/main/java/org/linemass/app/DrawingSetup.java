package org.linemass.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.importer.ImportOptions;

/**
 * What {@code check} makes of its drawing options, for a caller that is not the command line (the
 * archive job of the {@code spark} module): the same {@link DrawingOptions}, parsed by picocli the
 * same way, give the same import options and analysis settings, so a drawing analysed with these
 * gets the numbers {@code check} gives it with the same options.
 *
 * @param importOptions how drawings are read
 * @param settings how they are analysed
 */
public record DrawingSetup(ImportOptions importOptions, AnalysisSettings settings) {

    /**
     * The setup of {@code options}, whose section table and assignment files are read from
     * {@code files.apply(path)} instead of the path given (a process that holds copies of them
     * elsewhere; {@code UnaryOperator.identity()} reads them where they are). The options keep
     * the replaced paths.
     *
     * @throws InputProblem for a bad option value (one-line message)
     * @throws AnalysisException for a section table or assignment file that cannot be read
     */
    public static DrawingSetup of(DrawingOptions options, UnaryOperator<Path> files)
            throws InputProblem, AnalysisException {
        if (options.sectionTable != null) {
            options.sectionTable = files.apply(options.sectionTable);
        }
        options.assignFiles.replaceAll(files);
        return new DrawingSetup(options.importOptions(), options.settings(new EngineSectionCatalog()));
    }

    /** The files {@code options} read besides the drawings: the section table, then the assignment files. */
    public static List<Path> filesRead(DrawingOptions options) {
        List<Path> all = new ArrayList<>();
        if (options.sectionTable != null) {
            all.add(options.sectionTable);
        }
        all.addAll(options.assignFiles);
        return all;
    }

    /** A failure message as {@code check} prints it in its summary: on one line. */
    public static String oneLine(Exception e) {
        return Cli.oneLine(e.getMessage());
    }
}
