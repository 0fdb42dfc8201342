package dev.coilwise.report;

/** The few drawing operations a force–deflection diagram needs; coordinates in points, y upward. */
interface DiagramCanvas {
    /** Horizontal placement of text relative to its x. */
    enum Anchor {
        START, MIDDLE, END
    }

    void line(double x1, double y1, double x2, double y2, double width, boolean dashed);

    void dot(double x, double y, double radius);

    void text(double x, double y, double size, Anchor anchor, String text);
}
