package org.annalist.brief;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import javax.imageio.ImageIO;

/** The check a logo must pass before a brief is made: a file the PDF can embed as an image. */
public final class Logo {

    private Logo() {
    }

    /** @return what is wrong with {@code logo}, or empty when it is a PNG, JPEG or GIF image */
    public static Optional<String> problem(Path logo) {
        if (!Files.isRegularFile(logo)) {
            return Optional.of("no such file: " + logo);
        }
        try {
            return ImageIO.read(logo.toFile()) == null
                    ? Optional.of("logo " + logo.getFileName() + " is not an image; expected a PNG, JPEG or GIF file")
                    : Optional.empty();
        } catch (IOException e) {
            return Optional.of("logo " + logo.getFileName() + " cannot be read as an image: " + e.getMessage());
        }
    }
}
