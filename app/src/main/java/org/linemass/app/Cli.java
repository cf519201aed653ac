package org.linemass.app;

import java.io.IOException;
import java.lang.reflect.Constructor;
import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.linemass.errors.InternalException;
import org.linemass.importer.DxfInputException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * Builds the picocli command tree for an {@link AppContext} and runs it. Usage errors, bad input
 * ({@link DxfInputException}, {@link AnalysisException}, {@link InputProblem}, I/O failures) give
 * one line on stderr and exit 2, as does running out of heap or stack on a drawing too large for
 * the JVM's limits; anything else is a bug ({@link InternalException}, and also an
 * {@link IllegalArgumentException} that reaches this far: the commands turn every bad value a user
 * gives into an {@link InputProblem} first, so one left over was a bad argument between two parts
 * of linemass): one line asking for a report, exit 3.
 * With {@code --debug} the stack trace follows the line.
 */
public final class Cli {

    private Cli() {
    }

    /** Runs {@code linemass args...} and returns the exit code. */
    public static int run(AppContext ctx, String... args) {
        CommandLine cl = new CommandLine(new LinemassCommand(), new Factory(ctx));
        cl.setOut(ctx.out());
        cl.setErr(ctx.err());
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setParameterExceptionHandler(usage(ctx));
        cl.setExecutionExceptionHandler(failure(ctx));
        int code;
        try {
            code = cl.execute(args);
        } catch (OutOfMemoryError | StackOverflowError e) {
            // a command that did not catch it itself (writing reports, say): still one line
            ctx.err().println("linemass: " + OutOfResources.what(e));
            code = ExitCodes.BAD_INPUT;
        }
        ctx.out().flush();
        ctx.err().flush();
        return code;
    }

    private static IParameterExceptionHandler usage(AppContext ctx) {
        return (ParameterException e, String[] args) -> {
            String name = e.getCommandLine().getCommandName();
            ctx.err().println("linemass: " + oneLine(e.getMessage()) + suggestion(e) + " (see 'linemass "
                    + ("linemass".equals(name) ? "" : name + " ") + "--help')");
            if (debug(args)) {
                e.printStackTrace(ctx.err());
            }
            ctx.err().flush();
            return ExitCodes.BAD_INPUT;
        };
    }

    /** "; did you mean --json?" for a mistyped option or command, from picocli's own near-miss search. */
    static String suggestion(ParameterException e) {
        if (e instanceof CommandLine.UnmatchedArgumentException u) {
            List<String> near = u.getSuggestions();
            if (!near.isEmpty()) {
                return "; did you mean " + String.join(" or ", near.subList(0, Math.min(3, near.size()))) + "?";
            }
        }
        return "";
    }

    private static IExecutionExceptionHandler failure(AppContext ctx) {
        return (Exception e, CommandLine cmd, ParseResult parsed) -> {
            boolean bad = e instanceof DxfInputException || e instanceof AnalysisException
                    || e instanceof InputProblem || e instanceof IOException;
            if (bad) {
                ctx.err().println("linemass: " + oneLine(describe(e)));
            } else {
                String what = e instanceof InternalException ? oneLine(e.getMessage())
                        : e.getClass().getSimpleName() + ": " + oneLine(e.getMessage());
                ctx.err().println("linemass: internal error (" + what
                        + "); please report it with the drawing and the command line");
            }
            if (debug(parsed.originalArgs().toArray(new String[0]))) {
                e.printStackTrace(ctx.err());
            }
            ctx.err().flush();
            return bad ? ExitCodes.BAD_INPUT : ExitCodes.INTERNAL;
        };
    }

    private static boolean debug(String[] args) {
        for (String a : args) {
            if ("--debug".equals(a)) {
                return true;
            }
        }
        return false;
    }

    /** The message, made readable for file-system errors whose message is only a path. */
    static String describe(Exception e) {
        if (e instanceof java.nio.file.NoSuchFileException f) {
            return f.getFile() + ": no such file or folder";
        }
        if (e instanceof java.nio.file.AccessDeniedException f) {
            return f.getFile() + ": permission denied";
        }
        if (e instanceof java.nio.file.FileSystemException f && f.getReason() == null) {
            String kind = e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                    .toLowerCase(java.util.Locale.ROOT);
            return f.getFile() + ": " + kind;
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }

    static String oneLine(String s) {
        return s == null ? "" : s.replace("\r\n", " ").replace('\n', ' ').replace('\r', ' ').strip();
    }

    /** Creates command classes that take the context in their constructor. */
    private static final class Factory implements CommandLine.IFactory {
        private final AppContext ctx;
        private final CommandLine.IFactory fallback = CommandLine.defaultFactory();

        Factory(AppContext ctx) {
            this.ctx = ctx;
        }

        @Override
        public <K> K create(Class<K> cls) throws Exception {
            try {
                Constructor<K> c = cls.getDeclaredConstructor(AppContext.class);
                return c.newInstance(ctx);
            } catch (NoSuchMethodException e) {
                return fallback.create(cls);
            }
        }
    }
}
