package org.annalist.serve;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import org.annalist.narrative.WebPages;
import org.eclipse.jetty.server.FormFields;
import org.eclipse.jetty.util.Fields;

/**
 * Which page answers which address, and what every page shares: the session (made on the first
 * visit, required for every POST), the token check of every POST, the page frame's facts, and the
 * answers for what is refused. The pages themselves are {@link FilePages} and {@link RoutinePages}.
 *
 * <p>Addresses carry ids the server gave ({@code f1}, {@code b2}, {@code r3}), never paths; the
 * two places a name reaches a file (a spec of the served folder, a download) go through
 * {@link SafePaths} and a list of the names the server itself offered.
 */
final class Routes {

    /** The refusals, worded by the error page. */
    enum Refusal {
        NOT_FOUND(404), FOREIGN_HOST(403), NO_TOKEN(403), NO_SESSION(403), TOO_LARGE(413), BAD_REQUEST(400),
        BUSY(503), INTERNAL(500);

        final int status;

        Refusal(int status) {
            this.status = status;
        }
    }

    private static final List<String> STATIC = List.of("workbench.css", "workbench.js");

    private final Settings settings;
    private final Sessions sessions;
    private final WebPages pages = new WebPages();
    private final FilePages files;
    private final ExtrasUpload extras;
    private final RoutinePages routine;

    Routes(Settings settings, Sessions sessions, ExecutorService routines) {
        this.settings = settings;
        this.sessions = sessions;
        this.files = new FilePages(this, settings);
        this.extras = new ExtrasUpload(this, files, settings);
        this.routine = new RoutinePages(this, settings, routines);
    }

    void handle(Exchange ex, Guard guard) {
        try {
            if (!guard.hostAllowed(ex)) {
                refuse(ex, Refusal.FOREIGN_HOST, null);
                return;
            }
            List<String> path = ex.path();
            if (path.size() == 2 && path.get(0).equals("static") && ex.method().equals("GET")) {
                serveStatic(ex, path.get(1));
                return;
            }
            Optional<Session> found = sessions.find(ex.sessionCookie().orElse(null));
            if (!ex.method().equals("GET") && !ex.isPost()) {
                refuse(ex, Refusal.BAD_REQUEST, null);
                return;
            }
            if (ex.isPost()) {
                if (found.isEmpty()) {
                    refuse(ex, Refusal.NO_SESSION, null);
                    return;
                }
                if (!guard.originAllowed(ex)) {
                    refuse(ex, Refusal.NO_TOKEN, found.get());
                    return;
                }
            }
            Session session;
            if (found.isPresent()) {
                session = found.get();
            } else {
                Optional<Session> opened = sessions.open();
                if (opened.isEmpty()) {
                    refuse(ex, Refusal.BUSY, null);
                    return;
                }
                session = opened.get();
                ex.setSessionCookie(session.id());
            }
            route(ex, session, path);
        } catch (IOException | RuntimeException e) {
            // the console that started the server is told what went wrong, in one line (--debug: the trace)
            System.err.println("annalist serve: internal error: " + String.valueOf(e).replaceAll("\\s*\\R\\s*", " "));
            if (Boolean.getBoolean("annalist.debug")) {
                e.printStackTrace();
            }
            refuse(ex, Refusal.INTERNAL, null);
        }
    }

    private void route(Exchange ex, Session session, List<String> p) throws IOException {
        String first = p.isEmpty() ? "" : p.get(0);
        boolean post = ex.isPost();
        // every POST but the uploads (whose token travels in their multipart body) shows the token first
        boolean multipart = first.equals("open") || first.equals("file") && p.size() == 3 && p.get(2).equals("extras");
        Fields fields = new Fields();
        if (post && !multipart) {
            Optional<Fields> form = form(ex, session);
            if (form.isEmpty()) {
                return;
            }
            fields = form.get();
        }
        switch (first) {
            case "" -> {
                if (!post) {
                    files.home(ex, session, List.of(), "");
                    return;
                }
            }
            case "open" -> {
                if (post && p.size() == 1) {
                    files.upload(ex, session);
                    return;
                }
            }
            case "file" -> {
                Optional<OpenFile> file = p.size() >= 2 ? session.file(p.get(1)) : Optional.empty();
                if (file.isPresent()) {
                    if (!post && p.size() == 2) {
                        files.check(ex, session, file.get());
                        return;
                    }
                    if (post && p.size() == 3 && p.get(2).equals("extras")) {
                        extras.upload(ex, session, file.get());
                        return;
                    }
                    if (post && p.size() == 3 && p.get(2).equals("close")) {
                        session.close(file.get().id());
                        ex.redirect("/");
                        return;
                    }
                    Optional<Integer> index = p.size() >= 4 && p.get(2).equals("series")
                            ? FilePages.index(p.get(3), file.get()) : Optional.empty();
                    if (index.isPresent() && !post && p.size() == 4) {
                        files.series(ex, session, file.get(), index.get());
                        return;
                    }
                    if (index.isPresent() && post && p.size() == 5 && p.get(4).equals("brief")) {
                        files.makeBrief(ex, session, file.get(), index.get(), fields);
                        return;
                    }
                }
            }
            case "brief" -> {
                Optional<MadeBrief> brief = p.size() >= 2 ? session.brief(p.get(1)) : Optional.empty();
                if (brief.isPresent() && !post) {
                    if (p.size() == 2) {
                        files.brief(ex, session, brief.get());
                        return;
                    }
                    if (p.size() == 4 && p.get(2).equals("page")) {
                        files.pageImage(ex, brief.get(), p.get(3));
                        return;
                    }
                    if (p.size() == 4 && p.get(2).equals("file")) {
                        files.download(ex, brief.get(), p.get(3));
                        return;
                    }
                }
            }
            case "routine" -> {
                if (!post && p.size() == 1) {
                    routine.specs(ex, session);
                    return;
                }
                if (!post && p.size() == 2 && p.get(1).equals("spec")) {
                    routine.spec(ex, session, ex.query("name").orElse(""));
                    return;
                }
                if (post && p.size() == 2 && p.get(1).equals("run")) {
                    routine.run(ex, session, Optional.ofNullable(fields.getValue("name")).orElse(""));
                    return;
                }
            }
            case "run" -> {
                Optional<RoutineRun> run = p.size() >= 2 ? session.run(p.get(1)) : Optional.empty();
                if (run.isPresent() && !post) {
                    if (p.size() == 2) {
                        routine.progress(ex, session, run.get());
                        return;
                    }
                    if (p.size() == 4 && p.get(2).equals("file")) {
                        routine.download(ex, run.get(), p.get(3));
                        return;
                    }
                }
            }
            case "end" -> {
                if (post && p.size() == 1) {
                    sessions.end(session);
                    ex.expireSessionCookie();
                    ex.redirect("/");
                    return;
                }
            }
            default -> {
            }
        }
        refuse(ex, Refusal.NOT_FOUND, session);
    }

    /** The form of a POST when it carries the session's token; refused (and answered) otherwise. */
    private Optional<Fields> form(Exchange ex, Session session) {
        Fields fields;
        try {
            fields = FormFields.getFields(ex.request());
        } catch (RuntimeException e) {
            refuse(ex, Refusal.BAD_REQUEST, session);
            return Optional.empty();
        }
        if (!Guard.tokenAllowed(session, Optional.ofNullable(fields.getValue("token")))) {
            refuse(ex, Refusal.NO_TOKEN, session);
            return Optional.empty();
        }
        return Optional.of(fields);
    }

    private void serveStatic(Exchange ex, String name) throws IOException {
        if (!STATIC.contains(name)) {
            refuse(ex, Refusal.NOT_FOUND, null);
            return;
        }
        try (InputStream in = Routes.class.getResourceAsStream("/web/static/" + name)) {
            if (in == null) {
                refuse(ex, Refusal.NOT_FOUND, null);
                return;
            }
            ex.send(200, name.endsWith(".css") ? "text/css; charset=utf-8" : "text/javascript; charset=utf-8",
                    in.readAllBytes());
        }
    }

    /** Renders page {@code template} with the frame's facts beside the page's own. */
    void page(Exchange ex, int status, String template, Session session, Map<String, Object> model) {
        Map<String, Object> all = new HashMap<>(model);
        all.put("token", session == null ? "" : session.token());
        all.put("limitMb", settings.maxUploadMegabytes());
        all.put("openFiles", session == null ? List.of() : session.files().stream()
                .map(f -> Map.of("id", f.id(), "name", f.name())).toList());
        ex.html(status, pages.render(template, all));
    }

    void refuse(Exchange ex, Refusal refusal, Session session) {
        try {
            page(ex, refusal.status, "refused.ftlh", session, Map.of("refusal", refusal.name()));
        } catch (RuntimeException | Error e) {
            ex.send(refusal.status, "text/plain; charset=utf-8", refusal.name().getBytes(StandardCharsets.UTF_8));
        }
    }

}
