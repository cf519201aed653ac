package org.linemass.importer.read;

import java.util.Arrays;

/**
 * The groups of one DXF record (an entity, a table entry, a section header): everything from its
 * {@code 0} group up to the next {@code 0}. Numeric values are held as doubles (integers exactly),
 * names and texts as strings; group codes whose values the importer never uses keep no value.
 * Mutable and reused by {@link RecordReader}; not thread-safe.
 */
public final class Record {

    String type = "";
    long position;
    /** The handle text, or null while it is held as {@link #handleBits} and not yet asked for. */
    String handle = "";
    /** The handle's value when it is canonical hexadecimal, else -1 (see {@link GroupSource#hexValue()}). */
    long handleBits = -1;
    String layer = "0";
    int n;
    /** Codes below this have their first group index in {@link #first} (covers every DXF code). */
    private static final int INDEXED_CODES = 1072;
    /** Index of the first group of each code below {@link #INDEXED_CODES}, -1 when absent. */
    private final int[] first = newFirst();
    int[] codes = new int[64];
    /** Numeric value, or for a decoded string the index into {@link #strs}; NaN when absent. */
    double[] nums = new double[64];
    String[] strs = new String[16];
    int ns;
    long badPosition = -1;
    int badCode;
    String badText = "";
    boolean keepSubclassMarkers;
    boolean keepAll = true;
    boolean lwpolyline;
    boolean manyGroups;

    private static int[] newFirst() {
        int[] f = new int[INDEXED_CODES];
        Arrays.fill(f, -1);
        return f;
    }

    void clear() {
        endOfInput = false;
        for (int i = 0; i < n; i++) {
            int c = codes[i];
            if (c >= 0 && c < INDEXED_CODES) {
                first[c] = -1;
            }
        }
        if (ns > 0) {
            Arrays.fill(strs, 0, ns, null);
        }
        n = 0;
        ns = 0;
        handle = "";
        handleBits = -1;
        layer = "0";
        badPosition = -1;
    }

    void add(int code, double num) {
        if (n == codes.length) {
            int cap = n * 2;
            codes = Arrays.copyOf(codes, cap);
            nums = Arrays.copyOf(nums, cap);
        }
        codes[n] = code;
        nums[n] = num;
        if (code >= 0 && code < INDEXED_CODES && first[code] < 0) {
            first[code] = n;
        }
        n++;
    }

    void addString(int code, String str) {
        if (str == null) {
            add(code, Double.NaN);
            return;
        }
        if (ns == strs.length) {
            strs = Arrays.copyOf(strs, ns * 2);
        }
        strs[ns] = str;
        add(code, ns++);
    }

    /** The record type: the value of its 0 group (SECTION, LINE, VERTEX...). */
    /** True when the end of the input, not a following 0 group, ended this record (it may be cut off). */
    boolean endOfInput;

    public boolean endOfInput() {
        return endOfInput;
    }

    public String type() {
        return type;
    }

    /** DXF line number (or binary byte offset) of the record's 0 group. */
    public long position() {
        return position;
    }

    /** The entity handle text ("" when the record has none). */
    public String handle() {
        if (handle == null) {
            handle = hexText(handleBits);
        }
        return handle;
    }

    /** True when the handle is canonical hexadecimal, so {@link #handleValue()} stands for it. */
    public boolean numericHandle() {
        return handleBits != -1;
    }

    /** The handle's value when {@link #numericHandle()}, else -1. */
    public long handleValue() {
        return handleBits;
    }

    /** Upper-case hexadecimal text of a handle value. */
    public static String hexText(long value) {
        return Long.toHexString(value).toUpperCase(java.util.Locale.ROOT);
    }

    public String layer() {
        return layer;
    }

    public int size() {
        return n;
    }

    public int code(int i) {
        return codes[i];
    }

    public double num(int i) {
        return nums[i];
    }

    /** The decoded text of group i, or null when it is not a kept string. */
    public String str(int i) {
        double v = nums[i];
        return GroupSource.kind(codes[i]) == GroupSource.Kind.STRING && v >= 0 && v < ns ? strs[(int) v] : null;
    }

    /** Index of the first group with {@code code} at or after {@code from}, or -1. */
    public int indexOf(int code, int from) {
        for (int i = from; i < n; i++) {
            if (codes[i] == code) {
                return i;
            }
        }
        return -1;
    }

    public int indexOf(int code) {
        return code >= 0 && code < INDEXED_CODES ? first[code] : indexOf(code, 0);
    }

    public double num(int code, double dflt) {
        int i = indexOf(code);
        return i < 0 ? dflt : nums[i];
    }

    public String str(int code, String dflt) {
        int i = indexOf(code);
        String s = i < 0 ? null : str(i);
        return s == null ? dflt : s;
    }

    /** True when some numeric value of this record could not be read as a number. */
    public boolean hasBadValue() {
        return badPosition >= 0;
    }

    public long badPosition() {
        return badPosition;
    }

    public int badCode() {
        return badCode;
    }

    public String badText() {
        return badText;
    }
}
