package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class ProgressTest {

    @Test
    void progress_notInteractive_printsNothing() throws InterruptedException {
        StringWriter err = new StringWriter();
        try (Progress p = new Progress(new PrintWriter(err), 2, false)) {
            Thread.sleep(Progress.DELAY_MS + 200);
            p.step("a.dxf");
        }
        assertEquals("", err.toString());
    }

    @Test
    void progress_quickWork_printsNothing() {
        StringWriter err = new StringWriter();
        try (Progress p = new Progress(new PrintWriter(err), 2, true)) {
            p.step("a.dxf");
            p.step("b.dxf");
        }
        assertEquals("", err.toString());
    }

    @Test
    void progress_slowInteractiveWork_showsBarOnStderr() throws InterruptedException {
        StringWriter err = new StringWriter();
        try (Progress p = new Progress(new PrintWriter(err), 3, true)) {
            p.step("a.dxf");
            Thread.sleep(Progress.DELAY_MS + 500);
            p.step("b.dxf");
        }
        assertTrue(err.toString().contains("weighing"), err.toString());
    }

    @Test
    void message_namesTheDrawingRunningLongest() {
        long[] now = {0};
        try (Progress p = new Progress(new PrintWriter(new StringWriter()), 3, false, () -> now[0])) {
            p.started(0, "a.dxf");
            now[0] = 1_000_000_000L;
            p.started(1, "b.dxf");
            now[0] = 5_500_000_000L;
            assertEquals("2 running, longest a.dxf (5 s)", p.message());
            p.finished(0);
            assertEquals("1 running, longest b.dxf (4 s)", p.message());
            p.finished(1);
            assertEquals("b.dxf", p.message(), "the last one done when none runs");
        }
    }

    @Test
    void stage_oneLongDrawing_barMovesStageByStage_messageNamesTheStage() {
        long[] now = {0};
        try (Progress p = new Progress(new PrintWriter(new StringWriter()), 1, false, () -> now[0])) {
            p.started(0, "mesh.dxf");
            assertEquals(0, p.steps());
            p.stage(0, Progress.READING);
            p.stage(0, "expanding blocks and adding up layers");
            p.stage(0, "joining and checking pieces");
            assertEquals(3, p.steps(), "three of the drawing's four steps entered");
            now[0] = 7_000_000_000L;
            assertEquals("1 running, longest mesh.dxf (7 s, joining and checking pieces)", p.message());
            p.finished(0);
            assertEquals(Progress.STAGES, p.steps(), "a finished drawing counts all its steps");
        }
    }

    @Test
    void stage_realEngine_toldEveryStage() throws Exception {
        // the demo drawing through the real pipeline: reading and the engine's three stages, in order
        java.util.List<String> stages = new java.util.ArrayList<>();
        java.nio.file.Path demo = CorpusJsonTest.repo().resolve("testdata/demo/garden-planter.dxf");
        PageSetup setup = PageSetup.defaults();
        new EnginePipeline().analyse(demo, setup.importOptions(), setup.settings(null, java.util.List.of()), stages::add);
        assertEquals(java.util.List.of(Progress.READING, "expanding blocks and adding up layers",
                "joining and checking pieces", "grouping marks and writing totals"), stages);
        assertEquals(Progress.STAGES, stages.size());
    }
}
