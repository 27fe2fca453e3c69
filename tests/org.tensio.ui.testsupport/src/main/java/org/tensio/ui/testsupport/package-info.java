/**
 * Helpers shared by Tensio's UI test bundles (not shipped, not API): waiting on conditions by running the SWT
 * event loop ({@link org.tensio.ui.testsupport.UiConditions}), PNG screenshots of what the screen shows
 * ({@link org.tensio.ui.testsupport.Screenshots}), and stand-in views that publish selections of the
 * {@code org.tensio.ui.selection} contract ({@link org.tensio.ui.testsupport.SelectionSourceView},
 * {@link org.tensio.ui.testsupport.PointerSourceView}). The views are declared, with their ids, in the
 * plugin.xml of each test bundle that uses them.
 */
package org.tensio.ui.testsupport;
