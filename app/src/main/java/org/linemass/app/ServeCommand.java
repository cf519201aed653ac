package org.linemass.app;

import java.net.InetAddress;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.linemass.app.serve.AnalysisSetup;
import org.linemass.app.serve.ServeLimits;
import org.linemass.app.serve.WebServer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code linemass serve}: a local web page to drop drawings on, pick sections and download the
 * reports. Prints the address and serves until stopped (Ctrl+C); opens no browser by itself.
 */
@Command(name = "serve", mixinStandardHelpOptions = true,
        description = {"Serve a page on this machine where drawings can be dropped, sections picked per layer and "
                + "the reports downloaded. Prints the address to open; Ctrl+C stops it.",
            "The drawing options below are the starting point of every page; a page adds its own section table, "
                + "assignment file and picks on top."})
final class ServeCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Mixin
    DrawingOptions drawing;

    @Option(names = "--host", paramLabel = "ADDRESS", description = "Address to listen on (default ${DEFAULT-VALUE}, "
            + "this machine only). Any other address lets other machines reach the page: a warning is printed.")
    String host = "127.0.0.1";

    @Option(names = "--port", paramLabel = "N", description = "Port to listen on (default ${DEFAULT-VALUE}; 0 picks "
            + "any free port, printed at start).")
    int port = 8350;

    @Option(names = "--max-upload", paramLabel = "SIZE", description = "Largest drawing or CSV file one upload may "
            + "be, e.g. 512MB, 2GB (default 512MB).")
    String maxUpload = "512MB";

    @Option(names = "--max-drawings", paramLabel = "N", description = "Most drawings one page holds "
            + "(default ${DEFAULT-VALUE}).")
    int maxDrawings = ServeLimits.DEFAULTS.maxDrawings();

    @Option(names = "--max-page-memory", paramLabel = "SIZE", description = "Most bytes of drawings one page holds "
            + "(default 2GB).")
    String maxPageMemory = "2GB";

    @Option(names = "--max-pages", paramLabel = "N", description = "Most pages (browser tabs) served at once "
            + "(default ${DEFAULT-VALUE}).")
    int maxPages = ServeLimits.DEFAULTS.maxSessions();

    private final AppContext ctx;

    ServeCommand(AppContext ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() throws Exception {
        if (port < 0 || port > 65535) {
            throw new InputProblem("--port must be 0 to 65535, got " + port);
        }
        ServeLimits limits;
        try {
            limits = new ServeLimits(size("--max-upload", maxUpload), maxDrawings, size("--max-page-memory",
                    maxPageMemory), maxPages, ServeLimits.DEFAULTS.idleMillis());
        } catch (IllegalArgumentException e) {
            throw new InputProblem(e.getMessage());
        }
        AnalysisSetup setup = new PageSetup(drawing, ctx.sections());
        InetAddress address = InetAddress.getByName(host);
        if (!address.isLoopbackAddress()) {
            ctx.err().println("linemass serve: warning: listening on " + host + ", so other machines that can reach "
                    + "this one can open the page and upload drawings to it");
        }
        CountDownLatch stopped = new CountDownLatch(1);
        try (WebServer server = WebServer.start(host, port, setup, limits, common.units())) {
            String shown = address.getHostAddress().contains(":") ? "[" + address.getHostAddress() + "]"
                    : address.getHostAddress();
            ctx.out().println("linemass serve: open http://" + shown + ":" + server.port() + "/ in a browser "
                    + "(Ctrl+C stops the server)");
            ctx.out().flush();
            Runtime.getRuntime().addShutdownHook(new Thread(stopped::countDown, "linemass-serve-stop"));
            stopped.await();
        }
        return ExitCodes.OK;
    }

    /** "512MB", "2 GB", "100kB", "1000" (bytes) to bytes; binary multiples (1 MB = 1024 kB). */
    static long size(String option, String text) throws InputProblem {
        String t = text.strip().toUpperCase(Locale.ROOT).replace(" ", "");
        long mult = 1;
        String[][] units = {{"KB", "1024"}, {"MB", "1048576"}, {"GB", "1073741824"}, {"K", "1024"}, {"M", "1048576"},
            {"G", "1073741824"}, {"B", "1"}};
        for (String[] u : units) {
            if (t.endsWith(u[0])) {
                mult = Long.parseLong(u[1]);
                t = t.substring(0, t.length() - u[0].length());
                break;
            }
        }
        try {
            double v = Double.parseDouble(t);
            long bytes = (long) (v * mult);
            if (!(v > 0) || bytes > Integer.MAX_VALUE - 16L && "--max-upload".equals(option)) {
                throw new InputProblem(option + " must be more than 0 and at most 2GB, got " + text);
            }
            return bytes;
        } catch (NumberFormatException e) {
            throw new InputProblem(option + " '" + text + "': expected a size such as 512MB or 2GB");
        }
    }
}
