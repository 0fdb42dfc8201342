package dev.coilwise.report;

import dev.coilwise.error.InternalFaultException;
import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

/**
 * Writes a {@link SpecSheet} as a one-page A4 PDF (Apache PDFBox 3): title, the fields in two columns, the
 * force–deflection diagram drawn with PDF lines, notes and the caution. Uses the standard Helvetica fonts, so
 * characters outside their encoding are replaced (e.g. ≤ by &lt;=).
 */
public final class SpecSheetPdfWriter {
    private static final float MARGIN = 40;
    private static final float GAP = 18;
    private static final float LABEL_W = 92;
    private static final float SIZE = 8;
    private static final float LEAD = 10;

    private final PDType1Font regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    private final PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
    private final Map<Character, String> safe = new HashMap<>();

    private SpecSheetPdfWriter() {
    }

    /** Writes the sheet to {@code out} (not closed). */
    public static void write(SpecSheet sheet, OutputStream out) throws IOException {
        new SpecSheetPdfWriter().render(sheet, out);
    }

    private void render(SpecSheet sheet, OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(PDRectangle.A4);
            doc.addPage(page);
            doc.getDocumentInformation().setTitle(sheet.title());
            doc.getDocumentInformation().setSubject(sheet.subtitle());
            doc.getDocumentInformation().setCreator("coilwise");
            float width = page.getMediaBox().getWidth();
            float top = page.getMediaBox().getHeight() - MARGIN;
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                float y = top;
                y = text(cs, bold, 14, MARGIN, y, sheet.title()) - 4;
                y = text(cs, regular, 9, MARGIN, y, sheet.subtitle()) - 6;
                float colW = (width - 2 * MARGIN - GAP) / 2;
                int split = 2; // Material and Geometry on the left, the rest on the right
                float yl = y;
                float yr = y;
                for (int i = 0; i < sheet.sections().size(); i++) {
                    SpecSection s = sheet.sections().get(i);
                    if (i < split) {
                        yl = section(cs, s, MARGIN, yl, colW);
                    } else {
                        yr = section(cs, s, MARGIN + colW + GAP, yr, colW);
                    }
                }
                y = Math.min(yl, yr) - 6;
                float textW = width - 2 * MARGIN;
                List<String> notes = new ArrayList<>();
                for (String n : sheet.notes()) {
                    notes.addAll(wrap("- " + n, regular, 7, textW));
                }
                List<String> caution = wrap(sheet.caution(), bold, 8, textW - 8);
                float tail = notes.size() * 9 + caution.size() * 10 + 30;
                float diagramH = Math.min(210, y - MARGIN - tail);
                if (diagramH < 110) {
                    throw new InternalFaultException("the specification sheet does not fit one A4 page");
                }
                DiagramPainter.paint(sheet.diagram(), new PdfCanvas(cs), MARGIN, y - diagramH, textW, diagramH);
                y -= diagramH + 12;
                for (String line : notes) {
                    y = text(cs, regular, 7, MARGIN, y, line) + 1;
                }
                y -= 6;
                float boxTop = y + 2;
                for (String line : caution) {
                    y = text(cs, bold, 8, MARGIN + 4, y - 2, line) + 2;
                }
                cs.setLineWidth(0.8f);
                cs.addRect(MARGIN, y - 4, textW, boxTop - y + 4);
                cs.stroke();
            }
            doc.save(out);
        }
    }

    private float section(PDPageContentStream cs, SpecSection s, float x, float y, float w) throws IOException {
        y = text(cs, bold, 9.5f, x, y - 4, s.heading());
        cs.setLineWidth(0.5f);
        cs.moveTo(x, y + 1.5f);
        cs.lineTo(x + w, y + 1.5f);
        cs.stroke();
        y -= 3;
        for (SpecField f : s.fields()) {
            List<String> label = wrap(f.label(), bold, SIZE - 0.5f, LABEL_W - 4);
            List<String> value = wrap(f.value(), regular, SIZE, w - LABEL_W);
            float yy = y;
            for (String l : label) {
                yy = text(cs, bold, SIZE - 0.5f, x, yy, l);
            }
            float yv = y;
            for (String v : value) {
                yv = text(cs, regular, SIZE, x + LABEL_W, yv, v);
            }
            y = Math.min(yy, yv) - 2;
        }
        return y;
    }

    /** Writes one line with its baseline {@code LEAD}-ish below {@code y}; returns the next line's top. */
    private float text(PDPageContentStream cs, PDType1Font font, float size, float x, float y, String s)
            throws IOException {
        float baseline = y - size;
        cs.beginText();
        cs.setFont(font, size);
        cs.newLineAtOffset(x, baseline);
        cs.showText(pdfSafe(font, s));
        cs.endText();
        return baseline - (LEAD - SIZE) * size / SIZE - 1;
    }

    private List<String> wrap(String text, PDType1Font font, float size, float width) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && width(font, size, candidate) > width) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        lines.add(line.toString());
        return lines;
    }

    private float width(PDType1Font font, float size, String s) throws IOException {
        return font.getStringWidth(pdfSafe(font, s)) / 1000 * size;
    }

    /** Replaces characters the standard fonts cannot encode. */
    String pdfSafe(PDType1Font font, String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (char ch : s.toCharArray()) {
            sb.append(safe.computeIfAbsent(ch, c -> {
                try {
                    font.encode(String.valueOf(c));
                    return String.valueOf(c);
                } catch (IOException | IllegalArgumentException e) {
                    return switch (c) {
                        case '≤' -> "<=";
                        case '≥' -> ">=";
                        case '–', '—', '−' -> "-";
                        case '…' -> "...";
                        default -> "?";
                    };
                }
            }));
        }
        return sb.toString();
    }

    /** Diagram drawing on a PDF content stream. */
    private final class PdfCanvas implements DiagramCanvas {
        private final PDPageContentStream cs;

        PdfCanvas(PDPageContentStream cs) {
            this.cs = cs;
        }

        @Override
        public void line(double x1, double y1, double x2, double y2, double width, boolean dashed) {
            try {
                cs.setLineWidth((float) width);
                cs.setLineDashPattern(dashed ? new float[] {2, 2} : new float[0], 0);
                cs.moveTo((float) x1, (float) y1);
                cs.lineTo((float) x2, (float) y2);
                cs.stroke();
                cs.setLineDashPattern(new float[0], 0);
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }

        @Override
        public void dot(double x, double y, double r) {
            try {
                float k = 0.5523f * (float) r;
                float cx = (float) x;
                float cy = (float) y;
                float rr = (float) r;
                cs.moveTo(cx + rr, cy);
                cs.curveTo(cx + rr, cy + k, cx + k, cy + rr, cx, cy + rr);
                cs.curveTo(cx - k, cy + rr, cx - rr, cy + k, cx - rr, cy);
                cs.curveTo(cx - rr, cy - k, cx - k, cy - rr, cx, cy - rr);
                cs.curveTo(cx + k, cy - rr, cx + rr, cy - k, cx + rr, cy);
                cs.fill();
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }

        @Override
        public void text(double x, double y, double size, Anchor anchor, String s) {
            try {
                float w = width(regular, (float) size, s);
                float dx = anchor == Anchor.START ? 0 : anchor == Anchor.MIDDLE ? w / 2 : w;
                cs.beginText();
                cs.setFont(regular, (float) size);
                cs.newLineAtOffset((float) x - dx, (float) y);
                cs.showText(pdfSafe(regular, s));
                cs.endText();
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }
    }
}
