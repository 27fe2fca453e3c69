package org.tensio.ui.editor.validation;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where an engine error points in the project: the section id and part index read from its JSON path
 * ({@code $.sections.bracket.profile.outer}, {@code $.sections['my beam'].parts[1].profile}). Immutable.
 *
 * @param sectionId the section, or null when the path is not inside a section
 * @param partIndex the part index, or -1 when the path names no part (single-material section: part 0)
 */
public record ErrorPlace(String sectionId, int partIndex) {

    private static final Pattern SECTION = Pattern
            .compile("^\\$\\.sections(?:\\.([A-Za-z0-9_]+)|\\['((?:[^'\\\\]|\\\\.)*)'\\])(?:\\.parts\\[(\\d+)\\])?"); //$NON-NLS-1$

    /** @return the place of {@code jsonPath} (never null) */
    public static ErrorPlace of(String jsonPath) {
        if (jsonPath == null) {
            return new ErrorPlace(null, -1);
        }
        Matcher m = SECTION.matcher(jsonPath);
        if (!m.find()) {
            return new ErrorPlace(null, -1);
        }
        String id = m.group(1) != null ? m.group(1) : m.group(2).replaceAll("\\\\(.)", "$1"); //$NON-NLS-1$ //$NON-NLS-2$
        int part = m.group(3) != null ? Integer.parseInt(m.group(3)) : -1;
        return new ErrorPlace(id, part);
    }
}
