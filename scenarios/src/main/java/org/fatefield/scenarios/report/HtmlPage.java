package org.fatefield.scenarios.report;

import java.util.Base64;
import java.util.List;

/**
 * Minimal builder of a self-contained HTML page, escaping all text. Once loaded, the page marks
 * {@code <body>} with {@code data-images-loaded="decoded/total"} so a headless browser can check
 * that every embedded image decoded.
 */
final class HtmlPage {
    private final StringBuilder body = new StringBuilder();
    private final String title;

    HtmlPage(String title) {
        this.title = title;
    }

    void heading(String text) {
        body.append("<h2>").append(escape(text)).append("</h2>\n");
    }

    void paragraph(String text) {
        body.append("<p>").append(escape(text)).append("</p>\n");
    }

    void preformatted(String text) {
        body.append("<pre>").append(escape(text)).append("</pre>\n");
    }

    void image(String caption, byte[] bytes, String type) {
        body.append("<figure><img alt=\"").append(escape(caption)).append("\" src=\"data:image/").append(type)
                .append(";base64,").append(Base64.getEncoder().encodeToString(bytes)).append("\"><figcaption>")
                .append(escape(caption)).append("</figcaption></figure>\n");
    }

    void table(List<String> header, List<List<String>> rows) {
        body.append("<table><tr>");
        header.forEach(h -> body.append("<th>").append(escape(h)).append("</th>"));
        body.append("</tr>\n");
        for (List<String> row : rows) {
            body.append("<tr>");
            row.forEach(v -> body.append("<td>").append(escape(v)).append("</td>"));
            body.append("</tr>\n");
        }
        body.append("</table>\n");
    }

    /** A link to a page beside this one ({@code href} relative, never a network address). */
    void link(String text, String href) {
        body.append("<p><a href=\"").append(escape(href)).append("\">").append(escape(text)).append("</a></p>\n");
    }

    String finish() {
        return "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>" + escape(title)
                + "</title>\n<style>body{font-family:sans-serif;max-width:980px;margin:2em auto;color:#222}"
                + "img{max-width:100%}figure{margin:1.5em 0}figcaption{color:#555;font-size:90%}"
                + "table{border-collapse:collapse;margin:1em 0}td,th{border:1px solid #ccc;padding:4px 10px;"
                + "text-align:left}pre{background:#f6f6f2;padding:1em;white-space:pre-wrap;overflow-wrap:anywhere}</style></head>\n<body><h1>"
                + escape(title) + "</h1>\n" + body
                + "<script>window.addEventListener('load',function(){var i=document.images,n=0;"
                + "for(var k=0;k<i.length;k++){if(i[k].complete&&i[k].naturalWidth>0){n++;}}"
                + "document.body.setAttribute('data-images-loaded',n+'/'+i.length);});</script>\n"
                + "</body></html>\n";
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
