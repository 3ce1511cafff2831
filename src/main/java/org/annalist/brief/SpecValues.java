package org.annalist.brief;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The values of one spec's keys, read from the YAML nodes and checked, each mistake a
 * {@link SpecProblem} at the node's line and column: single values, paths inside the spec's folder,
 * maps by series name, and words from a {@link Words} choice.
 */
final class SpecValues {

    private final Path spec;
    private final Path folder;

    /**
     * @param spec   the spec file, named in every message
     * @param folder where its relative paths resolve
     */
    SpecValues(Path spec, Path folder) {
        this.spec = spec;
        this.folder = folder;
    }

    /** A single value, trimmed. */
    String text(YamlTree.Node node, String what) {
        if (node instanceof YamlTree.Scalar s && s.text() != null && !s.text().isBlank()) {
            return s.text().trim();
        }
        throw new SpecProblem(spec, node.line(), node.column(), what + ": expected a single value");
    }

    Optional<String> optionalText(YamlTree.Mapping m, String key) {
        YamlTree.Node node = m.entries().get(key);
        return node == null ? Optional.empty() : Optional.of(text(node, key));
    }

    /**
     * One of a choice's words: the value it names, or empty for {@link Words#AUTO} and when the key
     * is absent. {@code KEY 'WORD'; expected …} otherwise.
     */
    <T> Optional<T> optionalWord(YamlTree.Mapping m, String key, Words<T> words) {
        Optional<String> word = optionalText(m, key);
        if (word.isEmpty() || words.isAuto(word.get())) {
            return Optional.empty();
        }
        return Optional.of(words.valueOf(word.get()).orElseThrow(() -> problemAt(m.entries().get(key),
                key + " '" + word.get() + "'; expected " + words.listed())));
    }

    /** {@code true} or {@code false}, written so. */
    Optional<Boolean> optionalYesNo(YamlTree.Mapping m, String key) {
        Optional<String> text = optionalText(m, key);
        if (text.isPresent() && !text.get().equals("true") && !text.get().equals("false")) {
            throw problemAt(m.entries().get(key), key + " '" + text.get() + "'; expected true or false");
        }
        return text.map(Boolean::parseBoolean);
    }

    /**
     * A path from the spec, resolved against its folder; a relative path that climbs out of the
     * folder tree is refused (an absolute one is the user's explicit choice).
     */
    Path path(YamlTree.Node node, String key) {
        String text = text(node, key);
        Path given;
        try {
            given = Path.of(text);
        } catch (InvalidPathException e) {
            throw new SpecProblem(spec, node.line(), node.column(), key + " '" + text.replace("\0", "\\0")
                    + "' is not a path (" + e.getReason() + "); expected a file name");
        }
        if (given.isAbsolute()) {
            return given.normalize();
        }
        Path resolved = folder.resolve(given).normalize();
        if (!resolved.startsWith(folder)) {
            throw new SpecProblem(spec, node.line(), node.column(), key + " '" + text + "' leaves the spec's folder; "
                    + "write an absolute path to use a file elsewhere");
        }
        // Where the path really leads: a symbolic link inside the folder may point anywhere.
        Optional<Path> real = OutputFiles.realOrNearest(resolved);
        Optional<Path> realFolder = OutputFiles.realOrNearest(folder);
        if (real.isEmpty() || realFolder.isEmpty() || !real.get().startsWith(realFolder.get())) {
            throw new SpecProblem(spec, node.line(), node.column(), key + " '" + text + "' leads out of the spec's "
                    + "folder through a symbolic link; write an absolute path to use a file elsewhere");
        }
        return resolved;
    }

    /** A path, as {@link #path}, to a file that exists. */
    Path existingFile(YamlTree.Node node, String key) {
        Path file = path(node, key);
        if (!Files.isRegularFile(file)) {
            throw new SpecProblem(spec, node.line(), node.column(), "no such file: " + file);
        }
        return file;
    }

    /** The logo, checked to be an image the PDF can embed. */
    Optional<Path> logo(YamlTree.Node node) {
        if (node == null) {
            return Optional.empty();
        }
        Path logo = path(node, "logo");
        Logo.problem(logo).ifPresent(problem -> {
            throw problemAt(node, problem);
        });
        return Optional.of(logo);
    }

    /** A mapping of series name to a single value ({@code unit}, {@code measure}), in the spec's order. */
    Map<String, String> names(YamlTree.Node node, String key) {
        Map<String, String> out = new LinkedHashMap<>();
        if (node == null) {
            return out;
        }
        YamlTree.Mapping m = mapping(node, "'" + key + "' (series name: value)");
        for (Map.Entry<String, YamlTree.Node> e : m.entries().entrySet()) {
            out.put(e.getKey(), text(e.getValue(), key + " of " + e.getKey()));
        }
        return out;
    }

    YamlTree.Mapping mapping(YamlTree.Node node, String what) {
        if (node instanceof YamlTree.Mapping m) {
            return m;
        }
        throw new SpecProblem(spec, node.line(), node.column(), what + ": expected a mapping of keys and values");
    }

    SpecProblem problemAt(YamlTree.Node node, String message) {
        return new SpecProblem(spec, node.line(), node.column(), message);
    }
}
