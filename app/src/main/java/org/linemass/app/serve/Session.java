package org.linemass.app.serve;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutorService;
import org.linemass.drawing.Drawing;
import org.linemass.engine.Analyzer;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.SectionTable;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.reports.Report;

/**
 * The work of one browser tab: its drawings, the section table and assignment file it uploaded and
 * the section it picked per layer. Reading a drawing runs on the server's workers; a change of
 * sections or picks re-runs the engine on every drawing already read (the files are not read again)
 * and is undone, with the engine's message, when a drawing cannot be analysed with it.
 * Thread-safe: every method locks the session.
 */
final class Session {

    final String id;
    private final AnalysisSetup setup;
    private final ServeLimits limits;
    private final List<LoadedDrawing> drawings = new ArrayList<>();
    private int nextId = 1;
    private long heldBytes;
    private volatile long lastUsed = System.currentTimeMillis();
    private SectionTable table;
    private String tableName;
    private List<LayerAssignment> fileRules = List.of();
    private String rulesName;
    private final Map<String, String> picks = new LinkedHashMap<>();
    /** Bumped on each change of sections or picks; a reading that started before it analyses again. */
    private int settingsVersion;
    private boolean closed;

    Session(String id, AnalysisSetup setup, ServeLimits limits) {
        this.id = id;
        this.setup = setup;
        this.limits = limits;
    }

    void touch() {
        lastUsed = System.currentTimeMillis();
    }

    long lastUsed() {
        return lastUsed;
    }

    /** Takes a dropped drawing and queues its reading on {@code workers}. */
    synchronized LoadedDrawing add(String name, byte[] bytes, ExecutorService workers) throws Problem {
        if (closed) {
            throw new Problem(404, "this page's session has ended; reload the page");
        }
        if (drawings.size() >= limits.maxDrawings()) {
            throw new Problem(409, "this page already holds " + drawings.size() + " drawings, the most one page "
                    + "takes; remove some or open another tab");
        }
        if (heldBytes + bytes.length > limits.maxSessionBytes()) {
            throw new Problem(413, name + ": this page already holds " + ServeLimits.size(heldBytes)
                    + " of drawings; with this one it would pass its limit of "
                    + ServeLimits.size(limits.maxSessionBytes()) + "; remove some or open another tab");
        }
        LoadedDrawing d = new LoadedDrawing(nextId++, name, bytes);
        heldBytes += bytes.length;
        drawings.add(d);
        d.job = workers.submit(() -> read(d));
        return d;
    }

    /** The worker's part: read the file once, then analyse with the settings of the moment. */
    private void read(LoadedDrawing d) {
        try {
            d.stage = "reading the file";
            Drawing drawing = DxfImporter.read(d.name, d.bytes, setup.importOptions());
            while (true) {
                AnalysisSettings settings;
                int version;
                synchronized (this) {
                    if (d.status != LoadedDrawing.Status.WORKING) {
                        return;
                    }
                    settings = settings();
                    version = settingsVersion;
                }
                Report report = Report.of(Analyzer.analyze(drawing, settings, stage -> {
                    if (Thread.currentThread().isInterrupted()) {
                        throw new CancellationException("cancelled");
                    }
                    d.stage = stage;
                }));
                synchronized (this) {
                    if (d.status != LoadedDrawing.Status.WORKING) {
                        return;
                    }
                    if (version == settingsVersion) {
                        d.drawing = drawing;
                        d.report = report;
                        d.revision++;
                        d.status = LoadedDrawing.Status.DONE;
                        d.stage = "done";
                        return;
                    }
                }
            }
        } catch (DxfInputException | AnalysisException e) {
            refuse(d, e.getMessage());
        } catch (CancellationException e) {
            refuse(d, null);
        } catch (OutOfMemoryError e) {
            refuse(d, d.name + ": the drawing does not fit in the server's memory (start it with a larger -Xmx)");
        } catch (RuntimeException | StackOverflowError e) {
            refuse(d, d.name + ": internal error (" + e.getClass().getSimpleName() + "); please report it with the "
                    + "drawing");
        }
    }

    private synchronized void refuse(LoadedDrawing d, String message) {
        if (d.status == LoadedDrawing.Status.WORKING) {
            d.status = message == null ? LoadedDrawing.Status.CANCELLED : LoadedDrawing.Status.REFUSED;
            d.message = message == null ? d.name + ": cancelled" : message;
            d.stage = message == null ? "cancelled" : "refused";
        }
    }

    /** Stops the reading of drawing {@code id} (at the next stage) and keeps it as cancelled. */
    synchronized void cancel(int id) throws Problem {
        LoadedDrawing d = find(id);
        if (d.status == LoadedDrawing.Status.WORKING) {
            d.status = LoadedDrawing.Status.CANCELLED;
            d.message = d.name + ": cancelled";
            d.stage = "cancelled";
            d.job.cancel(true);
        }
    }

    synchronized void remove(int id) throws Problem {
        LoadedDrawing d = find(id);
        d.job.cancel(true);
        if (d.status == LoadedDrawing.Status.WORKING) {
            d.status = LoadedDrawing.Status.CANCELLED;
        }
        drawings.remove(d);
        heldBytes -= d.bytes.length;
    }

    /** Drops everything this tab held. */
    synchronized void close() {
        closed = true;
        for (LoadedDrawing d : drawings) {
            d.job.cancel(true);
            if (d.status == LoadedDrawing.Status.WORKING) {
                d.status = LoadedDrawing.Status.CANCELLED;
            }
        }
        drawings.clear();
        heldBytes = 0;
    }

    synchronized LoadedDrawing find(int id) throws Problem {
        for (LoadedDrawing d : drawings) {
            if (d.id == id) {
                return d;
            }
        }
        throw new Problem(404, "no drawing " + id + " on this page");
    }

    synchronized List<LoadedDrawing> drawings() {
        return List.copyOf(drawings);
    }

    /** The reports of the drawings read so far, in the order they were dropped. */
    synchronized List<Report> reports() {
        List<Report> out = new ArrayList<>();
        for (LoadedDrawing d : drawings) {
            if (d.status == LoadedDrawing.Status.DONE) {
                out.add(d.report);
            }
        }
        return out;
    }

    /** The settings from the server's options, this tab's section table, assignment file and picks. */
    synchronized AnalysisSettings settings() throws AnalysisException {
        return setup.settings(table, rules());
    }

    /** The assignment-file rules, then one rule per pick (later rules win, as on the command line). */
    synchronized List<LayerAssignment> rules() {
        List<LayerAssignment> all = new ArrayList<>(fileRules);
        picks.forEach((layer, section) -> all.add(new LayerAssignment(layer, section, "picked on the page for layer "
                + layer)));
        return all;
    }

    synchronized Map<String, String> picks() {
        return new LinkedHashMap<>(picks);
    }

    synchronized String tableName() {
        return tableName;
    }

    synchronized String rulesName() {
        return rulesName;
    }

    /** Uses the section table in {@code csv}; undone with a 400 when it is bad or breaks a drawing. */
    synchronized void sectionTable(String name, String csv) throws Problem {
        SectionTable oldTable = table;
        String oldName = tableName;
        try {
            table = setup.readTable(name, csv);
        } catch (AnalysisException e) {
            throw new Problem(400, e.getMessage());
        }
        tableName = name;
        reanalyse(() -> {
            table = oldTable;
            tableName = oldName;
        });
    }

    /** Uses the layer-to-section rules in {@code csv}; undone with a 400 when they are bad. */
    synchronized void assignments(String name, String csv) throws Problem {
        List<LayerAssignment> oldRules = fileRules;
        String oldName = rulesName;
        try {
            fileRules = List.copyOf(setup.readAssignments(name, csv));
        } catch (AnalysisException e) {
            throw new Problem(400, e.getMessage());
        }
        rulesName = name;
        reanalyse(() -> {
            fileRules = oldRules;
            rulesName = oldName;
        });
    }

    /** Layer {@code layer} is made of {@code section}; an empty section takes the pick back. */
    synchronized void pick(String layer, String section) throws Problem {
        if (layer == null || layer.isEmpty()) {
            throw new Problem(400, "a pick needs a layer name");
        }
        String old = picks.get(layer);
        if (section == null || section.isBlank()) {
            picks.remove(layer);
        } else {
            try {
                if (settings().sections().find(section).isEmpty()) {
                    throw new Problem(400, "no section '" + section + "' in the built-in or uploaded section tables");
                }
            } catch (AnalysisException e) {
                throw new Problem(400, e.getMessage());
            }
            picks.remove(layer);
            picks.put(layer, section.strip());
        }
        reanalyse(() -> {
            picks.remove(layer);
            if (old != null) {
                picks.put(layer, old);
            }
        });
    }

    /** Re-runs the engine on every drawing already read; on failure calls {@code undo} and answers 400. */
    private void reanalyse(Runnable undo) throws Problem {
        settingsVersion++;
        List<Report> fresh = new ArrayList<>();
        List<LoadedDrawing> done = new ArrayList<>();
        try {
            AnalysisSettings settings = settings();
            for (LoadedDrawing d : drawings) {
                if (d.status == LoadedDrawing.Status.DONE) {
                    fresh.add(Report.of(Analyzer.analyze(d.drawing, settings)));
                    done.add(d);
                }
            }
        } catch (AnalysisException e) {
            undo.run();
            throw new Problem(400, e.getMessage());
        }
        for (int i = 0; i < done.size(); i++) {
            done.get(i).report = fresh.get(i);
            done.get(i).revision++;
        }
    }
}
