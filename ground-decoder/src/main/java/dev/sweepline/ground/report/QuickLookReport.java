package dev.sweepline.ground.report;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;

/**
 * A one-file HTML quick-look: sections of key/value tables, tables and PNG images embedded as base64
 * data URIs, inline CSS, no script and no network reference. The markup is well-formed XHTML (every
 * element closed, text escaped), so that an XML parser can check it.
 */
public final class QuickLookReport {
    private static final String CSS = "body{font-family:sans-serif;margin:24px;color:#222;max-width:1150px}"
            + "h1{font-size:22px}h2{font-size:17px;border-bottom:1px solid #ccc;padding-bottom:2px;margin-top:28px}"
            + "table{border-collapse:collapse;margin:6px 0}td,th{border:1px solid #ccc;padding:3px 8px;"
            + "text-align:left;font-size:13px}th{background:#eef}.ok{color:#070}.over{color:#b00;font-weight:bold}"
            + "img{max-width:100%;border:1px solid #ddd;margin:6px 0}p.caption{font-size:12px;color:#555}";

    private final String title;
    private final List<String> body = new ArrayList<>();
    private int refreshSeconds;

    /** A report with this title. */
    public QuickLookReport(String title) {
        this.title = title;
    }

    /** Escapes text for XHTML. */
    public static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c < 0x20 && c != '\n' && c != '\t' ? ' ' : c);
            }
        }
        return b.toString();
    }

    /**
     * Asks the browser to reload the page every {@code seconds} (an HTML meta refresh, no script); 0 or
     * less: never (the default).
     */
    public QuickLookReport refreshEvery(int seconds) {
        refreshSeconds = Math.max(0, seconds);
        return this;
    }

    /** A section heading. */
    public QuickLookReport heading(String text) {
        body.add("<h2>" + escape(text) + "</h2>");
        return this;
    }

    /** A paragraph; {@code cssClass} may be null. */
    public QuickLookReport paragraph(String text, String cssClass) {
        body.add((cssClass == null ? "<p>" : "<p class=\"" + escape(cssClass) + "\">") + escape(text) + "</p>");
        return this;
    }

    /** A table with a header row. */
    public QuickLookReport table(List<String> header, List<List<String>> rows) {
        StringBuilder b = new StringBuilder("<table><tr>");
        for (String h : header) {
            b.append("<th>").append(escape(h)).append("</th>");
        }
        b.append("</tr>");
        for (List<String> r : rows) {
            b.append("<tr>");
            for (String c : r) {
                b.append("<td>").append(escape(c)).append("</td>");
            }
            b.append("</tr>");
        }
        body.add(b.append("</table>").toString());
        return this;
    }

    /** A PNG embedded as a data URI, with a caption. */
    public QuickLookReport image(String alt, byte[] png, String caption) {
        body.add("<div><img alt=\"" + escape(alt) + "\" src=\"data:image/png;base64,"
                + Base64.getEncoder().encodeToString(png) + "\" /><p class=\"caption\">" + escape(caption) + "</p></div>");
        return this;
    }

    /**
     * {@code document} (a report of this class, UTF-8) with the sections of {@code more} added at its end,
     * before {@code </body>}: a caller's own sections on the ground's report (the bench's truth comparison).
     *
     * @throws IllegalArgumentException when {@code document} has no {@code </body>}
     */
    public static byte[] withSections(byte[] document, QuickLookReport more) {
        String text = new String(document, StandardCharsets.UTF_8);
        int end = text.lastIndexOf("</body>");
        if (end < 0) {
            throw new IllegalArgumentException("not a quick-look report: no </body>");
        }
        StringBuilder b = new StringBuilder(text.substring(0, end));
        for (String s : more.body) {
            b.append(s).append('\n');
        }
        return b.append(text.substring(end)).toString().getBytes(StandardCharsets.UTF_8);
    }

    /** The document, UTF-8. */
    public byte[] toBytes() {
        StringBuilder b = new StringBuilder();
        b.append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n")
                .append("<meta charset=\"utf-8\" />\n")
                .append(refreshSeconds > 0 ? "<meta http-equiv=\"refresh\" content=\"" + refreshSeconds + "\" />\n" : "")
                .append("<title>").append(escape(title)).append("</title>\n")
                .append("<style>").append(CSS).append("</style>\n</head>\n<body>\n<h1>").append(escape(title))
                .append("</h1>\n");
        for (String s : body) {
            b.append(s).append('\n');
        }
        b.append("</body>\n</html>\n");
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }
}
