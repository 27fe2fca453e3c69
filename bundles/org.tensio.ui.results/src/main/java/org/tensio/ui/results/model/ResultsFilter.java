package org.tensio.ui.results.model;

/**
 * Which nodes of a results tree are shown. Immutable.
 * <ul>
 * <li>{@code onlyFailing}: nodes whose subtree holds a utilisation &gt; 1 (the project node always stays);</li>
 * <li>{@code onlyGoverning}: below each station, only the governing child of each node (the first child with
 * the largest utilisation): the governing case of each station, its governing criterion and point. Stations all
 * stay, so that every station's governing chain is visible.</li>
 * </ul>
 * Both together keep the governing chains of failing stations.
 *
 * @param onlyFailing   hide nodes whose subtree passes
 * @param onlyGoverning hide non-governing siblings below the stations
 */
public record ResultsFilter(boolean onlyFailing, boolean onlyGoverning) {

    /** Shows everything. */
    public static final ResultsFilter ALL = new ResultsFilter(false, false);

    /** @return true when {@code node} of {@code tree} is shown */
    public boolean keeps(ResultsTree tree, ResultNode node) {
        if (node.kind() == NodeKind.PROJECT) {
            return true;
        }
        if (onlyFailing && node.passed()) {
            return false;
        }
        if (onlyGoverning && node.kind() != NodeKind.STATION) {
            ResultNode parent = tree.parentOf(node);
            return parent != null && parent.governingChild() == node;
        }
        return true;
    }
}
