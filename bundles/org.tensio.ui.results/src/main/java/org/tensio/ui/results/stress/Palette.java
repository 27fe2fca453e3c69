package org.tensio.ui.results.stress;

import org.eclipse.jface.resource.ColorDescriptor;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.resource.LocalResourceManager;
import org.eclipse.jface.resource.ResourceManager;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Control;

/**
 * The colours of the stress drawings (this project's own choice): tension brick {@code #B5452B}, compression
 * steel blue {@code #2F6690}, shear plum {@code #7B4B94}, outlines graphite {@code #3C4043}, the Mohr circle
 * filled with a pale plum {@code #EFE6F4}. Owned by a resource manager disposed with the control.
 */
final class Palette {

    final Color tension;
    final Color compression;
    final Color shear;
    final Color ink;
    final Color faint;
    final Color fill;
    final Color element;

    Palette(Control owner) {
        ResourceManager r = new LocalResourceManager(JFaceResources.getResources(), owner);
        tension = r.create(ColorDescriptor.createFrom(new RGB(0xB5, 0x45, 0x2B)));
        compression = r.create(ColorDescriptor.createFrom(new RGB(0x2F, 0x66, 0x90)));
        shear = r.create(ColorDescriptor.createFrom(new RGB(0x7B, 0x4B, 0x94)));
        ink = r.create(ColorDescriptor.createFrom(new RGB(0x3C, 0x40, 0x43)));
        faint = r.create(ColorDescriptor.createFrom(new RGB(0xA8, 0xAD, 0xB2)));
        fill = r.create(ColorDescriptor.createFrom(new RGB(0xEF, 0xE6, 0xF4)));
        element = r.create(ColorDescriptor.createFrom(new RGB(0xF4, 0xF1, 0xE8)));
    }
}
