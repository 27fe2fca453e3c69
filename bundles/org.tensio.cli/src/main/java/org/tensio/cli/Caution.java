package org.tensio.cli;

/** The caution every report carries. */
final class Caution {

    static final String TEXT = "Caution: results support, not replace, a competent engineer's review;"
            + " local codes and licensed practice govern.";

    private Caution() {
    }
}
