package org.tensio.cli;

/** Output formats of {@code tensio check}. */
enum CheckFormat {
    /** A readable table in project order, the governing row marked. */
    text,
    /** Machine-readable JSON with stable keys. */
    json,
    /** One header row and one row per result; warnings and the caution as trailing '#' comment lines. */
    csv
}
