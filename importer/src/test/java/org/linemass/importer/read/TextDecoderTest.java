package org.linemass.importer.read;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/**
 * The {@code \M+nXXXX} and {@code \U+XXXX} escapes of {@link TextDecoder}. Expected characters come
 * from published code-page tables, named beside each case; the JDK charsets are used only as a
 * second check. Code-page digits 1 to 5 (932, 950, 949, 1361, 936): the DXF text-format SDK's
 * description of the MIF code-page index, as quoted in public question-and-answer threads on
 * {@code \M+5BCFE\M+5BAC5}.
 */
class TextDecoderTest {

    private static String decode(String value) {
        byte[] b = value.getBytes(StandardCharsets.ISO_8859_1);
        return new TextDecoder().decode(b, 0, b.length);
    }

    @Test
    void multibyte_japaneseShiftJis() {
        // Microsoft cp932 to Unicode table (CP932.TXT, table version 2.01): 0x9249 -> U+68DA (shelf),
        // 0x906A -> U+91DD (needle / wire)
        assertEquals("\u68da\u91dd_D4", decode("\\M+19249\\M+1906A_D4"));
        assertEquals("\u68da\u91dd", new String(new byte[] {(byte) 0x92, 0x49, (byte) 0x90, 0x6a},
                Charset.forName("MS932")), "second check: the JDK's cp932 agrees with the table");
    }

    @Test
    void multibyte_simplifiedChineseGbk() {
        // public Q&A on DXF text: \M+5BCFE\M+5BAC5 is U+4EF6 U+53F7 ("part number"), the GB2312 bytes
        // BC FE BA C5 of those two characters
        assertEquals("\u4ef6\u53f7", decode("\\M+5BCFE\\M+5BAC5"));
    }

    @Test
    void multibyte_otherPagesFollowTheirDigit() {
        // JDK charsets only (no independent table consulted for these three pages): each digit must
        // select its own page, so the bytes of one character in that page decode back to it
        String[][] cases = {{"2", "x-windows-950", "\u92fc"}, {"3", "x-windows-949", "\ucca0"},
            {"4", "x-Johab", "\ucca0"}};
        for (String[] c : cases) {
            byte[] b = c[2].getBytes(Charset.forName(c[1]));
            assertEquals(2, b.length, c[1]);
            String hex = String.format(java.util.Locale.ROOT, "%02X%02X", b[0] & 0xff, b[1] & 0xff);
            assertEquals(c[2], decode("\\M+" + c[0] + hex), c[1]);
        }
    }

    @Test
    void multibyte_malformedStaysLiteral() {
        String[] literal = {
            "\\M+1906", // three hex digits at the end
            "\\M+1906G", // non-hex digit
            "\\M+79249", // no code page 7
            "\\M+09249", // no code page 0
            "\\M+x9249", // page is not a digit
            "\\M+10041", // two single-byte characters, not one double-byte character
            "\\M+18200", // 0x00 is not a cp932 trail byte
            "\\m+19249", // lower case is not the escape
        };
        for (String s : literal) {
            assertEquals(s, decode(s), s);
        }
        assertEquals("A\\M+1906\u68da", decode("A\\M+1906\\M+19249"), "short escape kept, next one decoded");
    }

    @Test
    void unicodeEscape_stillDecodedBesideMultibyte() {
        assertEquals("\u00d8\u68da", decode("\\U+00D8\\M+19249"));
    }

    @Test
    void noBackslash_returnsTheDecodedStringUnchanged() {
        String plain = "STAHL_D4";
        assertEquals(plain, decode(plain));
        String escaped = "A\\B";
        assertEquals(escaped, decode(escaped), "a lone backslash is not an escape");
    }
}
