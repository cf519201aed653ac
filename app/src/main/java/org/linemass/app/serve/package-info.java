/**
 * The local web page of {@code linemass serve}: a small HTTP server (Javalin) bound to the
 * loopback address by default that takes drawings dropped on a page, analyses them with the
 * same engine and report writers as the command line, and lets the user pick a section per layer.
 *
 * <p>Each browser tab has its own {@link org.linemass.app.serve.Session} (drawings, uploaded
 * section table and assignment file, picks), held in memory only and dropped when the tab closes
 * or stays idle. A drawing is read once; a new pick re-runs only the engine on the cached drawing.
 * {@link org.linemass.app.serve.RequestGuard} turns away requests for another host name, and
 * state-changing requests without a same-origin {@code Origin} and the per-start token. No part of
 * a request is ever used as a file path: page assets are looked up by name in a fixed table.
 */
package org.linemass.app.serve;
