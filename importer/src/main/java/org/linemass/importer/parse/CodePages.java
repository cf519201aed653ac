package org.linemass.importer.parse;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.Optional;

/**
 * Maps a $DWGCODEPAGE value (ANSI_1252, DOS850, ISO8859-1, MACINTOSH...) to a Java charset for the
 * strings of files before AC1021; AC1021 and later are UTF-8. Unknown or unsupported pages give
 * empty (the caller keeps windows-1252).
 */
final class CodePages {

    private CodePages() {
    }

    static Optional<Charset> of(String codePage) {
        String c = codePage.trim().toUpperCase(Locale.ROOT);
        String name;
        if (c.startsWith("ANSI_")) {
            String num = c.substring(5);
            name = switch (num) {
                case "874" -> "x-windows-874";
                case "932" -> "windows-31j";
                case "936" -> "GBK";
                case "949" -> "x-windows-949";
                case "950" -> "x-windows-950";
                case "1361" -> "x-Johab";
                default -> "windows-" + num;
            };
        } else if (c.startsWith("DOS")) {
            name = c.equals("DOS932") ? "windows-31j" : "IBM" + c.substring(3);
        } else if (c.startsWith("ISO8859-")) {
            name = "ISO-8859-" + c.substring(8);
        } else if (c.equals("MACINTOSH")) {
            name = "x-MacRoman";
        } else if (c.equals("UTF8") || c.equals("UTF-8")) {
            return Optional.of(StandardCharsets.UTF_8);
        } else {
            return Optional.empty();
        }
        try {
            return Charset.isSupported(name) ? Optional.of(Charset.forName(name)) : Optional.empty();
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }
}
