package org.tensio.ui.results.stress;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.StressComponents;
import org.tensio.ui.results.model.ResultsText;

/**
 * The two tables of the stress-point view: the quantities at the point (quantity, value, unit) and the
 * superposition (one row per internal force and the total; columns σz, τzx, τzy). Items are reused from one
 * point to the next (pointer moves are frequent).
 */
final class StressTables {

    /** Row keys of the values table, in order (the tests read rows by these keys). */
    static final String[] FIXED_ROWS = { "x", "y", "sigmaZ", "tauZX", "tauZY", "tau", "sigma1", "sigma2", "sigma3", //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$ //$NON-NLS-4$ //$NON-NLS-5$ //$NON-NLS-6$ //$NON-NLS-7$ //$NON-NLS-8$ //$NON-NLS-9$
            "dir1", "dir2", "dir3", "tauMax", "vonMises", "tresca", "utilisation", "governing" }; //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$ //$NON-NLS-4$ //$NON-NLS-5$ //$NON-NLS-6$ //$NON-NLS-7$ //$NON-NLS-8$

    private final Table values;
    private final Table contributions;

    StressTables(Composite parent) {
        values = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        values.setHeaderVisible(true);
        values.setLinesVisible(true);
        column(values, Messages.StressTables_quantity, 150, SWT.LEFT);
        column(values, Messages.StressTables_value, 175, SWT.RIGHT);
        column(values, Messages.StressTables_unit, 45, SWT.LEFT);
        contributions = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION);
        contributions.setHeaderVisible(true);
        contributions.setLinesVisible(true);
        column(contributions, Messages.StressTables_force, 70, SWT.LEFT);
        column(contributions, Messages.StressTables_sigmaZ, 90, SWT.RIGHT);
        column(contributions, Messages.StressTables_tauZX, 90, SWT.RIGHT);
        column(contributions, Messages.StressTables_tauZY, 90, SWT.RIGHT);
    }

    Table values() {
        return values;
    }

    Table contributions() {
        return contributions;
    }

    private static void column(Table t, String text, int width, int style) {
        TableColumn c = new TableColumn(t, style);
        c.setText(text);
        c.setWidth(width);
    }

    void clear() {
        values.removeAll();
        contributions.removeAll();
    }

    void show(PointReport r) {
        PointStress s = r.stress();
        String len = r.units().length(), st = r.units().stressUnit();
        StressComponents t = s.total();
        PrincipalStresses p = s.principal();
        List<String[]> rows = new ArrayList<>();
        rows.add(row(Messages.StressTables_x, s.point().x(), len));
        rows.add(row(Messages.StressTables_y, s.point().y(), len));
        rows.add(row(Messages.StressTables_sigmaZ, s.sigmaZ(), st));
        rows.add(row(Messages.StressTables_tauZX, t == null ? Double.NaN : t.tauZX(), st));
        rows.add(row(Messages.StressTables_tauZY, t == null ? Double.NaN : t.tauZY(), st));
        rows.add(row(Messages.StressTables_tau, t == null ? Double.NaN : t.tauResultant(), st));
        rows.add(row(Messages.StressTables_sigma1, p == null ? Double.NaN : p.sigma1(), st));
        rows.add(row(Messages.StressTables_sigma2, p == null ? Double.NaN : p.sigma2(), st));
        rows.add(row(Messages.StressTables_sigma3, p == null ? Double.NaN : p.sigma3(), st));
        rows.add(new String[] { Messages.StressTables_dir1, p == null ? "" : direction(p.dir1()), "" }); //$NON-NLS-1$ //$NON-NLS-2$
        rows.add(new String[] { Messages.StressTables_dir2, p == null ? "" : direction(p.dir2()), "" }); //$NON-NLS-1$ //$NON-NLS-2$
        rows.add(new String[] { Messages.StressTables_dir3, p == null ? "" : direction(p.dir3()), "" }); //$NON-NLS-1$ //$NON-NLS-2$
        rows.add(row(Messages.StressTables_tauMax, p == null ? Double.NaN : p.tauMax(), st));
        rows.add(row(Messages.StressTables_vonMises, p == null ? Double.NaN : p.vonMises(), st));
        rows.add(row(Messages.StressTables_tresca, p == null ? Double.NaN : p.tresca(), st));
        rows.add(row(Messages.StressTables_utilisation, r.utilisation(), "")); //$NON-NLS-1$
        rows.add(new String[] { Messages.StressTables_governing,
                r.governing() == null ? Messages.StressTables_noLimits : r.governing(), "" }); //$NON-NLS-1$
        for (Map.Entry<String, Double> e : r.utilisations().entrySet()) {
            rows.add(row(NLS.bind(Messages.StressTables_utilisationOf, e.getKey()), e.getValue(), "")); //$NON-NLS-1$
        }
        CheckResult fatigue = r.fatigue() == null ? null : r.fatigue().governing();
        if (fatigue != null) {
            rows.add(row(Messages.StressTables_fatigueUtilisation, fatigue.utilisation(), "")); //$NON-NLS-1$
            rows.add(new String[] { Messages.StressTables_fatigueGoverning, fatigue.criterion(), "" }); //$NON-NLS-1$
            rows.add(new String[] { Messages.StressTables_fatigueHistory, fatigue.caseId(), "" }); //$NON-NLS-1$
        }
        fill(values, rows);

        List<String[]> c = new ArrayList<>();
        for (ForceComponent f : ForceComponent.values()) {
            StressComponents v = s.contributions().get(f);
            c.add(v == null ? new String[] { f.key(), Messages.StressTables_unavailable, "", "" } //$NON-NLS-1$ //$NON-NLS-2$
                    : new String[] { f.key(), num(v.sigmaZ()), num(v.tauZX()), num(v.tauZY()) });
        }
        c.add(t == null ? new String[] { Messages.StressTables_total, num(s.sigmaZ()), "", "" } //$NON-NLS-1$ //$NON-NLS-2$
                : new String[] { Messages.StressTables_total, num(t.sigmaZ()), num(t.tauZX()), num(t.tauZY()) });
        fill(contributions, c);
    }

    private static void fill(Table table, List<String[]> rows) {
        if (table.getItemCount() != rows.size()) {
            table.setItemCount(rows.size());
        }
        for (int i = 0; i < rows.size(); i++) {
            TableItem item = table.getItem(i);
            String[] texts = rows.get(i);
            for (int k = 0; k < texts.length; k++) {
                if (!texts[k].equals(item.getText(k))) {
                    item.setText(k, texts[k]);
                }
            }
        }
    }

    private static String[] row(String name, double v, String unit) {
        return new String[] { name, num(v), unit };
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "\u2014" : ResultsText.number(v); //$NON-NLS-1$
    }

    private static String direction(double[] d) {
        return String.format(java.util.Locale.ROOT, "(%.4f, %.4f, %.4f)", d[0] + 0.0, d[1] + 0.0, d[2] + 0.0); //$NON-NLS-1$
    }
}
