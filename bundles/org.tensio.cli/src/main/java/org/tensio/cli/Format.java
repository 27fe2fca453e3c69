package org.tensio.cli;

/** Output formats. */
enum Format {
    /** Human-readable tables. */
    text,
    /** Machine-readable JSON with stable keys. */
    json
}
