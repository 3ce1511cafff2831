package org.annalist.ingest;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;

/**
 * A stream that stops once more than a limit of bytes has come through it: a file that grows while
 * it is read, or a zip part that inflates far beyond its compressed size, fails with its caller's
 * own problem instead of filling the memory.
 */
class LimitedStream extends FilterInputStream {

    /** What reading past the limit throws. */
    @FunctionalInterface
    interface Overflow {
        void exceeded(long limit) throws IOException;
    }

    private final long limit;
    private final Overflow overflow;
    private long count;

    LimitedStream(InputStream in, long limit, Overflow overflow) {
        super(in);
        this.limit = limit;
        this.overflow = overflow;
    }

    @Override
    public int read() throws IOException {
        int b = super.read();
        count(b < 0 ? 0 : 1);
        return b;
    }

    @Override
    public int read(byte[] buffer, int offset, int length) throws IOException {
        int n = super.read(buffer, offset, length);
        count(Math.max(n, 0));
        return n;
    }

    private void count(int n) throws IOException {
        count += n;
        if (count > limit) {
            overflow.exceeded(limit);
        }
    }
}
