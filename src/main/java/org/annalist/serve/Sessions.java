package org.annalist.serve;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The sessions of a running workbench, each with its folder under one temporary folder of the
 * server (readable by its owner only where the file system allows). A session unused for the idle
 * time is ended on the next sweep; {@link #endAll} deletes everything when the server stops.
 */
final class Sessions {

    /** More open sessions than this means something is making them, not people: the oldest work is kept. */
    static final int MAX_SESSIONS = 64;

    private final Path root;
    private final Duration idle;
    private final Map<String, Session> sessions = new ConcurrentHashMap<>();

    Sessions(Duration idle) throws IOException {
        this.idle = idle;
        Path made;
        try {
            made = Files.createTempDirectory("annalist-serve-",
                    PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rwx------")));
        } catch (UnsupportedOperationException e) {
            made = Files.createTempDirectory("annalist-serve-");
        }
        this.root = made;
    }

    Path root() {
        return root;
    }

    Optional<Session> find(String id) {
        if (id == null) {
            return Optional.empty();
        }
        Session session = sessions.get(id);
        if (session != null) {
            session.touch();
        }
        return Optional.ofNullable(session);
    }

    /** A new session, or empty when there are too many already. */
    Optional<Session> open() throws IOException {
        sweep();
        if (sessions.size() >= MAX_SESSIONS) {
            return Optional.empty();
        }
        Session session = new Session(root);
        sessions.put(session.id(), session);
        return Optional.of(session);
    }

    void end(Session session) {
        sessions.remove(session.id());
        session.end();
    }

    int size() {
        return sessions.size();
    }

    /** Ends the sessions unused for longer than the idle time. */
    void sweep() {
        for (Session s : sessions.values()) {
            if (s.idleNanos() > idle.toNanos()) {
                end(s);
            }
        }
    }

    /** Ends every session and deletes the server's temporary folder. */
    void endAll() {
        for (Session s : sessions.values()) {
            end(s);
        }
        Session.delete(root);
    }
}
