package org.tensio.ui.results.views;

import java.util.Comparator;
import java.util.function.Function;

import org.tensio.engine.checks.CheckResult;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.model.ResultsText;

/**
 * The columns of the results tree, in display order. Utilisation on every node (the subtree's largest);
 * demand, capacity, material and point of the governing point below the node (stress unit of the project;
 * point in the section frame, length unit). Numbers with six significant digits; a coordinate that is
 * round-off (|v| ≤ 1e-12 × the point's distance from the origin) is shown as 0.
 */
enum ResultsColumn {
    NAME(Messages.ResultsColumn_name, 240, ResultNode::name, Comparator.comparing(ResultNode::name)),
    UTILISATION(Messages.ResultsColumn_utilisation, 90, n -> n.checked() ? ResultsText.number(n.utilisation()) : "", //$NON-NLS-1$
            Comparator.comparingDouble(ResultNode::utilisation)),
    RESULT(Messages.ResultsColumn_result, 60,
            n -> !n.checked() ? "" : n.passed() ? Messages.ResultsColumn_pass : Messages.ResultsColumn_fail, //$NON-NLS-1$
            Comparator.comparing(ResultNode::passed)),
    DEMAND(Messages.ResultsColumn_demand, 80, n -> number(n, CheckResult::demand), byResult(CheckResult::demand)),
    CAPACITY(Messages.ResultsColumn_capacity, 80, n -> number(n, CheckResult::capacity),
            byResult(CheckResult::capacity)),
    MATERIAL(Messages.ResultsColumn_material, 110, n -> n.governing() == null ? "" : n.governing().material(), //$NON-NLS-1$
            Comparator.comparing(n -> n.governing() == null ? "" : n.governing().material())), //$NON-NLS-1$
    X(Messages.ResultsColumn_x, 75, n -> number(n, r -> snap(r.point().x(), r.point().y())),
            byResult(r -> r.point().x())),
    Y(Messages.ResultsColumn_y, 75, n -> number(n, r -> snap(r.point().y(), r.point().x())),
            byResult(r -> r.point().y()));

    /** A coordinate within 1e-12 of the point's distance from the origin is shown as 0 (display only). */
    private static final double ROUND_OFF = 1e-12;

    private final String header;
    private final int width;
    private final Function<ResultNode, String> text;
    private final Comparator<ResultNode> order;

    ResultsColumn(String header, int width, Function<ResultNode, String> text, Comparator<ResultNode> order) {
        this.header = header;
        this.width = width;
        this.text = text;
        this.order = order;
    }

    String header() {
        return header;
    }

    int width() {
        return width;
    }

    String text(ResultNode node) {
        return text.apply(node);
    }

    /** @return ascending order of two sibling nodes by this column */
    Comparator<ResultNode> order() {
        return order;
    }

    boolean numeric() {
        return this != NAME && this != MATERIAL && this != RESULT;
    }

    static double snap(double v, double other) {
        return Math.abs(v) <= ROUND_OFF * Math.hypot(v, other) ? 0.0 : v;
    }

    private static String number(ResultNode n, java.util.function.ToDoubleFunction<CheckResult> f) {
        return n.governing() == null ? "" : ResultsText.number(f.applyAsDouble(n.governing())); //$NON-NLS-1$
    }

    private static Comparator<ResultNode> byResult(java.util.function.ToDoubleFunction<CheckResult> f) {
        return Comparator.comparingDouble(n -> n.governing() == null ? Double.NEGATIVE_INFINITY
                : f.applyAsDouble(n.governing()));
    }
}
