package org.tensio.cli.report;

/** Renders a {@link Scene} as a stand-alone, well-formed SVG 1.1 element for inline use in HTML. */
final class Svg {

    private Svg() {
    }

    static String of(Scene s, String cssClass) {
        StringBuilder b = new StringBuilder(4096);
        b.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" class=\"").append(Html.esc(cssClass))
                .append("\" width=\"").append(n(s.width)).append("\" height=\"").append(n(s.height))
                .append("\" viewBox=\"0 0 ").append(n(s.width)).append(' ').append(n(s.height))
                .append("\" role=\"img\" font-family=\"Liberation Sans, Arial, Helvetica, sans-serif\">");
        b.append("<title>").append(Html.esc(s.title)).append("</title>");
        for (Scene.Item it : s.items) {
            if (it instanceof Scene.Shape sh) {
                shape(b, sh);
            } else if (it instanceof Scene.Label l) {
                b.append("<text x=\"").append(n(l.x())).append("\" y=\"").append(n(l.y())).append("\" font-size=\"")
                        .append(n(l.size())).append('"');
                if (l.anchor() != Scene.Anchor.START) {
                    b.append(" text-anchor=\"").append(l.anchor() == Scene.Anchor.MIDDLE ? "middle" : "end").append('"');
                }
                if (l.bold()) {
                    b.append(" font-weight=\"bold\"");
                }
                b.append(" fill=\"").append(l.colour()).append("\">").append(Html.esc(l.text())).append("</text>");
            } else if (it instanceof Scene.Dot d) {
                b.append("<circle cx=\"").append(n(d.cx())).append("\" cy=\"").append(n(d.cy())).append("\" r=\"")
                        .append(n(d.r())).append("\" fill=\"").append(d.fill() == null ? "none" : d.fill()).append('"');
                stroke(b, d.stroke(), d.strokeWidth(), null);
                b.append("/>");
            }
        }
        return b.append("</svg>").toString();
    }

    private static void shape(StringBuilder b, Scene.Shape sh) {
        if (sh.rings().isEmpty()) {
            return;
        }
        b.append("<path d=\"");
        for (double[] r : sh.rings()) {
            for (int i = 0; i + 1 < r.length; i += 2) {
                b.append(i == 0 ? 'M' : 'L').append(n(r[i])).append(' ').append(n(r[i + 1]));
            }
            if (sh.closed()) {
                b.append('Z');
            }
        }
        b.append("\" fill=\"").append(sh.fill() == null ? "none" : sh.fill()).append('"');
        if (sh.evenOdd()) {
            b.append(" fill-rule=\"evenodd\"");
        }
        stroke(b, sh.stroke(), sh.strokeWidth(), sh.dash());
        b.append("/>");
    }

    private static void stroke(StringBuilder b, String stroke, double w, double[] dash) {
        if (stroke == null) {
            return;
        }
        b.append(" stroke=\"").append(stroke).append("\" stroke-width=\"").append(n(w))
                .append("\" stroke-linejoin=\"round\"");
        if (dash != null) {
            b.append(" stroke-dasharray=\"");
            for (int i = 0; i < dash.length; i++) {
                b.append(i == 0 ? "" : " ").append(n(dash[i]));
            }
            b.append('"');
        }
    }

    /** Coordinates to 0.01 px: far below what a screen or printer resolves, and compact. */
    static String n(double v) {
        long r = Math.round(v * 100);
        long a = Math.abs(r), ip = a / 100, fp = a % 100;
        String sign = r < 0 ? "-" : "";
        if (fp == 0) {
            return sign + ip;
        }
        return sign + ip + (fp % 10 == 0 ? "." + fp / 10 : (fp < 10 ? ".0" : ".") + fp);
    }
}
