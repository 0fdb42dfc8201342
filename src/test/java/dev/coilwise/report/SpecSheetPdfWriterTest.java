package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;

/** The PDF, opened again with PDFBox: one page, and every field's label and value in its text. */
class SpecSheetPdfWriterTest {

    private static String norm(String s) {
        return s.replaceAll("\\s+", " ").strip();
    }

    private static byte[] pdf(SpecSheet sheet) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        SpecSheetPdfWriter.write(sheet, out);
        return out.toByteArray();
    }

    @Test
    void thePdfIsOnePageAndHoldsEveryFieldTestLoadAndTheCaution() throws IOException {
        for (SpecSheet sheet : List.of(SpecSheets.bufferSheet(), SpecSheets.launcherSheet())) {
            try (PDDocument doc = Loader.loadPDF(pdf(sheet))) {
                assertThat(doc.getNumberOfPages()).isEqualTo(1);
                assertThat(doc.getDocumentInformation().getTitle()).isEqualTo(sheet.title());
                String text = norm(new PDFTextStripper().getText(doc));
                assertThat(text).contains(norm(sheet.title())).contains(norm(sheet.subtitle()));
                for (SpecSection s : sheet.sections()) {
                    assertThat(text).contains(norm(s.heading()));
                }
                for (SpecField f : sheet.fields()) {
                    assertThat(text).as(f.key()).contains(norm(f.label())).contains(norm(f.value()));
                }
                for (String key : SpecSheet.REQUIRED_KEYS) {
                    assertThat(text).as(key).contains(norm(sheet.field(key).orElseThrow().value()));
                }
                for (String n : sheet.notes()) {
                    assertThat(text).contains(norm(n));
                }
                assertThat(text).contains(norm(Caution.TEXT));
                // diagram labels drawn as PDF text
                assertThat(text).contains(sheet.diagram().xLabel()).contains(sheet.diagram().yLabel()).contains("solid");
            }
        }
    }

    @Test
    void theBufferSheetPrintsTheHandWorkedTestLoad() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf(SpecSheets.bufferSheet()))) {
            String text = norm(new PDFTextStripper().getText(doc));
            // worked by hand in SpecSheetTest#bufferFieldsMatchTheHandWorkedValues
            assertThat(text).contains("98.9 N ± 13.1 N at L1 = 50.00 mm (installed length)");
            assertThat(text).contains("27.00 mm ± 0.350 mm");
        }
    }

    @Test
    void charactersOutsideTheStandardFontAreReplacedNotDropped() throws IOException {
        SpecSheetPdfWriter w = newWriter();
        var font = new org.apache.pdfbox.pdmodel.font.PDType1Font(
                org.apache.pdfbox.pdmodel.font.Standard14Fonts.FontName.HELVETICA);
        assertThat(w.pdfSafe(font, "e1 ≤ 3 mm, ± 0.35 mm, 5 °")).isEqualTo("e1 <= 3 mm, ± 0.35 mm, 5 °");
    }

    private static SpecSheetPdfWriter newWriter() {
        try {
            var c = SpecSheetPdfWriter.class.getDeclaredConstructor();
            c.setAccessible(true);
            return c.newInstance();
        } catch (ReflectiveOperationException e) {
            throw new AssertionError(e);
        }
    }
}
