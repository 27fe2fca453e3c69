/**
 * What the section editor and the result views exchange: {@link org.tensio.ui.selection.SectionPoint} and
 * {@link org.tensio.ui.selection.StationRef} as selection elements, and
 * {@link org.tensio.ui.selection.SectionPointerSource} for pointer tracking. Plain values, no SWT resources.
 *
 * @since 0.1
 */
package org.tensio.ui.selection;
