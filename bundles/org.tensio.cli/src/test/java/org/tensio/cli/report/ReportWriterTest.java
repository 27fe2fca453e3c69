package org.tensio.cli.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import javax.xml.parsers.DocumentBuilderFactory;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;

/**
 * The HTML and PDF reports of a small invented project, read back with real parsers (jsoup for the HTML, the
 * JDK's XML parser for each SVG, PDFBox for the PDF). The check results are built here, by taking the largest
 * demand over a few candidate points per station, case and criterion, since the check engine is not needed to
 * test what the report shows.
 */
class ReportWriterTest {

    private static final Instant NOW = Instant.parse("2025-03-04T05:06:07Z");
    private static final SectionAnalysisService ENGINE = SectionAnalysisService.create();

    private static Path fixture;
    private static Project project;
    private static CheckReport report;

    @TempDir
    static Path out;

    private static Path html;
    private static String text;
    private static Document dom;

    @BeforeAll
    static void writeReport() throws Exception {
        fixture = Path.of(ReportWriterTest.class.getResource("/report/beam.tensio.json").toURI());
        Project read = ENGINE.readProject(fixture);
        Map<String, MaterialLimits> limits = Map.of(
                "S355", new MaterialLimits("S355", List.of(Criterion.vonMises, Criterion.shear), 1.0, 355.0, null, null,
                        null, null),
                "AL", new MaterialLimits("AL", List.of(Criterion.vonMises), 1.1, 260.0, null, null, null, null));
        project = new Project(read.units(), read.materials(), read.sections(), read.stations(), read.combinations(),
                limits);
        report = checks(project);
        html = ReportWriter.write(out.resolve("reports"), fixture, project, report, ENGINE,
                Clock.fixed(NOW, ZoneOffset.UTC));
        text = Files.readString(html, StandardCharsets.UTF_8);
        dom = Jsoup.parse(text);
    }

    /** Governing result per station, case and criterion over candidate points (corners, edge mid-points, centre). */
    static CheckReport checks(Project p) {
        Map<String, List<Point2>> candidates = Map.of(
                "A", List.of(new Point2(-30, 10), new Point2(30, 10), new Point2(-30, -10), new Point2(30, -10),
                        new Point2(0, 10), new Point2(30, 0), new Point2(0, 0)),
                "B", List.of(new Point2(-40, 0), new Point2(40, 0), new Point2(-20, 40), new Point2(20, 40),
                        new Point2(0, 10), new Point2(0, 25)));
        List<CheckResult> results = new ArrayList<>();
        for (String st : p.stations().keySet()) {
            for (String cs : List.of("G", "Q", "ULS")) {
                for (Criterion c : List.of(Criterion.vonMises, Criterion.shear)) {
                    CheckResult best = null;
                    for (Point2 pt : candidates.get(st)) {
                        PointStress s = ENGINE.stressAt(p, st, cs, pt);
                        MaterialLimits ml = p.limits().get(s.material());
                        if (!ml.criteria().contains(c)) {
                            continue;
                        }
                        double d = MaterialLimits.demand(c, s.total().sigmaZ(), s.total().tauZX(), s.total().tauZY());
                        double cap = ml.capacity(c);
                        if (best == null || d / cap > best.utilisation()) {
                            best = new CheckResult(st, cs, c.name(), s.material(), d / cap, d, cap, pt,
                                    s.total().sigmaZ(), s.total().tauZX(), s.total().tauZY(), false);
                        }
                    }
                    if (best != null) {
                        results.add(best);
                    }
                }
            }
        }
        double max = results.stream().mapToDouble(CheckResult::utilisation).max().orElse(0);
        return new CheckReport(max <= 1, max, results, List.of("fixture: results built by the test"));
    }

    @Test
    void writesBothFilesAtomicallyAndNothingElse() throws Exception {
        assertEquals("beam.report.html", html.getFileName().toString());
        Path pdf = ReportWriter.pdfFor(html);
        assertTrue(Files.isRegularFile(pdf), pdf.toString());
        try (Stream<Path> files = Files.list(html.getParent())) {
            assertEquals(List.of("beam.report.html", "beam.report.pdf"),
                    files.map(f -> f.getFileName().toString()).sorted().toList(), "no temporary files are left");
        }
    }

    @Test
    void cautionStandsFirstAndLast() {
        Element top = dom.getElementById("caution-top");
        Element bottom = dom.getElementById("caution-bottom");
        assertEquals(ReportWriter.CAUTION, top.text());
        assertEquals(ReportWriter.CAUTION, bottom.text());
        Elements body = dom.body().children();
        assertTrue(body.indexOf(top) < body.indexOf(dom.selectFirst("h2")), "top caution before the first section");
        assertEquals(bottom, body.last(), "bottom caution is the last element");
    }

    @Test
    void tiesTheReportToItsInput() throws Exception {
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(fixture)));
        assertEquals(sha, dom.selectFirst("table#report-facts tr[data-key=sha256] td.mono").text());
        assertEquals("2025-03-04T05:06:07Z", dom.selectFirst("table#report-facts tr[data-key=date] td.mono").text());
        assertEquals("Report fixture (invented)", dom.selectFirst("table#report-facts tr[data-key=project] td + td").text());
        // the engine's bundle version, from its manifest (a class folder in this build: the qualifier is unexpanded)
        String mf = Files.readString(Path.of("../org.tensio.engine/META-INF/MANIFEST.MF"));
        Matcher m = Pattern.compile("Bundle-Version: (\\d+\\.\\d+\\.\\d+)").matcher(mf);
        assertTrue(m.find());
        String version = dom.selectFirst("table#report-facts tr[data-key=engine] td.mono").text();
        assertTrue(version.startsWith(m.group(1)), version);
    }

    @Test
    void utilisationTableHoldsEveryResultAndHighlightsTheGoverningOne() {
        Elements rows = dom.select("table#utilisation tbody tr");
        assertEquals(report.results().size(), rows.size());
        int gov = 0;
        for (int i = 0; i < rows.size(); i++) {
            CheckResult c = report.results().get(i);
            Elements td = rows.get(i).select("td");
            assertEquals(c.station(), td.get(0).text());
            assertEquals(c.caseId(), td.get(1).text());
            assertEquals(c.criterion(), td.get(2).text());
            assertEquals(c.material(), td.get(3).text());
            assertEquals(c.utilisation(), Double.parseDouble(td.get(10).attr("data-value")), 0.0, "exact value kept");
            // shown to 3 decimals: within half a unit of the last digit
            assertEquals(c.utilisation(), Double.parseDouble(td.get(10).text()), 0.5e-3 + 1e-12);
            assertEquals(c.demand(), Double.parseDouble(td.get(8).attr("data-value")), 0.0);
            assertEquals(c.capacity(), Double.parseDouble(td.get(9).attr("data-value")), 0.0);
            assertEquals(c.passed() ? "pass" : "FAIL", td.get(11).text());
            if (c.utilisation() == report.maxUtilisation()) {
                gov = i;
            }
        }
        Elements governing = dom.select("table#utilisation tr.governing");
        assertEquals(1, governing.size());
        assertEquals(Integer.toString(gov), governing.first().attr("data-key"));
    }

    @Test
    void propertiesAreTheExactOnes() {
        // 60 x 20 rectangle: A = b·h = 1200, Ixx = b·h³/12 = 40000, Iyy = h·b³/12 = 360000 (closed forms)
        assertEquals(1200.0, value("bar", "area"), 1200.0 * 1e-12);
        assertEquals(40000.0, value("bar", "ixx"), 40000.0 * 1e-12);
        assertEquals(360000.0, value("bar", "iyy"), 360000.0 * 1e-12);
        assertEquals("1200", dom.selectFirst("table.properties[data-ref=bar] tr[data-key=area] td.num").text());
        // the composite rail: transformed area 80·10 + (70000/210000)·40·30 = 1200 (reference material S355)
        assertEquals(1200.0, value("rail", "area"), 1200.0 * 1e-12);
    }

    private static double value(String section, String key) {
        return Double.parseDouble(dom.selectFirst("table.properties[data-ref=" + section + "] tr[data-key=" + key
                + "] td.num").attr("data-value"));
    }

    @Test
    void inputsAreEchoed() {
        assertEquals(2, dom.select("table#materials tbody tr").size());
        assertEquals("vonMises, shear", dom.selectFirst("table#limits tr[data-key=S355] td + td").text());
        // stations: 2 load cases + 1 combination each
        assertEquals(6, dom.select("table#station-inputs tbody tr").size());
        Element uls = dom.selectFirst("table#station-inputs tr[data-key=A/ULS]");
        // Mx of ULS at A: 1.35·(−1.5e6) + 1.5·(−2.0e6) = −5.025e6
        assertEquals(-5.025e6, Double.parseDouble(uls.select("td").get(6).attr("data-value")), 1e-6);
        assertTrue(dom.selectFirst("table#section-inputs tr[data-key=bar/1]").text().contains("xDim = 60"));
        assertEquals("1.35 × G + 1.5 × Q", dom.selectFirst("table#combinations tr[data-key=ULS] td + td").text());
    }

    @Test
    void svgDrawingsAreWellFormedXml() throws Exception {
        Matcher m = Pattern.compile("<svg\\b.*?</svg>", Pattern.DOTALL).matcher(text);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        int n = 0;
        while (m.find()) {
            org.w3c.dom.Document svg = f.newDocumentBuilder()
                    .parse(new ByteArrayInputStream(m.group().getBytes(StandardCharsets.UTF_8)));
            assertEquals("svg", svg.getDocumentElement().getLocalName());
            assertEquals("http://www.w3.org/2000/svg", svg.getDocumentElement().getNamespaceURI());
            n++;
        }
        // 2 section drawings + per station a contour plot, a stress element and a Mohr's circle
        assertEquals(2 + 2 * 3, n);
        assertEquals(2, dom.select("svg.section-drawing").size());
        assertEquals(2, dom.select("svg.contour").size());
        assertFalse(text.contains("<script"), "no scripts");
        assertFalse(Pattern.compile("(src|href)\\s*=", Pattern.CASE_INSENSITIVE).matcher(text).find(),
                "no external resources");
    }

    @Test
    void contourMaximumCoversTheGoverningDemand() {
        // each station's governing point is a corner, i.e. a mesh node, so the largest nodal value of the plotted
        // demand is at least the governing demand (legend shows 4 significant digits: half a unit of the last)
        for (String st : List.of("A", "B")) {
            CheckResult g = report.results().stream().filter(c -> c.station().equals(st))
                    .max((a, b) -> Double.compare(a.utilisation(), b.utilisation())).orElseThrow();
            Element svg = dom.select("svg.contour").get(st.equals("A") ? 0 : 1);
            String max = svg.select("text").stream().map(Element::text).filter(t -> t.startsWith("max "))
                    .findFirst().orElseThrow().substring(4);
            double shown = Double.parseDouble(max.replace('−', '-'));
            assertTrue(shown >= g.demand() * (1 - 5e-4), st + ": max " + shown + " < demand " + g.demand());
        }
    }

    @Test
    void pdfHasPagesAndTheCaution() throws Exception {
        try (PDDocument pdf = Loader.loadPDF(ReportWriter.pdfFor(html).toFile())) {
            assertTrue(pdf.getNumberOfPages() >= 1);
            String all = new PDFTextStripper().getText(pdf).replaceAll("\\s+", " ");
            assertTrue(all.contains(ReportWriter.CAUTION), "caution in the PDF text");
            String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(fixture)));
            assertTrue(all.contains(sha), "input hash in the PDF text");
            assertTrue(all.contains("Report fixture (invented)"));
        }
    }

    @Test
    void reportsTheCheckEnginesResults() throws Exception {
        CheckReport real = CheckOp.check(project, ENGINE);
        Path h = ReportWriter.write(out.resolve("real"), fixture, project, real, ENGINE, Clock.fixed(NOW, ZoneOffset.UTC));
        Document d = Jsoup.parse(h.toFile(), "UTF-8");
        Elements rows = d.select("table#utilisation tbody tr");
        assertEquals(real.results().size(), rows.size());
        assertTrue(rows.size() > 0);
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(real.results().get(i).utilisation(),
                    Double.parseDouble(rows.get(i).select("td").get(10).attr("data-value")), 0.0);
        }
        Element gov = d.selectFirst("table#utilisation tr.governing");
        assertEquals(real.maxUtilisation(), Double.parseDouble(gov.select("td").get(10).attr("data-value")), 0.0);
        assertEquals(real.passed() ? "verdict pass" : "verdict fail", d.getElementById("verdict").className());
    }

    @Test
    void rejectsAFileAsTheFolder() throws Exception {
        Path f = Files.writeString(out.resolve("not-a-folder"), "x");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ReportWriter.write(f, fixture, project, report, ENGINE));
        assertTrue(e.getMessage().contains("not-a-folder"), e.getMessage());
    }
}
