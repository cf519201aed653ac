package org.linemass.app.serve;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Locale;
import java.util.Set;

/**
 * Decides whether a request may be served. Every request must name this server in its
 * {@code Host} header (an address it listens on, or {@code localhost} when on the loopback
 * address), which keeps out pages that rebind their own host name to this machine. A request
 * that changes state (anything but GET and HEAD) must also come from a page of this server (an
 * {@code Origin} equal to {@code http://} and its {@code Host}) and carry the random token of this
 * start in the {@value #TOKEN_HEADER} header; another page on the same machine cannot read the
 * token, and a cross-site request cannot set the header without a preflight this server never
 * grants.
 */
final class RequestGuard {

    static final String TOKEN_HEADER = "X-Linemass-Token";

    private final Set<String> hosts;
    private final byte[] token;

    /**
     * @param hosts the accepted {@code Host} values, lower case, each with its port
     * @param token this start's token
     */
    RequestGuard(Set<String> hosts, String token) {
        this.hosts = Set.copyOf(hosts);
        this.token = token.getBytes(StandardCharsets.UTF_8);
    }

    /** The Host values for a server listening on {@code bindHost}:{@code port}. */
    static Set<String> hostsFor(String bindHost, int port, boolean loopback) {
        java.util.Set<String> h = new java.util.HashSet<>();
        String b = bindHost.toLowerCase(Locale.ROOT);
        h.add((b.contains(":") && !b.startsWith("[") ? "[" + b + "]" : b) + ":" + port);
        if (loopback) {
            h.add("127.0.0.1:" + port);
            h.add("localhost:" + port);
            h.add("[::1]:" + port);
        }
        return h;
    }

    /** Checks any request. */
    void host(String host) throws Problem {
        if (host == null || !hosts.contains(host.toLowerCase(Locale.ROOT))) {
            throw new Problem(421, "this server answers only to its own address, not to host '"
                    + (host == null ? "" : host) + "'");
        }
    }

    /** Checks a state-changing request. */
    void change(String host, String origin, String sentToken) throws Problem {
        host(host);
        if (origin == null || !origin.equalsIgnoreCase("http://" + host)) {
            throw new Problem(403, "refused: the request does not come from this server's own page (Origin "
                    + (origin == null ? "missing" : "'" + origin + "'") + ")");
        }
        if (sentToken == null || !MessageDigest.isEqual(token, sentToken.getBytes(StandardCharsets.UTF_8))) {
            throw new Problem(403, "refused: the page's token is missing or wrong; reload the page");
        }
    }
}
