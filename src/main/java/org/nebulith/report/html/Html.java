package org.nebulith.report.html;

/** HTML text escaping. */
final class Html {

    private Html() {
    }

    /**
     * @param text plain text
     * @return the text with {@code & < > " '} escaped, safe in element content and quoted attributes
     */
    static String escape(final String text) {
        StringBuilder out = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&': out.append("&amp;"); break;
                case '<': out.append("&lt;"); break;
                case '>': out.append("&gt;"); break;
                case '"': out.append("&quot;"); break;
                case '\'': out.append("&#39;"); break;
                default: out.append(c);
            }
        }
        return out.toString();
    }
}
