package com.fenwickroe.tensio.housekit;

import java.util.List;
import java.util.Locale;

import org.tensio.cli.report.spi.ReportContent;
import org.tensio.cli.report.spi.ReportContext;
import org.tensio.cli.report.spi.ReportSection;
import org.tensio.engine.checks.CheckResult;

/**
 * The sign-off block the fictitious firm's quality procedure QP-12 asks of every calculation: what was checked
 * (input file and hash, number of checks, largest utilisation) and a table for the preparer, checker and
 * approver to sign.
 */
public final class SignOffSection implements ReportSection {

    @Override
    public String id() {
        return "signOff";
    }

    @Override
    public String title() {
        return "Sign-off (QP-12)";
    }

    @Override
    public void write(ReportContext context, ReportContent content) {
        List<CheckResult> results = context.checks().results();
        long houseRule = results.stream().filter(r -> r.criterion().equals(HouseCombinedCriterion.ID)).count();
        content.paragraph(String.format(Locale.ROOT, "Input %s (SHA-256 %s), %d checks of which %d by house rule"
                + " FR-7; largest utilisation %.3f; %s.", context.projectFile().getFileName(), context.inputSha256(),
                results.size(), houseRule, context.checks().maxUtilisation(),
                context.checks().passed() ? "all pass" : "SOME FAIL"));
        content.table("Signatures", List.of("Role", "Name", "Signature", "Date"), List.of(
                List.of("Prepared", "", "", ""),
                List.of("Checked", "", "", ""),
                List.of("Approved", "", "", "")));
        content.note("A signature certifies the review of the inputs and assumptions, not only of the numbers.");
    }
}
