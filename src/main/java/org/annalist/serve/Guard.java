package org.annalist.serve;

import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.eclipse.jetty.http.HttpHeader;

/**
 * What a request must show before it is served. Its {@code Host} must be this server's own
 * address: a page of another site that has a name of its own resolve to 127.0.0.1 (DNS rebinding)
 * sends its own name, and is refused. A state-changing request (every POST) must come from a page
 * of this server: an {@code Origin}, when the browser sends one, must be this server, and the form
 * must carry the session's token, which only this server's pages hold.
 */
final class Guard {

    private final Set<String> hosts;

    Guard(Set<String> hosts) {
        this.hosts = hosts;
    }

    /** Whether the request's Host header names this server. */
    boolean hostAllowed(Exchange exchange) {
        Optional<String> host = exchange.header(HttpHeader.HOST);
        return host.isPresent() && hosts.contains(host.get().strip().toLowerCase(Locale.ROOT));
    }

    /** Whether a browser's Origin (absent from some clients) names this server. */
    boolean originAllowed(Exchange exchange) {
        Optional<String> origin = exchange.header(HttpHeader.ORIGIN);
        if (origin.isEmpty()) {
            return true;
        }
        String o = origin.get().strip().toLowerCase(Locale.ROOT);
        return o.startsWith("http://") && hosts.contains(o.substring("http://".length()));
    }

    /** Whether the token sent is the session's. */
    static boolean tokenAllowed(Session session, Optional<String> sent) {
        return sent.isPresent() && session.tokenMatches(sent.get());
    }
}
