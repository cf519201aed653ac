package org.linemass.app.serve;

import java.security.SecureRandom;
import java.util.Base64;
import java.util.HashMap;
import java.util.Map;

/**
 * The open sessions, one per browser tab, keyed by a random id the tab keeps in memory (no cookie,
 * so two tabs never share drawings). A session idle for longer than the limit is dropped; a new
 * one beyond the limit of sessions is refused. Thread-safe.
 */
final class Sessions {

    private final Map<String, Session> open = new HashMap<>();
    private final SecureRandom random = new SecureRandom();
    private final AnalysisSetup setup;
    private final ServeLimits limits;

    Sessions(AnalysisSetup setup, ServeLimits limits) {
        this.setup = setup;
        this.limits = limits;
    }

    synchronized Session create() throws Problem {
        dropIdle();
        if (open.size() >= limits.maxSessions()) {
            throw new Problem(429, "the server already serves " + open.size() + " open pages, its limit; close a "
                    + "tab or wait until one has been idle for " + limits.idleMillis() / 60_000 + " minutes");
        }
        Session s = new Session(randomId(random), setup, limits);
        open.put(s.id, s);
        return s;
    }

    /** The session of {@code id}, refreshed; 404 with a hint when it is unknown or has ended. */
    synchronized Session get(String id) throws Problem {
        dropIdle();
        Session s = id == null ? null : open.get(id);
        if (s == null) {
            throw new Problem(404, "this page's session has ended (the server was restarted, or the page was idle "
                    + "for more than " + limits.idleMillis() / 60_000 + " minutes); reload the page");
        }
        s.touch();
        return s;
    }

    synchronized void close(String id) {
        Session s = open.remove(id);
        if (s != null) {
            s.close();
        }
    }

    synchronized void closeAll() {
        open.values().forEach(Session::close);
        open.clear();
    }

    synchronized int size() {
        return open.size();
    }

    private void dropIdle() {
        long now = System.currentTimeMillis();
        open.values().removeIf(s -> {
            boolean idle = now - s.lastUsed() > limits.idleMillis();
            if (idle) {
                s.close();
            }
            return idle;
        });
    }

    /** 128 random bits, URL-safe base64 without padding. */
    static String randomId(SecureRandom random) {
        byte[] b = new byte[16];
        random.nextBytes(b);
        return Base64.getUrlEncoder().withoutPadding().encodeToString(b);
    }
}
