package org.tensio.ui.results.model;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.tensio.engine.checks.CheckResult;

/**
 * The clipboard forms of (part of) a results tree: an indented text outline and CSV. Only nodes the filter
 * keeps are written. Numbers: text with six significant digits; CSV with the shortest decimal that reads back to
 * the same double (as {@code tensio check --format csv}, whose columns the CSV repeats, plus the stress state
 * and pass/fail). Both end with the caution line.
 */
public final class ResultsText {

    /** Column names of the CSV (the command line's nine, then the stress state and the verdict). */
    public static final String CSV_HEADER = "station,case,criterion,material,utilisation,demand,capacity,x,y,"
            + "sigmaZ,tauZX,tauZY,passed";

    private static final String CRLF = "\r\n";

    private final ResultsTree tree;
    private final ResultsFilter filter;
    private final String caution;

    /**
     * @param tree    the tree
     * @param filter  what is shown
     * @param caution the caution line appended to both forms
     */
    public ResultsText(ResultsTree tree, ResultsFilter filter, String caution) {
        this.tree = tree;
        this.filter = filter;
        this.caution = caution;
    }

    /**
     * @param nodes the selected nodes; empty for the whole tree
     * @return the indented outline of the nodes and their shown descendants: name, utilisation, ok/FAIL; point
     *         nodes add demand, capacity and the point
     */
    public String text(List<ResultNode> nodes) {
        StringBuilder sb = new StringBuilder();
        for (ResultNode n : tops(nodes)) {
            outline(n, 0, sb);
        }
        sb.append(caution).append(System.lineSeparator());
        return sb.toString();
    }

    /** @return CSV (RFC 4180, CRLF) of the shown point nodes under {@code nodes} (empty: the whole tree) */
    public String csv(List<ResultNode> nodes) {
        StringBuilder sb = new StringBuilder(CSV_HEADER).append(CRLF);
        Set<ResultNode> points = new LinkedHashSet<>();
        for (ResultNode n : tops(nodes)) {
            collectPoints(n, points);
        }
        for (ResultNode p : points) {
            CheckResult r = p.governing();
            sb.append(field(r.station())).append(',').append(field(r.caseId())).append(',')
                    .append(field(r.criterion())).append(',').append(field(r.material())).append(',')
                    .append(r.utilisation()).append(',').append(r.demand()).append(',').append(r.capacity()).append(',')
                    .append(r.point().x()).append(',').append(r.point().y()).append(',').append(r.sigmaZ()).append(',')
                    .append(r.tauZX()).append(',').append(r.tauZY()).append(',').append(r.passed()).append(CRLF);
        }
        sb.append("# ").append(caution).append(CRLF); //$NON-NLS-1$
        return sb.toString();
    }

    private List<ResultNode> tops(List<ResultNode> nodes) {
        if (nodes.isEmpty()) {
            return tree.roots();
        }
        // drop nodes whose ancestor is also selected: they are written with it
        Set<ResultNode> chosen = new LinkedHashSet<>(nodes);
        List<ResultNode> tops = new ArrayList<>();
        for (ResultNode n : nodes) {
            boolean covered = false;
            for (ResultNode p = tree.parentOf(n); p != null; p = tree.parentOf(p)) {
                covered |= chosen.contains(p);
            }
            if (!covered) {
                tops.add(n);
            }
        }
        return tops;
    }

    private void outline(ResultNode n, int depth, StringBuilder sb) {
        if (!filter.keeps(tree, n)) {
            return;
        }
        sb.append("  ".repeat(depth)).append(n.name()); //$NON-NLS-1$
        if (n.checked()) {
            sb.append("  ").append(number(n.utilisation())).append("  ").append(n.passed() ? "ok" : "FAIL"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$ //$NON-NLS-4$
        }
        if (n.kind() == NodeKind.POINT) {
            CheckResult r = n.governing();
            sb.append(String.format(Locale.ROOT, "  demand %s / capacity %s at (%s, %s)", number(r.demand()), //$NON-NLS-1$
                    number(r.capacity()), number(r.point().x()), number(r.point().y())));
        }
        sb.append(System.lineSeparator());
        for (ResultNode c : n.children()) {
            outline(c, depth + 1, sb);
        }
    }

    private void collectPoints(ResultNode n, Set<ResultNode> out) {
        if (!filter.keeps(tree, n)) {
            return;
        }
        if (n.kind() == NodeKind.POINT) {
            out.add(n);
        }
        for (ResultNode c : n.children()) {
            collectPoints(c, out);
        }
    }

    /** @return six significant digits, never "-0" */
    public static String number(double v) {
        return String.format(Locale.ROOT, "%.6g", v + 0.0); //$NON-NLS-1$
    }

    static String field(String s) {
        if (s.isEmpty() || s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0
                || s.startsWith("#") || !s.strip().equals(s)) { //$NON-NLS-1$
            return '"' + s.replace("\"", "\"\"") + '"'; //$NON-NLS-1$ //$NON-NLS-2$
        }
        return s;
    }
}
