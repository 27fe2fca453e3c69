package org.tensio.cli.report;

/**
 * Renders a {@link Doc} as one self-contained HTML5 page: inline CSS and inline SVG, no scripts, no external
 * resources (fonts fall back to the reader's sans-serif).
 */
final class Html {

    private static final String CSS = """
            :root { --ink:#1c232b; --muted:#5b6670; --rule:#c9cfd4; --band:#f3f1ea; --gov:#fbe7c6; --fail:#f6d2cc; }
            * { box-sizing: border-box; }
            body { font-family: 'Liberation Sans', Arial, Helvetica, sans-serif; color: var(--ink); margin: 0 auto;
                   max-width: 1180px; padding: 24px 28px 40px; line-height: 1.4; font-size: 14px; }
            h1 { font-size: 26px; margin: 8px 0 4px; }
            h2 { font-size: 20px; margin: 34px 0 8px; padding-bottom: 4px; border-bottom: 2px solid var(--ink); }
            h3 { font-size: 16px; margin: 22px 0 6px; }
            p.note { color: var(--muted); font-size: 12.5px; margin: 4px 0; }
            .caution { border: 3px solid #9a2f22; background: #fff4ec; color: #5a140c; font-weight: bold;
                       padding: 12px 16px; margin: 14px 0; font-size: 15px; }
            .verdict { padding: 10px 16px; font-size: 17px; font-weight: bold; margin: 12px 0; border-left: 8px solid; }
            .verdict.pass { border-color: #1f6e78; background: #e6f0ef; }
            .verdict.fail { border-color: #9a2f22; background: #f8e3df; }
            table { border-collapse: collapse; margin: 6px 0 14px; font-size: 12.5px; }
            caption { text-align: left; font-weight: bold; padding: 4px 0; font-size: 13px; }
            th, td { border: 1px solid var(--rule); padding: 3px 7px; vertical-align: top; }
            th { background: var(--band); text-align: left; }
            td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
            td.mono { font-family: 'Liberation Mono', 'DejaVu Sans Mono', monospace; font-size: 12px; word-break: break-all; }
            tr.governing td { background: var(--gov); font-weight: bold; }
            tr.fail td { background: var(--fail); }
            tr.governing.fail td { background: #f0b9ae; }
            .figures { display: flex; flex-wrap: wrap; gap: 18px; align-items: flex-start; margin: 8px 0 12px; }
            figure { margin: 0; }
            figcaption { font-size: 12px; color: var(--muted); max-width: 600px; margin-top: 2px; }
            svg { display: block; background: #ffffff; border: 1px solid #e3e6e8; }
            @media print { body { max-width: none; padding: 0; } figure, table { break-inside: avoid; } }
            """;

    private Html() {
    }

    static String of(Doc doc) {
        StringBuilder b = new StringBuilder(1 << 16);
        b.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<meta name=\"generator\" content=\"Tensio\">\n")
                .append("<title>").append(esc(doc.title)).append("</title>\n<style>\n").append(CSS)
                .append("</style>\n</head>\n<body>\n");
        for (Doc.Block blk : doc.blocks) {
            block(b, blk);
        }
        return b.append("</body>\n</html>\n").toString();
    }

    private static void block(StringBuilder b, Doc.Block blk) {
        if (blk instanceof Doc.Heading h) {
            b.append("<h").append(h.level());
            if (h.id() != null) {
                b.append(" id=\"").append(esc(h.id())).append('"');
            }
            b.append('>').append(esc(h.text())).append("</h").append(h.level()).append(">\n");
        } else if (blk instanceof Doc.Para p) {
            b.append(p.note() ? "<p class=\"note\">" : "<p>").append(esc(p.text())).append("</p>\n");
        } else if (blk instanceof Doc.Caution c) {
            b.append("<div class=\"caution\" id=\"").append(esc(c.id())).append("\" role=\"note\">").append(esc(c.text()))
                    .append("</div>\n");
        } else if (blk instanceof Doc.Verdict v) {
            b.append("<div class=\"verdict ").append(v.passed() ? "pass" : "fail").append("\" id=\"verdict\">")
                    .append(esc(v.text())).append("</div>\n");
        } else if (blk instanceof Doc.Table t) {
            table(b, t);
        } else if (blk instanceof Doc.Figures f) {
            b.append("<div class=\"figures\">\n");
            for (Doc.Figure fig : f.figures()) {
                b.append("<figure>").append(Svg.of(fig.scene(), fig.cssClass()));
                if (fig.caption() != null) {
                    b.append("<figcaption>").append(esc(fig.caption())).append("</figcaption>");
                }
                b.append("</figure>\n");
            }
            b.append("</div>\n");
        }
    }

    private static void table(StringBuilder b, Doc.Table t) {
        b.append("<table");
        if (t.id() != null) {
            b.append(" id=\"").append(esc(t.id())).append('"');
        }
        b.append(" class=\"").append(esc(t.cssClass())).append('"');
        if (t.dataRef() != null) {
            b.append(" data-ref=\"").append(esc(t.dataRef())).append('"');
        }
        b.append(">\n");
        if (t.caption() != null) {
            b.append("<caption>").append(esc(t.caption())).append("</caption>\n");
        }
        if (!t.header().isEmpty()) {
            b.append("<thead><tr>");
            for (String h : t.header()) {
                b.append("<th>").append(esc(h)).append("</th>");
            }
            b.append("</tr></thead>\n");
        }
        b.append("<tbody>\n");
        for (Doc.Row r : t.rows()) {
            b.append("<tr");
            if (r.key() != null) {
                b.append(" data-key=\"").append(esc(r.key())).append('"');
            }
            if (!r.style().isEmpty()) {
                b.append(" class=\"").append(esc(r.style())).append('"');
            }
            b.append('>');
            for (Doc.Cell c : r.cells()) {
                b.append("<td");
                if (c.numeric() || c.mono()) {
                    b.append(" class=\"").append(c.numeric() ? "num" : "mono").append('"');
                }
                if (c.value() != null) {
                    b.append(" data-value=\"").append(Double.toString(c.value())).append('"');
                }
                b.append('>').append(esc(c.text())).append("</td>");
            }
            b.append("</tr>\n");
        }
        b.append("</tbody>\n</table>\n");
    }

    /** Escapes text for HTML and XML (element content and attribute values); drops control characters. */
    static String esc(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(s.length() + 8);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c < 0x20 && c != '\n' && c != '\t' ? ' ' : c);
            }
        }
        return b.toString();
    }
}
