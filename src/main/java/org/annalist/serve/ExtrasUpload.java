package org.annalist.serve;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.brief.Logo;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.DataProblemException;
import org.eclipse.jetty.http.MultiPart;
import org.eclipse.jetty.http.MultiPartFormData;

/**
 * A logo and a holidays file sent from a series' page for the briefs of its file: size-limited as
 * data files are, kept under the user's file name in a folder of their own, and checked exactly as
 * {@code brief --logo} and {@code --holidays} check them ({@link Logo#problem}, the holiday reader)
 * before they are used. A file that fails is deleted and its problem shown on the page.
 */
final class ExtrasUpload {

    private final Routes routes;
    private final FilePages pages;
    private final Settings settings;

    ExtrasUpload(Routes routes, FilePages pages, Settings settings) {
        this.routes = routes;
        this.pages = pages;
        this.settings = settings;
    }

    void upload(Exchange ex, Session session, OpenFile file) throws IOException {
        Path incoming = session.newFolder(session.nextId('u'));
        try {
            Optional<MultiPartFormData.Parts> form = MultipartForms.read(ex, session, routes, incoming, 20,
                    settings.maxUploadBytes(), 2 * settings.maxUploadBytes() + FilePages.FORM_SLACK);
            if (form.isEmpty()) {
                return;
            }
            try (MultiPartFormData.Parts parts = form.get()) {
                if (!session.tokenMatches(text(parts, "token", 200))) {
                    routes.refuse(ex, Routes.Refusal.NO_TOKEN, session);
                    return;
                }
                Optional<Integer> index = FilePages.index(text(parts, "index", 10), file);
                if (index.isEmpty()) {
                    routes.refuse(ex, Routes.Refusal.NOT_FOUND, session);
                    return;
                }
                SeriesSettings chosen = SeriesSettings.from(name -> Optional.ofNullable(parts.getFirst(name))
                        .map(p -> p.getContentAsString(StandardCharsets.UTF_8)));
                use(ex, session, file, index.get(), chosen, parts);
            }
        } finally {
            Session.delete(incoming);
        }
    }

    /** Checks the files sent, keeps those that pass in place of the earlier ones, and shows the page. */
    private void use(Exchange ex, Session session, OpenFile file, int index, SeriesSettings chosen,
                     MultiPartFormData.Parts parts) throws IOException {
        BriefExtras before = session.extras(file.id());
        Optional<Path> logo = text(parts, "droplogo", 10).isEmpty() ? before.logo() : Optional.empty();
        Optional<Path> holidays = text(parts, "dropholidays", 10).isEmpty() ? before.holidays() : Optional.empty();
        List<FileView.Problem> refused = new ArrayList<>();
        Optional<Path> newLogo = kept(session, file, parts.getFirst("logo"));
        if (newLogo.isPresent()) {
            Optional<String> problem = Logo.problem(newLogo.get());
            if (problem.isPresent()) {
                refused.add(FileView.Problem.of(new DataProblem(newLogo.get().toString(), 0, 0, problem.get())));
                Session.delete(newLogo.get().getParent());
            } else {
                logo = newLogo;
            }
        }
        Optional<Path> newHolidays = kept(session, file, parts.getFirst("holidays"));
        if (newHolidays.isPresent()) {
            try {
                session.read().holidays(newHolidays.get());
                holidays = newHolidays;
            } catch (DataProblemException problem) {
                problem.problems().stream().map(FileView.Problem::of).forEach(refused::add);
                Session.delete(newHolidays.get().getParent());
            }
        }
        session.extras(file.id(), new BriefExtras(logo, holidays));
        forgetUnused(before.logo(), logo);
        forgetUnused(before.holidays(), holidays);
        if (refused.isEmpty()) {
            String query = chosen.query();
            ex.redirect("/file/" + file.id() + "/series/" + index + (query.isEmpty() ? "" : "?" + query));
        } else {
            pages.series(ex, session, file, index, chosen, refused);
        }
    }

    /** A file part written under the user's file name into a new folder of the data file's; empty when none was chosen. */
    private static Optional<Path> kept(Session session, OpenFile file, MultiPart.Part part) throws IOException {
        if (part == null || part.getFileName() == null || part.getFileName().isBlank()) {
            return Optional.empty();
        }
        Path folder = java.nio.file.Files.createDirectory(file.stored().getParent().resolve(session.nextId('x')));
        Path stored = folder.resolve(SafePaths.uploadName(part.getFileName()));
        part.writeTo(stored);
        return Optional.of(stored);
    }

    private static void forgetUnused(Optional<Path> earlier, Optional<Path> now) {
        if (earlier.isPresent() && !earlier.equals(now)) {
            Session.delete(earlier.get().getParent());
        }
    }

    private static String text(MultiPartFormData.Parts parts, String name, int max) {
        MultiPart.Part part = parts.getFirst(name);
        String value = part == null ? "" : part.getContentAsString(StandardCharsets.UTF_8).strip();
        return value.length() > max ? value.substring(0, max) : value;
    }
}
