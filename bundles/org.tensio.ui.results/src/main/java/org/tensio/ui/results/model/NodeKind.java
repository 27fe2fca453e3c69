package org.tensio.ui.results.model;

/** The levels of the results tree, from the root down. */
public enum NodeKind {
    /** The project file: one root. */
    PROJECT,
    /** A station of the project. */
    STATION,
    /** A load case or a combination evaluated at the station. */
    CASE,
    /** A criterion of the materials checked at the station. */
    CRITERION,
    /** The governing point of one material for the criterion: one engine check result. */
    POINT
}
