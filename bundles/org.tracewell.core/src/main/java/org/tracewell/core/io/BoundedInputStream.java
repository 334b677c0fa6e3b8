package org.tracewell.core.io;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;

/** Fails once more than a set number of bytes has been read, so a huge or growing file cannot exhaust memory. */
final class BoundedInputStream extends FilterInputStream {

    private final long limit;
    private final String what;
    private long count;

    BoundedInputStream(InputStream in, long limit, String what) {
        super(in);
        this.limit = limit;
        this.what = what;
    }

    @Override
    public int read() throws IOException {
        int b = super.read();
        if (b >= 0) {
            count(1);
        }
        return b;
    }

    @Override
    public int read(byte[] buffer, int offset, int length) throws IOException {
        int n = super.read(buffer, offset, length);
        if (n > 0) {
            count(n);
        }
        return n;
    }

    @Override
    public long skip(long n) throws IOException {
        long skipped = super.skip(n);
        count(skipped);
        return skipped;
    }

    private void count(long n) throws IOException {
        count += n;
        if (count > limit) {
            throw new FileTooLargeException(what, limit);
        }
    }

    /** Thrown when the limit is passed. */
    static final class FileTooLargeException extends IOException {
        private static final long serialVersionUID = 1L;

        FileTooLargeException(String what, long limit) {
            super(what + " is larger than the limit of " + limit + " bytes");
        }
    }
}
