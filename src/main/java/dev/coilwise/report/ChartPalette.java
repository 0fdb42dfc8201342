package dev.coilwise.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Stroke;

/**
 * coilwise's chart colours and strokes. The two data series differ in hue (blue against orange, a pair that stays
 * apart for the common red-green colour-vision deficiencies) and in lightness (dark against light, so they stay apart
 * in grey print), and also in dash pattern, so a series never depends on colour alone.
 */
public final class ChartPalette {
    /** Text and axis lines: near black. */
    public static final Color INK = new Color(0x1F, 0x23, 0x28);
    /** Grid lines: light grey. */
    public static final Color GRID = new Color(0xD5, 0xD8, 0xDC);
    /** Background: white. */
    public static final Color PAPER = Color.WHITE;
    /** First series (displacement): deep blue, relative lightness about 30 %. */
    public static final Color PRIMARY = new Color(0x1C, 0x4E, 0x80);
    /** Second series (force): orange, relative lightness about 65 %. */
    public static final Color SECONDARY = new Color(0xE3, 0x8B, 0x2C);
    /** First series: solid line. */
    public static final Stroke PRIMARY_STROKE = new BasicStroke(2.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    /** Second series: dashed line. */
    public static final Stroke SECONDARY_STROKE = new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND,
            10f, new float[]{9f, 5f}, 0f);

    private ChartPalette() {
    }
}
