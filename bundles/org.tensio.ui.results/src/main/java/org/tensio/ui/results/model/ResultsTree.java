package org.tensio.ui.results.model;

import java.nio.file.Path;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.project.Project;

/**
 * The input of the results tree: the check results of one project file as a tree of {@link ResultNode}s, or a
 * message saying why there are none. Immutable.
 */
public final class ResultsTree {

    private final Optional<Path> file;
    private final Project project;
    private final CheckReport report;
    private final ResultNode root;
    private final String message;
    private final boolean failed;
    private final Map<ResultNode, ResultNode> parents;

    /**
     * @param file    the project file (absolute, normalised), empty before one is chosen
     * @param project the project read from it, or null when it could not be read
     * @param report  the engine's check report, or null
     * @param root    the project node, or null when there are no results
     * @param message one line for the user: what is shown, or what went wrong
     * @param failed  true when {@code message} reports an error (bad file, engine failure)
     */
    public ResultsTree(Optional<Path> file, Project project, CheckReport report, ResultNode root, String message,
            boolean failed) {
        this.file = file;
        this.project = project;
        this.report = report;
        this.root = root;
        this.message = message;
        this.failed = failed;
        Map<ResultNode, ResultNode> p = new IdentityHashMap<>();
        if (root != null) {
            fill(root, p);
        }
        this.parents = Collections.unmodifiableMap(p);
    }

    /** @return an input with no file yet */
    public static ResultsTree none(String message) {
        return new ResultsTree(Optional.empty(), null, null, null, message, false);
    }

    /** @return an input with no results that reports {@code message} for {@code file} */
    public static ResultsTree failed(Path file, String message) {
        return new ResultsTree(Optional.of(file), null, null, null, message, true);
    }

    /** @return the project file, empty before one is chosen */
    public Optional<Path> file() {
        return file;
    }

    /** @return the project, or null when it could not be read */
    public Project project() {
        return project;
    }

    /** @return the engine's check report, or null */
    public CheckReport report() {
        return report;
    }

    /** @return the project node, or null when there are no results */
    public ResultNode root() {
        return root;
    }

    /** @return one line for the user */
    public String message() {
        return message;
    }

    /** @return true when the message reports an error */
    public boolean failed() {
        return failed;
    }

    /** @return the top-level elements: the project node, or none */
    public List<ResultNode> roots() {
        return root == null ? List.of() : List.of(root);
    }

    /** @return the parent of {@code node} in this tree, or null for the root or a node of another tree */
    public ResultNode parentOf(ResultNode node) {
        return parents.get(node);
    }

    /** @return warnings of the engine's report, empty when there is none */
    public List<String> warnings() {
        return report == null ? List.of() : report.warnings();
    }

    private static void fill(ResultNode node, Map<ResultNode, ResultNode> parents) {
        for (ResultNode c : node.children()) {
            parents.put(c, node);
            fill(c, parents);
        }
    }
}
