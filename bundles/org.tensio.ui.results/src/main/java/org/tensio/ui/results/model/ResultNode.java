package org.tensio.ui.results.model;

import java.util.List;

import org.tensio.engine.checks.CheckResult;

/**
 * One node of the results tree. Immutable; equality is identity (two nodes are never interchangeable, even
 * with equal values). Utilisations are demand / capacity (dimensionless, pass when ≤ 1); a node above the
 * points carries the largest utilisation of its subtree and the index of its first child with that value.
 * <p>
 * A {@link NodeKind#POINT} node holds the engine's {@link CheckResult} (point in the section frame, model length
 * unit; stresses in the project's stress unit); other nodes hold the result of their governing point.
 */
public final class ResultNode {

    private final NodeKind kind;
    private final String name;
    private final String stationId;
    private final String sectionId;
    private final String caseId;
    private final String criterion;
    private final CheckResult governing;
    private final List<ResultNode> children;
    private final int governingChild;

    /**
     * @param kind      level
     * @param name      what the tree shows in its first column
     * @param stationId station, null for the project node
     * @param sectionId section of the station, null for the project node
     * @param caseId    case or combination, null above the case level
     * @param criterion criterion name, null above the criterion level
     * @param children  child nodes, empty for a point
     * @param point     the check result of a point node (null for other kinds: taken from the governing child)
     * @throws IllegalArgumentException when a point node has no result or another node has one
     */
    public ResultNode(NodeKind kind, String name, String stationId, String sectionId, String caseId, String criterion,
            List<ResultNode> children, CheckResult point) {
        if (kind == null || name == null) {
            throw new IllegalArgumentException("kind and name must not be null, got " + kind + ", " + name);
        }
        if ((kind == NodeKind.POINT) != (point != null)) {
            throw new IllegalArgumentException("point: a " + kind + " node " + (point == null ? "needs" : "takes no")
                    + " check result");
        }
        this.kind = kind;
        this.name = name;
        this.stationId = stationId;
        this.sectionId = sectionId;
        this.caseId = caseId;
        this.criterion = criterion;
        this.children = List.copyOf(children);
        int best = -1;
        for (int i = 0; i < this.children.size(); i++) {
            if (best < 0 || this.children.get(i).utilisation() > this.children.get(best).utilisation()) {
                best = i;
            }
        }
        this.governingChild = best;
        this.governing = point != null ? point : best < 0 ? null : this.children.get(best).governing();
    }

    /** @return the level */
    public NodeKind kind() {
        return kind;
    }

    /** @return the text of the first column */
    public String name() {
        return name;
    }

    /** @return the station id, or null for the project */
    public String stationId() {
        return stationId;
    }

    /** @return the station's section id, or null for the project */
    public String sectionId() {
        return sectionId;
    }

    /** @return the case or combination id, or null above the case level */
    public String caseId() {
        return caseId;
    }

    /** @return the criterion name, or null above the criterion level */
    public String criterion() {
        return criterion;
    }

    /** @return the children in project order (unmodifiable) */
    public List<ResultNode> children() {
        return children;
    }

    /** @return the check result of this point, or of the governing point below; null when nothing was checked */
    public CheckResult governing() {
        return governing;
    }

    /** @return the first child with the largest utilisation, or null for a leaf */
    public ResultNode governingChild() {
        return governingChild < 0 ? null : children.get(governingChild);
    }

    /** @return the largest utilisation in this subtree; 0 when nothing was checked */
    public double utilisation() {
        return governing == null ? 0 : governing.utilisation();
    }

    /** @return true when every utilisation in this subtree is ≤ 1 */
    public boolean passed() {
        return utilisation() <= 1.0;
    }

    /** @return true when something was checked in this subtree */
    public boolean checked() {
        return governing != null;
    }

    @Override
    public String toString() {
        return kind + " " + name;
    }
}
