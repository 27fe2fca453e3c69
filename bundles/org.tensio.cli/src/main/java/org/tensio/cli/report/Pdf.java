package org.tensio.cli.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.graphics.state.RenderingMode;

/**
 * Renders a {@link Doc} as an A4 PDF with Apache PDFBox: the same blocks as the HTML, tables as ruled tables (the
 * header repeated after a page break), drawings as vector graphics from the same {@link Scene}s. Text is set in
 * Liberation Sans, which PDFBox ships inside its own jar, embedded as a subset, so the file is self-contained and
 * no system fonts are read (PDFBox's standard-14 fonts would scan them and write a font cache in the user's home).
 * Bold is simulated by stroking the glyph outlines. Every page carries the caution and the page number in its
 * footer.
 */
final class Pdf {

    private static final String FONT = "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf";
    private static final float PAGE_W = PDRectangle.A4.getWidth();
    private static final float PAGE_H = PDRectangle.A4.getHeight();
    private static final float MARGIN = 42;
    private static final float BOTTOM = 58;
    private static final float WIDTH = PAGE_W - 2 * MARGIN;
    /** CSS px to pt. */
    private static final float PX = 0.75f;

    private final PDDocument pd;
    private final PDType0Font font;
    private final Map<Integer, Boolean> glyphs = new HashMap<>();
    private PDPageContentStream cs;
    private float y;

    private Pdf(PDDocument pd) throws IOException {
        this.pd = pd;
        try (InputStream in = PDDocument.class.getResourceAsStream(FONT)) {
            if (in == null) {
                throw new IOException("PDFBox's Liberation Sans font is missing from its jar (" + FONT + ")");
            }
            font = PDType0Font.load(pd, in, true);
        }
    }

    /**
     * @param footer second footer line (project, input hash, date)
     * @param date   creation date written to the document information
     */
    static byte[] of(Doc doc, String footer, Calendar date, String creator) throws IOException {
        try (PDDocument pd = new PDDocument()) {
            PDDocumentInformation info = pd.getDocumentInformation();
            info.setTitle(doc.title);
            info.setCreator(creator);
            info.setProducer(creator);
            info.setCreationDate(date);
            Pdf p = new Pdf(pd);
            p.newPage();
            for (Doc.Block b : doc.blocks) {
                p.block(b);
            }
            p.cs.close();
            p.footers(footer);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            pd.save(out);
            return out.toByteArray();
        }
    }

    private void newPage() throws IOException {
        if (cs != null) {
            cs.close();
        }
        PDPage page = new PDPage(PDRectangle.A4);
        pd.addPage(page);
        cs = new PDPageContentStream(pd, page);
        cs.setLineJoinStyle(1);
        y = PAGE_H - MARGIN;
    }

    private void need(float h) throws IOException {
        if (y - h < BOTTOM) {
            newPage();
        }
    }

    private void footers(String footer) throws IOException {
        int n = pd.getNumberOfPages();
        for (int i = 0; i < n; i++) {
            try (PDPageContentStream f = new PDPageContentStream(pd, pd.getPage(i), PDPageContentStream.AppendMode.APPEND,
                    true, true)) {
                cs = f;
                stroke("#c9cfd4", 0.6f);
                f.moveTo(MARGIN, 40);
                f.lineTo(PAGE_W - MARGIN, 40);
                f.stroke();
                text(MARGIN, 30, fit(ReportWriter.CAUTION, 7, WIDTH - 60), 7, "#5a140c", true);
                String pg = "page " + (i + 1) + " of " + n;
                text(PAGE_W - MARGIN - width(pg, 7), 30, pg, 7, "#5b6670", false);
                text(MARGIN, 20, fit(footer, 6.5f, WIDTH), 6.5f, "#5b6670", false);
            }
        }
        cs = null;
    }

    private void block(Doc.Block b) throws IOException {
        if (b instanceof Doc.Heading h) {
            float size = h.level() == 1 ? 17 : h.level() == 2 ? 13.5f : 11.5f;
            float before = h.level() == 1 ? 0 : h.level() == 2 ? 16 : 10;
            List<String> lines = wrap(h.text(), size, WIDTH);
            need(before + lines.size() * size * 1.25f + 90);
            y -= before;
            for (String l : lines) {
                y -= size * 1.2f;
                text(MARGIN, y, l, size, "#1c232b", true);
            }
            if (h.level() == 2) {
                stroke("#1c232b", 1.2f);
                cs.moveTo(MARGIN, y - 4);
                cs.lineTo(PAGE_W - MARGIN, y - 4);
                cs.stroke();
                y -= 6;
            }
            y -= 5;
        } else if (b instanceof Doc.Para p) {
            float size = p.note() ? 7.8f : 9;
            for (String l : wrap(p.text(), size, WIDTH)) {
                need(size * 1.35f);
                y -= size * 1.35f;
                text(MARGIN, y, l, size, p.note() ? "#5b6670" : "#1c232b", false);
            }
            y -= 4;
        } else if (b instanceof Doc.Caution c) {
            box(c.text(), 10, "#9a2f22", "#fff4ec", "#5a140c", false);
        } else if (b instanceof Doc.Verdict v) {
            box(v.text(), 11, v.passed() ? "#1f6e78" : "#9a2f22", v.passed() ? "#e6f0ef" : "#f8e3df", "#1c232b", true);
        } else if (b instanceof Doc.Table t) {
            table(t);
        } else if (b instanceof Doc.Figures f) {
            figures(f);
        }
    }

    private void box(String s, float size, String border, String fill, String ink, boolean leftBar) throws IOException {
        float pad = 7;
        List<String> lines = wrap(s, size, WIDTH - 2 * pad - (leftBar ? 6 : 0));
        float h = lines.size() * size * 1.3f + 2 * pad;
        need(h + 10);
        y -= 4;
        fill(fill);
        cs.addRect(MARGIN, y - h, WIDTH, h);
        cs.fill();
        if (leftBar) {
            fill(border);
            cs.addRect(MARGIN, y - h, 6, h);
            cs.fill();
        } else {
            stroke(border, 2);
            cs.addRect(MARGIN + 1, y - h + 1, WIDTH - 2, h - 2);
            cs.stroke();
        }
        float ty = y - pad;
        for (String l : lines) {
            ty -= size * 1.3f;
            text(MARGIN + pad + (leftBar ? 6 : 0), ty + size * 0.25f, l, size, ink, true);
        }
        y -= h + 8;
    }

    private void table(Doc.Table t) throws IOException {
        float size = 7.4f, pad = 2.6f, lead = size * 1.22f;
        int nc = t.header().isEmpty() ? t.rows().get(0).cells().size() : t.header().size();
        float[] nat = new float[nc];
        for (int c = 0; c < nc; c++) {
            if (!t.header().isEmpty()) {
                nat[c] = width(t.header().get(c), size) * 1.04f + 2 * pad;
            }
        }
        for (Doc.Row r : t.rows()) {
            for (int c = 0; c < nc && c < r.cells().size(); c++) {
                // + 0.5 pt: a column at its natural width must not wrap on rounding
                nat[c] = Math.max(nat[c], width(r.cells().get(c).text(), size) + 2 * pad + 0.5f);
            }
        }
        float[] w = allocate(nat, WIDTH);
        if (t.caption() != null) {
            need(lead * 3 + 12);
            y -= 11;
            text(MARGIN, y, t.caption(), 8.6f, "#1c232b", true);
            y -= 4;
        }
        boolean header = !t.header().isEmpty();
        if (header) {
            headerRow(t, w, size, pad, lead);
        }
        for (Doc.Row r : t.rows()) {
            List<List<String>> cells = new ArrayList<>();
            int lines = 1;
            for (int c = 0; c < nc; c++) {
                String s = c < r.cells().size() ? r.cells().get(c).text() : "";
                List<String> l = wrap(s, size, w[c] - 2 * pad);
                cells.add(l);
                lines = Math.max(lines, l.size());
            }
            float h = lines * lead + 2 * pad;
            if (y - h < BOTTOM) {
                newPage();
                if (header) {
                    headerRow(t, w, size, pad, lead);
                }
            }
            boolean gov = r.style().contains("governing"), fail = r.style().contains("fail");
            if (gov || fail) {
                fill(gov && fail ? "#f0b9ae" : gov ? "#fbe7c6" : "#f6d2cc");
                cs.addRect(MARGIN, y - h, sum(w), h);
                cs.fill();
            }
            float x = MARGIN;
            for (int c = 0; c < nc; c++) {
                Doc.Cell cell = c < r.cells().size() ? r.cells().get(c) : Doc.Cell.text("");
                float ty = y - pad - size;
                for (String l : cells.get(c)) {
                    float tx = cell.numeric() ? x + w[c] - pad - width(l, size) : x + pad;
                    text(tx, ty, l, size, "#1c232b", gov);
                    ty -= lead;
                }
                x += w[c];
            }
            grid(w, y, h);
            y -= h;
        }
        y -= 10;
    }

    private void headerRow(Doc.Table t, float[] w, float size, float pad, float lead) throws IOException {
        int lines = 1;
        List<List<String>> hs = new ArrayList<>();
        for (int c = 0; c < w.length; c++) {
            List<String> l = wrap(t.header().get(c), size, w[c] - 2 * pad);
            hs.add(l);
            lines = Math.max(lines, l.size());
        }
        float h = lines * lead + 2 * pad;
        need(h + lead * 2 + 2 * pad);
        fill("#f3f1ea");
        cs.addRect(MARGIN, y - h, sum(w), h);
        cs.fill();
        float x = MARGIN;
        for (int c = 0; c < w.length; c++) {
            float ty = y - pad - size;
            for (String l : hs.get(c)) {
                text(x + pad, ty, l, size, "#1c232b", true);
                ty -= lead;
            }
            x += w[c];
        }
        grid(w, y, h);
        y -= h;
    }

    private void grid(float[] w, float top, float h) throws IOException {
        stroke("#c9cfd4", 0.5f);
        float x = MARGIN;
        cs.addRect(MARGIN, top - h, sum(w), h);
        for (int c = 0; c < w.length - 1; c++) {
            x += w[c];
            cs.moveTo(x, top);
            cs.lineTo(x, top - h);
        }
        cs.stroke();
    }

    /** Column widths: natural widths when they fit, else the narrow columns keep theirs and the wide ones share. */
    static float[] allocate(float[] nat, float avail) {
        float[] w = nat.clone();
        if (sum(nat) <= avail) {
            return w;
        }
        boolean[] fixed = new boolean[nat.length];
        while (true) {
            float rest = avail;
            int open = 0;
            for (int c = 0; c < nat.length; c++) {
                if (fixed[c]) {
                    rest -= nat[c];
                } else {
                    open++;
                }
            }
            if (open == 0) {
                return w;
            }
            float share = rest / open;
            boolean changed = false;
            for (int c = 0; c < nat.length; c++) {
                if (!fixed[c] && nat[c] <= share) {
                    fixed[c] = true;
                    changed = true;
                }
            }
            if (!changed) {
                for (int c = 0; c < nat.length; c++) {
                    w[c] = fixed[c] ? nat[c] : Math.max(share, 18);
                }
                return w;
            }
        }
    }

    private static float sum(float[] w) {
        float s = 0;
        for (float v : w) {
            s += v;
        }
        return s;
    }

    private void figures(Doc.Figures f) throws IOException {
        float gap = 12;
        float total = -gap, maxH = 0;
        for (Doc.Figure fig : f.figures()) {
            total += (float) fig.scene().width * PX + gap;
        }
        float s = Math.min(PX, PX * WIDTH / total);
        for (Doc.Figure fig : f.figures()) {
            maxH = Math.max(maxH, (float) fig.scene().height * s);
        }
        float room = PAGE_H - MARGIN - BOTTOM - 40;
        if (maxH > room) {
            s *= room / maxH;
            maxH = room;
        }
        float capSize = 7.2f;
        int capLines = 0;
        for (Doc.Figure fig : f.figures()) {
            if (fig.caption() != null) {
                capLines = Math.max(capLines, wrap(fig.caption(), capSize, (float) fig.scene().width * s).size());
            }
        }
        float h = maxH + capLines * capSize * 1.3f + 8;
        need(h);
        float x = MARGIN;
        for (Doc.Figure fig : f.figures()) {
            float fw = (float) fig.scene().width * s;
            scene(fig.scene(), x, y, s);
            if (fig.caption() != null) {
                float ty = y - (float) fig.scene().height * s - 2;
                for (String l : wrap(fig.caption(), capSize, fw)) {
                    ty -= capSize * 1.3f;
                    text(x, ty, l, capSize, "#5b6670", false);
                }
            }
            x += fw + gap;
        }
        y -= h + 4;
    }

    /** Draws {@code sc} with its top-left corner at (x0, top), {@code s} pt per px. */
    private void scene(Scene sc, float x0, float top, float s) throws IOException {
        stroke("#e3e6e8", 0.6f);
        cs.addRect(x0, top - (float) sc.height * s, (float) sc.width * s, (float) sc.height * s);
        cs.stroke();
        for (Scene.Item it : sc.items) {
            if (it instanceof Scene.Shape sh) {
                if (sh.rings().isEmpty() || (sh.fill() == null && sh.stroke() == null)) {
                    continue;
                }
                for (double[] r : sh.rings()) {
                    for (int i = 0; i + 1 < r.length; i += 2) {
                        float px = x0 + (float) r[i] * s, py = top - (float) r[i + 1] * s;
                        if (i == 0) {
                            cs.moveTo(px, py);
                        } else {
                            cs.lineTo(px, py);
                        }
                    }
                    if (sh.closed()) {
                        cs.closePath();
                    }
                }
                paint(sh.fill(), sh.stroke(), (float) sh.strokeWidth() * s, sh.dash(), s, sh.evenOdd(), sh.closed());
            } else if (it instanceof Scene.Dot d) {
                circlePath(x0 + (float) d.cx() * s, top - (float) d.cy() * s, (float) d.r() * s);
                paint(d.fill(), d.stroke(), (float) d.strokeWidth() * s, null, s, false, true);
            } else if (it instanceof Scene.Label l) {
                float size = (float) l.size() * s;
                String t = safe(l.text());
                float w = width(t, size);
                float tx = x0 + (float) l.x() * s;
                if (l.anchor() == Scene.Anchor.MIDDLE) {
                    tx -= w / 2;
                } else if (l.anchor() == Scene.Anchor.END) {
                    tx -= w;
                }
                text(tx, top - (float) l.y() * s, t, size, l.colour(), l.bold());
            }
        }
    }

    private void paint(String fillC, String strokeC, float lw, double[] dash, float s, boolean evenOdd, boolean closed)
            throws IOException {
        if (fillC != null && closed) {
            fill(fillC);
        }
        if (strokeC != null) {
            stroke(strokeC, lw);
            if (dash != null) {
                float[] d = new float[dash.length];
                for (int i = 0; i < d.length; i++) {
                    d[i] = (float) dash[i] * s;
                }
                cs.setLineDashPattern(d, 0);
            }
        }
        if (fillC != null && closed && strokeC != null) {
            if (evenOdd) {
                cs.fillAndStrokeEvenOdd();
            } else {
                cs.fillAndStroke();
            }
        } else if (fillC != null && closed) {
            if (evenOdd) {
                cs.fillEvenOdd();
            } else {
                cs.fill();
            }
        } else {
            cs.stroke();
        }
        if (dash != null && strokeC != null) {
            cs.setLineDashPattern(new float[0], 0);
        }
    }

    private void circlePath(float cx, float cy, float r) throws IOException {
        float k = 0.5523f * r;
        cs.moveTo(cx + r, cy);
        cs.curveTo(cx + r, cy + k, cx + k, cy + r, cx, cy + r);
        cs.curveTo(cx - k, cy + r, cx - r, cy + k, cx - r, cy);
        cs.curveTo(cx - r, cy - k, cx - k, cy - r, cx, cy - r);
        cs.curveTo(cx + k, cy - r, cx + r, cy - k, cx + r, cy);
        cs.closePath();
    }

    private void text(float x, float y0, String s, float size, String colour, boolean bold) throws IOException {
        String t = safe(s);
        if (t.isEmpty()) {
            return;
        }
        cs.beginText();
        cs.setFont(font, size);
        fill(colour);
        if (bold) {
            stroke(colour, size * 0.035f);
            cs.setRenderingMode(RenderingMode.FILL_STROKE);
        }
        cs.newLineAtOffset(x, y0);
        cs.showText(t);
        if (bold) {
            cs.setRenderingMode(RenderingMode.FILL);
        }
        cs.endText();
    }

    private void fill(String hex) throws IOException {
        int c = Integer.parseInt(hex.substring(1), 16);
        cs.setNonStrokingColor(((c >> 16) & 255) / 255f, ((c >> 8) & 255) / 255f, (c & 255) / 255f);
    }

    private void stroke(String hex, float w) throws IOException {
        int c = Integer.parseInt(hex.substring(1), 16);
        cs.setStrokingColor(((c >> 16) & 255) / 255f, ((c >> 8) & 255) / 255f, (c & 255) / 255f);
        cs.setLineWidth(w);
    }

    private float width(String s, float size) throws IOException {
        return font.getStringWidth(safe(s)) / 1000f * size;
    }

    /**
     * @return {@code s} with characters the font lacks replaced by '?' and control characters by spaces; a run of
     *         superscript digits the font cannot set whole (Liberation Sans has no ⁰ and no ⁻) is written as ^(…)
     */
    private String safe(String s) {
        if (SUP_RUN.matcher(s).find()) {
            Matcher m = SUP_RUN.matcher(s);
            StringBuilder r = new StringBuilder();
            while (m.find()) {
                String run = m.group();
                boolean whole = run.codePoints().allMatch(cp -> glyphs.computeIfAbsent(cp, this::encodable));
                m.appendReplacement(r, Matcher.quoteReplacement(whole ? run : "^(" + plain(run) + ")"));
            }
            m.appendTail(r);
            s = r.toString();
        }
        StringBuilder b = new StringBuilder(s.length());
        s.codePoints().forEach(cp -> {
            if (cp < 0x20) {
                b.append(' ');
            } else if (glyphs.computeIfAbsent(cp, this::encodable)) {
                b.appendCodePoint(cp);
            } else {
                b.append('?');
            }
        });
        return b.toString();
    }

    private static final Pattern SUP_RUN = Pattern.compile("[⁰¹²³⁴⁵⁶⁷⁸⁹⁻]+");

    private static String plain(String sup) {
        StringBuilder b = new StringBuilder();
        for (char c : sup.toCharArray()) {
            b.append(c == '⁻' ? '−' : (char) ('0' + "⁰¹²³⁴⁵⁶⁷⁸⁹".indexOf(c)));
        }
        return b.toString();
    }

    private boolean encodable(int cp) {
        try {
            for (byte x : font.encode(new String(Character.toChars(cp)))) {
                if (x != 0) {
                    return true;
                }
            }
            return false;
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }

    /** Words onto lines no wider than {@code w}; a word wider than a line is broken between characters. */
    private List<String> wrap(String s, float size, float w) throws IOException {
        List<String> out = new ArrayList<>();
        for (String para : safe(s == null ? "" : s).split("\n", -1)) {
            StringBuilder line = new StringBuilder();
            for (String word : para.split(" ")) {
                String cand = line.length() == 0 ? word : line + " " + word;
                if (width(cand, size) <= w || line.length() == 0 && width(word, size) <= w) {
                    line.setLength(0);
                    line.append(cand);
                    continue;
                }
                if (line.length() > 0) {
                    out.add(line.toString());
                    line.setLength(0);
                }
                String rest = word;
                while (width(rest, size) > w && rest.length() > 1) {
                    int k = rest.length() - 1;
                    while (k > 1 && width(rest.substring(0, k), size) > w) {
                        k--;
                    }
                    out.add(rest.substring(0, k));
                    rest = rest.substring(k);
                }
                line.append(rest);
            }
            out.add(line.toString());
        }
        return out;
    }

    /** Shortens {@code s} with an ellipsis to fit {@code w}. */
    private String fit(String s, float size, float w) throws IOException {
        if (width(s, size) <= w) {
            return s;
        }
        String t = s;
        while (t.length() > 1 && width(t + "…", size) > w) {
            t = t.substring(0, t.length() - 1);
        }
        return t + "…";
    }
}
