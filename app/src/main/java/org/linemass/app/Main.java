package org.linemass.app;

/** Entry point of the {@code linemass} command. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(Cli.run(AppContext.system(), args));
    }
}
