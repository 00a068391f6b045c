package dev.sweepline.sim.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;

/**
 * A one-file HTML report: headings, paragraphs, tables and PNG images embedded as data URIs, with
 * inline styles only (no network, no scripts), written as well-formed XHTML so a plain XML parser
 * can check it.
 */
public final class HtmlReport {
    private final StringBuilder body = new StringBuilder();
    private final String title;

    /** A report titled {@code title}. */
    public HtmlReport(String title) {
        this.title = title;
    }

    /** A section heading. */
    public HtmlReport heading(String text) {
        body.append("<h2>").append(escape(text)).append("</h2>\n");
        return this;
    }

    /** A paragraph; {@code emphasis} marks a verdict line. */
    public HtmlReport paragraph(String text, boolean emphasis) {
        body.append(emphasis ? "<p class=\"verdict\">" : "<p>").append(escape(text)).append("</p>\n");
        return this;
    }

    /** A table with a header row. */
    public HtmlReport table(List<String> header, List<List<String>> rows) {
        body.append("<table>\n<tr>");
        for (String h : header) {
            body.append("<th>").append(escape(h)).append("</th>");
        }
        body.append("</tr>\n");
        for (List<String> row : rows) {
            body.append("<tr>");
            for (String cell : row) {
                body.append("<td>").append(escape(cell)).append("</td>");
            }
            body.append("</tr>\n");
        }
        body.append("</table>\n");
        return this;
    }

    /** A PNG image, embedded. */
    public HtmlReport image(byte[] png, String alt) {
        body.append("<p><img alt=\"").append(escape(alt)).append("\" src=\"data:image/png;base64,")
                .append(Base64.getEncoder().encodeToString(png)).append("\"/></p>\n");
        return this;
    }

    /** The whole document. */
    public String html() {
        return "<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n"
                + "<meta charset=\"utf-8\"/>\n<title>" + escape(title) + "</title>\n<style>\n"
                + "body{font-family:sans-serif;margin:2em;color:#222;max-width:1100px}"
                + "table{border-collapse:collapse;margin:1em 0}td,th{border:1px solid #bbb;padding:3px 8px;"
                + "text-align:right;font-size:90%}th{background:#eef}.verdict{font-weight:bold;font-size:120%}"
                + "img{max-width:100%;border:1px solid #ddd}\n</style>\n</head>\n<body>\n<h1>" + escape(title)
                + "</h1>\n" + body + "</body>\n</html>\n";
    }

    /** Writes the document to {@code file}. */
    public void write(Path file) throws IOException {
        Files.writeString(file, html(), StandardCharsets.UTF_8);
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
