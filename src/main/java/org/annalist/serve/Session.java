package org.annalist.serve;

import java.io.IOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.MessageDigest;
import java.security.SecureRandom;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.annalist.brief.BriefPipeline;
import org.annalist.brief.SeriesFiles;

/**
 * One browser's work: its files (uploaded into its own temporary folder), the briefs it made and
 * the routines it ran, and the token its pages carry for every state-changing request. Ended when
 * the user says so, when unused too long, or when the server stops: its folder is deleted then.
 */
final class Session {

    private static final SecureRandom RANDOM = new SecureRandom();

    private final String id;
    private final String token;
    private final Path folder;
    /** Files read once per session; a new setting re-analyses the series already read. */
    private final SeriesFiles read = new SeriesFiles(this::shownAs);
    private final BriefPipeline pipeline = new BriefPipeline(read);
    private final Map<String, OpenFile> files = new LinkedHashMap<>();
    private final Map<String, BriefExtras> extras = new LinkedHashMap<>();
    private final Map<String, MadeBrief> briefs = new LinkedHashMap<>();
    private final Map<String, RoutineRun> runs = new LinkedHashMap<>();
    private final AtomicInteger counter = new AtomicInteger();
    private volatile long lastUsed = System.nanoTime();

    Session(Path root) throws IOException {
        this.id = randomHex();
        this.token = randomHex();
        this.folder = Files.createDirectory(root.resolve("s-" + id.substring(0, 12)));
    }

    static String randomHex() {
        byte[] bytes = new byte[24];
        RANDOM.nextBytes(bytes);
        return HexFormat.of().formatHex(bytes);
    }

    String id() {
        return id;
    }

    String token() {
        return token;
    }

    /** Whether {@code sent} is this session's token, compared in constant time. */
    boolean tokenMatches(String sent) {
        return sent != null && MessageDigest.isEqual(sent.getBytes(java.nio.charset.StandardCharsets.UTF_8),
                token.getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    Path folder() {
        return folder;
    }

    /**
     * How briefs and messages name a file: one of this session's (an upload, kept in a folder of its
     * own under the name the user's file has) by that name alone, as the command line names a file
     * of that name in the current folder; the server's temporary folder is never printed.
     */
    private String shownAs(Path file) {
        return file.startsWith(folder) ? file.getFileName().toString() : file.toString();
    }

    BriefPipeline pipeline() {
        return pipeline;
    }

    /** The files this session read, each once. */
    SeriesFiles read() {
        return read;
    }

    void touch() {
        lastUsed = System.nanoTime();
    }

    long idleNanos() {
        return System.nanoTime() - lastUsed;
    }

    /** A new id for a file, brief or run of this session: a letter and a number, never a path. */
    String nextId(char kind) {
        return kind + Integer.toString(counter.incrementAndGet());
    }

    /** A new folder inside the session's folder. */
    Path newFolder(String name) throws IOException {
        return Files.createDirectory(folder.resolve(name));
    }

    synchronized void add(OpenFile file) {
        files.put(file.id(), file);
    }

    synchronized Optional<OpenFile> file(String fileId) {
        return Optional.ofNullable(files.get(fileId));
    }

    synchronized List<OpenFile> files() {
        return List.copyOf(files.values());
    }

    /** The logo and holidays file given for the briefs of an open file (none until the user gives them). */
    synchronized BriefExtras extras(String fileId) {
        return extras.getOrDefault(fileId, BriefExtras.NONE);
    }

    synchronized void extras(String fileId, BriefExtras given) {
        extras.put(fileId, given);
    }

    synchronized void close(String fileId) {
        extras.remove(fileId);
        OpenFile file = files.remove(fileId);
        if (file != null) {
            delete(file.stored().getParent());
        }
    }

    synchronized void add(MadeBrief brief) {
        briefs.put(brief.id(), brief);
    }

    synchronized Optional<MadeBrief> brief(String briefId) {
        return Optional.ofNullable(briefs.get(briefId));
    }

    synchronized void add(RoutineRun run) {
        runs.put(run.id(), run);
    }

    synchronized Optional<RoutineRun> run(String runId) {
        return Optional.ofNullable(runs.get(runId));
    }

    synchronized List<RoutineRun> runs() {
        return List.copyOf(runs.values());
    }

    /** Ends the session: its files, briefs and results are deleted. */
    synchronized void end() {
        files.clear();
        extras.clear();
        briefs.clear();
        runs.clear();
        delete(folder);
    }

    /** Deletes a folder and what it holds, links as links (never what they point to). */
    static void delete(Path folder) {
        if (!Files.exists(folder, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try {
            Files.walkFileTree(folder, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                    Files.deleteIfExists(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path dir, IOException e) throws IOException {
                    Files.deleteIfExists(dir);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            // a file held open elsewhere: the rest is gone, and the temporary folder is the system's to clear
        }
    }
}
