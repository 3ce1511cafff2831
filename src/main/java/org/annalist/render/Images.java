package org.annalist.render;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.Iterator;
import java.util.Locale;
import java.util.Optional;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;

/**
 * The limits an image must keep before anything decodes it: a file of at most {@link #MAX_BYTES}
 * and at most {@link #MAX_PIXELS} pixels as its header declares them (read with an ImageIO reader
 * without decoding), because a small file can declare an image of billions of pixels and decoding
 * it would take gigabytes.
 */
public final class Images {

    /** 40 megapixels (8000 × 5000), far above a logo's needs; decoded it takes about 160 MB. */
    public static final long MAX_PIXELS = 40_000_000L;
    /** 16 MB, for an image file and for any other file a template uses. */
    public static final long MAX_BYTES = 16L * 1024 * 1024;

    private Images() {
    }

    /** An image over a limit; the message says which. */
    public static final class TooLarge extends Exception {
        private static final long serialVersionUID = 1L;

        TooLarge(String message) {
            super(message);
        }
    }

    /** Refuses {@code bytes} when they are an image (one ImageIO knows) over the pixel limit. */
    public static void check(byte[] bytes) throws TooLarge {
        Optional<long[]> size;
        try {
            size = declaredSize(new ByteArrayInputStream(bytes));
        } catch (IOException e) {
            return;   // no readable header: whoever decodes it next refuses it
        }
        if (size.isPresent()) {
            checkPixels(size.get());
        }
    }

    /**
     * The width and height an image's header declares, without decoding it.
     *
     * @return empty when no ImageIO reader recognises the data
     */
    public static Optional<long[]> declaredSize(InputStream in) throws IOException {
        try (ImageInputStream stream = ImageIO.createImageInputStream(in)) {
            if (stream == null) {
                return Optional.empty();
            }
            Iterator<ImageReader> readers = ImageIO.getImageReaders(stream);
            if (!readers.hasNext()) {
                return Optional.empty();
            }
            ImageReader reader = readers.next();
            try {
                reader.setInput(stream, true, true);
                return Optional.of(new long[] {reader.getWidth(0), reader.getHeight(0)});
            } finally {
                reader.dispose();
            }
        }
    }

    /** Refuses an image of {@code size} (width, height) pixels over the limit. */
    public static void checkPixels(long[] size) throws TooLarge {
        if (size[0] <= 0 || size[1] <= 0 || size[0] * size[1] > MAX_PIXELS) {
            throw new TooLarge(String.format(Locale.ROOT, "it declares %d × %d pixels; the limit is %d megapixels", size[0], size[1], MAX_PIXELS / 1_000_000));
        }
    }
}
