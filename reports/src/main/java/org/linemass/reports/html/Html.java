package org.linemass.reports.html;

/** HTML escaping for text and attribute values. */
public final class Html {

    private Html() {
    }

    /**
     * The text with {@code & < > " '} replaced by character references and other control
     * characters (except tab and line feed) dropped; null gives "". Safe in element content and in
     * quoted attribute values.
     */
    public static String escape(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> {
                    if (!Character.isISOControl(c) || c == '\n' || c == '\t') {
                        b.append(c);
                    }
                }
            }
        }
        return b.toString();
    }
}
