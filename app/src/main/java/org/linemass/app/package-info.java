/**
 * The command line: {@code linemass check | demo | sections | integrate}. Each subcommand is a
 * small picocli {@code Callable<Integer>}; shared options live in mixins; everything is printed
 * through the writers of an {@link org.linemass.app.AppContext} so tests capture it, and the
 * analysis itself sits behind {@link org.linemass.app.DrawingPipeline} so tests can run the
 * commands on prepared results. Exit codes: 0 done, 1 findings at or above the chosen severity,
 * 2 bad input or usage (one line on stderr), 3 internal error.
 */
package org.linemass.app;
