package org.annalist.brief;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import javax.imageio.ImageIO;
import org.annalist.render.Images;

/**
 * The check a logo must pass before a brief is made: a regular file of at most
 * {@link Images#MAX_BYTES} that the PDF can embed as an image, of at most {@link Images#MAX_PIXELS}
 * pixels as its header declares them, checked before anything decodes it.
 */
public final class Logo {

    private Logo() {
    }

    /** @return what is wrong with {@code logo}, or empty when it is a PNG, JPEG or GIF image within the limits */
    public static Optional<String> problem(Path logo) {
        if (!Files.exists(logo)) {
            return Optional.of("no such file: " + logo);
        }
        if (!Files.isRegularFile(logo)) {
            return Optional.of("logo " + logo + " is not a regular file; expected a PNG, JPEG or GIF file");
        }
        try {
            long size = Files.size(logo);
            if (size > Images.MAX_BYTES) {
                return Optional.of("logo " + logo.getFileName() + " has " + size + " bytes; the limit is "
                        + Images.MAX_BYTES / (1024 * 1024) + " MB");
            }
            Optional<long[]> declared;
            try (InputStream in = Files.newInputStream(logo)) {
                declared = Images.declaredSize(in);
            }
            if (declared.isEmpty()) {
                return Optional.of("logo " + logo.getFileName() + " is not an image; expected a PNG, JPEG or GIF file");
            }
            Images.checkPixels(declared.get());
            // decoded only now that its size is known to be bounded: a file that says it is an image but is not
            return ImageIO.read(logo.toFile()) == null
                    ? Optional.of("logo " + logo.getFileName() + " is not an image; expected a PNG, JPEG or GIF file")
                    : Optional.empty();
        } catch (Images.TooLarge e) {
            return Optional.of("logo " + logo.getFileName() + " is too large: " + e.getMessage());
        } catch (IOException | RuntimeException e) {
            return Optional.of("logo " + logo.getFileName() + " cannot be read as an image: " + e.getMessage());
        }
    }
}
