package org.linemass.importer.read;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.ReadableByteChannel;

/**
 * A sliding window over the bytes of one input: either a whole in-memory array (no copy) or a
 * channel read in chunks into a fixed buffer. Not thread-safe; owned by one tokenizer.
 */
final class ByteWindow {

    /** Longest line or string ever buffered, whatever the options say (256 MiB). */
    static final int MAX_BUFFERED_LINE = 1 << 28;
    /** First buffer size for channel input; lines longer than this grow it, up to the line limit. */
    static final int INITIAL_CAPACITY = 1 << 20;

    byte[] buf;
    /** Next unread index in {@link #buf}. */
    int pos;
    /** End of valid bytes in {@link #buf}. */
    int limit;
    /** Absolute offset in the input of {@code buf[0]}. */
    long base;
    private final ReadableByteChannel channel;
    private final int maxCapacity;
    private boolean exhausted;

    private ByteWindow(byte[] buf, int limit, ReadableByteChannel channel, int maxCapacity) {
        this.buf = buf;
        this.maxCapacity = maxCapacity;
        this.limit = limit;
        this.channel = channel;
        this.exhausted = channel == null;
    }

    static ByteWindow of(byte[] content) {
        return new ByteWindow(content, content.length, null, content.length);
    }

    /** The line limit actually applied: the option, bounded by {@link #MAX_BUFFERED_LINE}. */
    static int lineLimit(int requested) {
        return Math.max(0, Math.min(requested, MAX_BUFFERED_LINE));
    }

    /** A channel window starting at {@link #INITIAL_CAPACITY} and growing up to {@code maxCapacity}. */
    static ByteWindow of(ReadableByteChannel channel, int maxCapacity) {
        return new ByteWindow(new byte[Math.min(INITIAL_CAPACITY, maxCapacity)], 0, channel, maxCapacity);
    }

    boolean exhausted() {
        return exhausted;
    }

    /**
     * Moves the unread bytes to the front and reads more. Returns false when nothing more could be
     * read (end of input or buffer full).
     */
    boolean fill() throws IOException {
        if (exhausted) {
            return false;
        }
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, limit - pos);
            base += pos;
            limit -= pos;
            pos = 0;
        }
        if (limit == buf.length) {
            if (buf.length >= maxCapacity) {
                return false;
            }
            buf = java.util.Arrays.copyOf(buf, (int) Math.min(maxCapacity, 2L * buf.length));
        }
        ByteBuffer bb = ByteBuffer.wrap(buf, limit, buf.length - limit);
        int total = 0;
        while (bb.hasRemaining()) {
            int n = channel.read(bb);
            if (n < 0) {
                exhausted = true;
                break;
            }
            if (n == 0 && total > 0) {
                break;
            }
            total += n;
        }
        limit = bb.position();
        return total > 0;
    }

    /** Makes at least {@code n} unread bytes available if the input has them; returns whether it could. */
    boolean ensure(int n) throws IOException {
        while (limit - pos < n) {
            if (!fill()) {
                return limit - pos >= n;
            }
        }
        return true;
    }
}
