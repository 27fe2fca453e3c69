package org.tensio.ui.editor.validation;

/**
 * One validation message of the engine for the edited project. Immutable.
 *
 * @param path    the JSON path the engine names ({@code $} when none)
 * @param message the engine's one-line message
 */
public record Problem(String path, String message) {
}
