package org.tensio.cli.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.fatigue.FatigueCriterion;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * The fatigue section of the report (an invented rotating shaft with a shoulder fillet and a keyseat), read back
 * with jsoup, the JDK's XML parser for the diagram's SVG and PDFBox for the PDF.
 */
class FatigueReportTest {

    private static final SectionAnalysisService ENGINE = SectionAnalysisService.create();

    @TempDir
    Path dir;

    @Test
    void fatigueSectionWithDiagramFactorsAndCaution() throws Exception {
        Path file = dir.resolve("shaft.tensio.json");
        Files.writeString(file, """
                {"tensio": 1, "name": "Invented mill shaft",
                 "materials": {"steel": {"E": 210000, "nu": 0.3, "fy": 420, "fu": 700}},
                 "sections": {"d50": {"material": "steel", "profile": {"type": "CircleProfile", "radius": 25}}},
                 "stations": {"S": {"section": "d50", "forces": {"run": {"Mx": 4e5, "T": 6e5}}}},
                 "fatigue": {"materials": {"steel": {"estimate": "steel", "surface": "machined"}},
                   "stations": {"S": {"histories": {"running": {"rotating": "run"}}, "requiredFactor": 2,
                     "notches": [{"type": "shoulderFillet", "kt": 1.8, "kts": 1.5, "radius": 2},
                                 {"type": "keyseat", "location": {"points": [[0, 25]], "within": 5}}]}}}}
                """, StandardCharsets.UTF_8);
        Project p = ENGINE.readProject(file);
        CheckReport r = CheckOp.check(p, ENGINE);
        Path html = ReportWriter.write(dir.resolve("out"), file, p, r, ENGINE, Clock.fixed(Instant.parse(
                "2026-01-02T03:04:05Z"), ZoneOffset.UTC));
        Document dom = Jsoup.parse(Files.readString(html, StandardCharsets.UTF_8));
        assertNotNull(dom.getElementById("fatigue"));
        Element caution = dom.getElementById("caution-fatigue");
        assertNotNull(caution);
        assertTrue(caution.text().contains("sensitive to the surface, notch and load-spectrum assumptions"));
        assertTrue(caution.text().contains("governing design rules"));
        Element svg = dom.selectFirst("svg.fatigue-diagram");
        assertNotNull(svg);
        // well-formed SVG, with a legend entry for each chosen fatigue line
        DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(new ByteArrayInputStream(svg.outerHtml()
                .getBytes(StandardCharsets.UTF_8)));
        for (FatigueCriterion c : List.of(FatigueCriterion.fatigueGoodman, FatigueCriterion.fatigueGerber,
                FatigueCriterion.fatigueAsmeElliptic, FatigueCriterion.fatigueSoderberg)) {
            assertTrue(svg.text().contains(c.label()), c.label());
        }
        assertTrue(svg.text().contains("load line"));
        Element factors = dom.getElementById("fatigue-0-factors");
        assertNotNull(factors);
        for (String k : List.of("Se'", "ka", "kb", "kc", "kd", "ke", "kf", "Se", "Kt", "q", "Kf")) {
            Element row = factors.select("tr").stream().filter(tr -> k.equals(tr.attr("data-key"))).findFirst()
                    .orElse(null);
            assertNotNull(row, k);
            assertTrue(row.select("td").last().text().length() > 0, k + " has a source");
        }
        Element criteria = dom.getElementById("fatigue-0-criteria");
        assertEquals(6, criteria.select("tbody tr").size());
        // the static station drawing still uses the static result
        assertTrue(dom.text().contains("Governing: case run, criterion vonMises"));
        try (PDDocument pdf = Loader.loadPDF(ReportWriter.pdfFor(html).toFile())) {
            String t = new PDFTextStripper().getText(pdf).replaceAll("\\s+", " ");
            assertTrue(t.contains("Fatigue diagram at G, history running"), "diagram drawn in the PDF");
            assertTrue(t.contains("Fatigue results are sensitive to the surface, notch and load-spectrum"));
        }
    }

    /** The criteria's curves end where their equations say (σm' = 0: Se; σa' = 0: Sut or Sy). */
    @Test
    void curvesEndOnTheAxes() {
        double se = 200, sut = 700, sy = 420;
        double[] gerber = FatigueDrawing.curve(FatigueCriterion.fatigueGerber, se, sut, sy);
        assertEquals(se, gerber[1], 0);
        assertEquals(sut, gerber[gerber.length - 2], 0);
        assertEquals(0, gerber[gerber.length - 1], 1e-12);
        double[] asme = FatigueDrawing.curve(FatigueCriterion.fatigueAsmeElliptic, se, sut, sy);
        assertEquals(se, asme[1], 0);
        assertEquals(sy, asme[asme.length - 2], 1e-12);
        for (int i = 0; i + 1 < asme.length; i += 2) {
            assertEquals(1, Math.pow(asme[i] / sy, 2) + Math.pow(asme[i + 1] / se, 2), 1e-12);
        }
        assertEquals(List.of(0.0, se, sut, 0.0), java.util.Arrays.stream(FatigueDrawing.curve(
                FatigueCriterion.fatigueGoodman, se, sut, sy)).boxed().toList());
    }
}
