package org.linemass.app.mutate;

import java.io.ByteArrayOutputStream;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

/** Mutations of the raw bytes: they know nothing of DXF and apply to ASCII and binary drawings alike. */
final class ByteKinds {

    /** Bytes that change the meaning of DXF text most: line ends, signs, digits, exponent, 0xFF. */
    private static final byte[] INTERESTING = {0, '\n', '\r', ' ', '-', '+', '.', 'e', 'E', '0', '9', (byte) 0xFF,
        (byte) 0x80, ','};

    private ByteKinds() {
    }

    static List<Mutation> all(List<Seed> others) {
        return List.of(
                Mutation.of("byte-flip", (s, r) -> {
                    byte[] b = s.bytes().clone();
                    int n = 1 + r.nextInt(8);
                    for (int i = 0; i < n && b.length > 0; i++) {
                        int at = r.nextInt(b.length);
                        b[at] ^= (byte) (1 << r.nextInt(8));
                    }
                    return b;
                }),
                Mutation.of("byte-set", (s, r) -> {
                    byte[] b = s.bytes().clone();
                    int n = 1 + r.nextInt(4);
                    for (int i = 0; i < n && b.length > 0; i++) {
                        b[r.nextInt(b.length)] = INTERESTING[r.nextInt(INTERESTING.length)];
                    }
                    return b;
                }),
                Mutation.of("byte-delete", (s, r) -> {
                    byte[] b = s.bytes();
                    if (b.length < 2) {
                        return null;
                    }
                    int at = r.nextInt(b.length);
                    int len = Math.min(b.length - at, 1 + r.nextInt(64));
                    return cut(b, at, len, new byte[0]);
                }),
                Mutation.of("byte-insert", (s, r) -> {
                    byte[] b = s.bytes();
                    byte[] ins = new byte[1 + r.nextInt(32)];
                    for (int i = 0; i < ins.length; i++) {
                        ins[i] = r.nextBoolean() ? INTERESTING[r.nextInt(INTERESTING.length)] : (byte) r.nextInt(256);
                    }
                    return cut(b, r.nextInt(b.length + 1), 0, ins);
                }),
                Mutation.of("byte-duplicate", (s, r) -> {
                    byte[] b = s.bytes();
                    if (b.length < 2) {
                        return null;
                    }
                    int from = r.nextInt(b.length);
                    int len = Math.min(b.length - from, 1 + r.nextInt(4096));
                    int times = 1 + r.nextInt(r.nextInt(10) == 0 ? 200 : 3);
                    ByteArrayOutputStream copies = new ByteArrayOutputStream();
                    for (int i = 0; i < times; i++) {
                        copies.write(b, from, len);
                    }
                    return cut(b, r.nextInt(b.length + 1), 0, copies.toByteArray());
                }),
                Mutation.of("byte-truncate", (s, r) -> s.bytes().length < 2 ? null
                        : Arrays.copyOf(s.bytes(), r.nextInt(s.bytes().length))),
                Mutation.of("byte-splice", (s, r) -> {
                    Seed o = others.get(r.nextInt(others.size()));
                    byte[] a = s.bytes();
                    byte[] b = o.bytes();
                    int at = r.nextInt(a.length + 1);
                    int from = r.nextInt(b.length + 1);
                    byte[] out = Arrays.copyOf(a, at + b.length - from);
                    System.arraycopy(b, from, out, at, b.length - from);
                    return out;
                }));
    }

    /** {@code b} with {@code len} bytes at {@code at} replaced by {@code ins}. */
    static byte[] cut(byte[] b, int at, int len, byte[] ins) {
        byte[] out = new byte[b.length - len + ins.length];
        System.arraycopy(b, 0, out, 0, at);
        System.arraycopy(ins, 0, out, at, ins.length);
        System.arraycopy(b, at + len, out, at + ins.length, b.length - at - len);
        return out;
    }

    /** A random source's choice from a list. */
    static <T> T pick(Random r, List<T> list) {
        return list.get(r.nextInt(list.size()));
    }
}
