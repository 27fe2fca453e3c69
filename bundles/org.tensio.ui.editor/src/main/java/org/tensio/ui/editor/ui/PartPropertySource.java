package org.tensio.ui.editor.ui;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.ui.views.properties.ComboBoxPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertySource;
import org.eclipse.ui.views.properties.PropertyDescriptor;
import org.eclipse.ui.views.properties.TextPropertyDescriptor;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.ui.editor.model.JsonNumbers;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.ProjectModel;
import org.tensio.ui.editor.model.Profile;

import com.google.gson.JsonElement;
import com.google.gson.JsonPrimitive;

/**
 * Properties of a part for the Properties view: material (a choice of the project's materials), profile type
 * (read only), offset and every IFC4 parameter of a parametric profile (length unit of the file). The
 * Properties view wraps each change in a command on the editor's stack (GEF's UndoablePropertySheetEntry).
 */
final class PartPropertySource implements IPropertySource {

    private static final String MATERIAL = "material"; //$NON-NLS-1$
    private static final String TYPE = "type"; //$NON-NLS-1$
    private static final String OFFSET_X = "offset.x"; //$NON-NLS-1$
    private static final String OFFSET_Y = "offset.y"; //$NON-NLS-1$
    private static final String PARAMETER = "parameter."; //$NON-NLS-1$

    private final Part part;
    private final ProjectModel model;

    PartPropertySource(Part part, ProjectModel model) {
        this.part = part;
        this.model = model;
    }

    private String[] materials() {
        return model.materials().stream().map(m -> m.id()).toArray(String[]::new);
    }

    private List<String> parameters() {
        Profile p = part.profile();
        if (p.isArbitrary()) {
            return List.of();
        }
        List<String> names = new ArrayList<>(p.parameterNames());
        try {
            for (String n : ProfileTypes.parameterNames(p.type())) {
                if (!names.contains(n) && !ProfileTypes.zeroOnlyParameterNames(p.type()).contains(n)) {
                    names.add(n);
                }
            }
        } catch (IllegalArgumentException unknownType) {
            // the engine names the unknown type; show what the file has
        }
        return names;
    }

    @Override
    public Object getEditableValue() {
        return this;
    }

    @Override
    public IPropertyDescriptor[] getPropertyDescriptors() {
        List<IPropertyDescriptor> d = new ArrayList<>();
        d.add(category(new ComboBoxPropertyDescriptor(MATERIAL, Messages.Property_material, materials()),
                Messages.Property_part));
        d.add(category(new PropertyDescriptor(TYPE, Messages.Property_type), Messages.Property_part));
        d.add(category(new TextPropertyDescriptor(OFFSET_X, Messages.Property_offsetX), Messages.Property_part));
        d.add(category(new TextPropertyDescriptor(OFFSET_Y, Messages.Property_offsetY), Messages.Property_part));
        for (String name : parameters()) {
            d.add(category(new TextPropertyDescriptor(PARAMETER + name, name), Messages.Property_parameters));
        }
        return d.toArray(new IPropertyDescriptor[0]);
    }

    private static PropertyDescriptor category(PropertyDescriptor d, String category) {
        d.setCategory(category);
        return d;
    }

    @Override
    public Object getPropertyValue(Object id) {
        String key = (String) id;
        switch (key) {
        case MATERIAL:
            return Math.max(0, List.of(materials()).indexOf(part.material()));
        case TYPE:
            return part.profile().type();
        case OFFSET_X:
            return Format.number(part.offsetX());
        case OFFSET_Y:
            return Format.number(part.offsetY());
        default:
            JsonElement v = part.profile().parameter(key.substring(PARAMETER.length()));
            return v == null ? "" : v.toString(); //$NON-NLS-1$
        }
    }

    @Override
    public boolean isPropertySet(Object id) {
        return false;
    }

    @Override
    public void resetPropertyValue(Object id) {
        // no defaults to reset to
    }

    @Override
    public void setPropertyValue(Object id, Object value) {
        String key = (String) id;
        switch (key) {
        case MATERIAL -> {
            int i = (Integer) value;
            String[] all = materials();
            if (i >= 0 && i < all.length) {
                part.setMaterial(all[i]);
            }
        }
        case TYPE -> {
            // read only
        }
        case OFFSET_X -> number(value).ifPresent(x -> part.setOffset(new double[] { x, part.offsetY() }));
        case OFFSET_Y -> number(value).ifPresent(y -> part.setOffset(new double[] { part.offsetX(), y }));
        default -> {
            String name = key.substring(PARAMETER.length());
            String typed = String.valueOf(value).trim();
            if (typed.isEmpty()) {
                part.profile().setParameter(name, null);
            } else {
                part.profile().setParameter(name, number(typed).<JsonElement>map(JsonNumbers::of)
                        .orElse(new JsonPrimitive(typed)));
            }
        }
        }
    }

    private static java.util.Optional<Double> number(Object typed) {
        try {
            double d = Double.parseDouble(String.valueOf(typed).trim());
            return Double.isFinite(d) ? java.util.Optional.of(d) : java.util.Optional.empty();
        } catch (NumberFormatException e) {
            return java.util.Optional.empty();
        }
    }
}
