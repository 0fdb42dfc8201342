package dev.coilwise.report;

import dev.coilwise.error.BadInputException;
import dev.coilwise.tolerance.En15800;
import java.util.Optional;

/**
 * What the buyer adds to a design to make it an order.
 *
 * @param quantity number of springs (≥ 1)
 * @param grade    EN 15800 tolerance grade 1, 2 or 3
 * @param helix    coiling direction when it matters, or empty (right-hand, maker's option)
 * @param surface  surface finish or protection, or empty when not specified
 */
public record Order(int quantity, int grade, Optional<Helix> helix, String surface) {

    /** Direction of the helix. */
    public enum Helix {
        RIGHT("right-hand"), LEFT("left-hand");

        private final String label;

        Helix(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    public Order {
        if (quantity < 1) {
            throw new BadInputException("order quantity must be at least 1 spring, got " + quantity);
        }
        En15800.checkGrade(grade);
        surface = surface == null ? "" : surface.strip();
    }

    /** Helix and surface left to the maker. */
    public static Order of(int quantity, int grade) {
        return new Order(quantity, grade, Optional.empty(), "");
    }
}
