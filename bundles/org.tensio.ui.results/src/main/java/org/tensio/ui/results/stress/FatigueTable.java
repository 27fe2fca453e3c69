package org.tensio.ui.results.stress;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.checks.FatiguePointOp;
import org.tensio.engine.fatigue.Factor;
import org.tensio.engine.fatigue.FatigueDetail;
import org.tensio.engine.fatigue.NotchFactors;
import org.tensio.ui.results.model.ResultsText;

/**
 * The fatigue part of the stress-point view: a summary line (on the surface or not, the notch factors Kf, Kfs,
 * Kf,axial that act at the point and which notches give them, Se with its factors) and a table with one row per
 * load history and fatigue criterion — σa′, σm′, σmax′, Se, the factor of safety n and the utilisation 1/n — with
 * the row clicked in the results tree selected, else the governing row. Hidden (excluded from the layout) when the station has no fatigue check.
 */
final class FatigueTable {

    /** Column keys, in order (the tests read cells by these). */
    static final String[] COLUMNS = { "history", "criterion", "sigmaA", "sigmaM", "sigmaMax", "se", "n", //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$ //$NON-NLS-4$ //$NON-NLS-5$ //$NON-NLS-6$ //$NON-NLS-7$
            "utilisation" }; //$NON-NLS-1$

    private final Label summary;
    private final Table table;

    FatigueTable(Composite parent) {
        summary = new Label(parent, SWT.WRAP);
        table = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        String[] titles = { Messages.FatigueTable_history, Messages.FatigueTable_criterion, Messages.FatigueTable_sigmaA,
                Messages.FatigueTable_sigmaM, Messages.FatigueTable_sigmaMax, Messages.FatigueTable_se,
                Messages.FatigueTable_n, Messages.FatigueTable_utilisation };
        int[] widths = { 90, 150, 85, 85, 85, 85, 70, 80 };
        for (int i = 0; i < titles.length; i++) {
            TableColumn c = new TableColumn(table, i < 2 ? SWT.LEFT : SWT.RIGHT);
            c.setText(titles[i]);
            c.setWidth(widths[i]);
        }
    }

    Label summary() {
        return summary;
    }

    Table table() {
        return table;
    }

    /**
     * @param r      the report, or null
     * @param picked the row to select (without a criterion: that history's governing row), or null for the
     *               governing row
     * @return true when something is shown (the view lays the two widgets out only then)
     */
    boolean show(PointReport r, FatigueRow picked) {
        if (r == null || r.fatigue() == null && r.fatigueProblem() == null) {
            table.removeAll();
            summary.setText(""); //$NON-NLS-1$
            return false;
        }
        if (r.fatigue() == null) {
            table.removeAll();
            summary.setText(NLS.bind(Messages.FatigueTable_problem, r.fatigueProblem()));
            return true;
        }
        FatiguePointOp.Result f = r.fatigue();
        String st = r.units().stressUnit(), len = r.units().length();
        List<CheckResult> rows = f.results();
        if (rows.isEmpty()) {
            table.removeAll();
            summary.setText(NLS.bind(Messages.FatigueTable_notChecked, String.join("; ", f.notes()))); //$NON-NLS-1$
            return true;
        }
        FatigueDetail first = rows.get(0).fatigue();
        NotchFactors nf = first.notch();
        String surface = NLS.bind(f.onSurface() ? Messages.FatigueTable_onSurface : Messages.FatigueTable_inside,
                ResultsText.number(f.surfaceDistance()), len);
        summary.setText(NLS.bind(Messages.FatigueTable_summary, new Object[] { surface, fixed(nf.kf()),
                fixed(nf.kfs()), fixed(nf.kfAxial()), first.notchText(), endurance(first, st) }) + '\n'
                + Messages.FatigueTable_caution);
        List<String[]> texts = new ArrayList<>();
        CheckResult governing = f.governing();
        if (picked != null && picked.criterion() == null) {
            CheckResult best = null;
            for (CheckResult c : rows) {
                if (c.caseId().equals(picked.history()) && (best == null || c.utilisation() > best.utilisation())) {
                    best = c;
                }
            }
            picked = best == null ? null : new FatigueRow(best.caseId(), best.criterion());
        }
        int selected = -1;
        for (CheckResult c : rows) {
            FatigueDetail d = c.fatigue();
            if (picked != null ? c.caseId().equals(picked.history()) && c.criterion().equals(picked.criterion())
                    : c == governing) {
                selected = texts.size();
            }
            texts.add(new String[] { d.history(), c.criterion(), ResultsText.number(d.sigmaA()),
                    ResultsText.number(d.sigmaM()), ResultsText.number(d.sigmaMax()), ResultsText.number(d.se()),
                    Double.isInfinite(d.factorOfSafety()) ? "\u221e" : fixed(d.factorOfSafety()), //$NON-NLS-1$
                    fixed(c.utilisation()) });
        }
        if (table.getItemCount() != texts.size()) {
            table.setItemCount(texts.size());
        }
        for (int i = 0; i < texts.size(); i++) {
            TableItem item = table.getItem(i);
            for (int k = 0; k < COLUMNS.length; k++) {
                if (!texts.get(i)[k].equals(item.getText(k))) {
                    item.setText(k, texts.get(i)[k]);
                }
            }
        }
        if (selected < 0 && picked != null) { // the clicked result is not among this point's: the governing one
            selected = rows.indexOf(governing);
        }
        table.setSelection(selected);
        table.showSelection();
        return true;
    }

    /** Se = Se′ · ka · kb · … with the values of the first history (the size factor may differ per history). */
    private static String endurance(FatigueDetail d, String unit) {
        StringBuilder sb = new StringBuilder();
        sb.append(d.endurance().basis().symbol()).append(' ').append(ResultsText.number(d.endurance().basis().value()));
        for (Factor k : d.endurance().factors()) {
            sb.append(" \u00b7 ").append(k.symbol()).append(' ').append(fixed(k.value())); //$NON-NLS-1$
        }
        return NLS.bind(Messages.FatigueTable_endurance, new Object[] { ResultsText.number(d.se()), unit, sb });
    }

    private static String fixed(double v) {
        return String.format(Locale.ROOT, "%.4f", v); //$NON-NLS-1$
    }
}
