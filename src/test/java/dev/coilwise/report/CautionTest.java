package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;

class CautionTest {
    /** What the caution must say (project rules, safety): stored energy, who gets hurt, design aid, test, who governs. */
    @Test
    void theTextSaysWhatTheRulesAskFor() {
        assertThat(Caution.TEXT).startsWith("CAUTION").contains("springs store energy",
                "launched payloads and failing buffers can hurt people", "design aid", "confirmed by test",
                "local codes, standards and licensed engineering practice govern");
    }

    @Test
    void linesWrapAtWordsWithinTheWidthAndJoinBackToTheText() {
        List<String> lines = Caution.lines("# ", 60);
        assertThat(lines).hasSizeGreaterThan(2).allMatch(l -> l.startsWith("# ") && l.length() <= 60);
        assertThat(String.join(" ", lines.stream().map(l -> l.substring(2)).toList())).isEqualTo(Caution.TEXT);
    }

    @Test
    void aWidthWithNoRoomAfterThePrefixIsRefused() {
        assertThatThrownBy(() -> Caution.lines("# ", 2)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("width 2");
    }
}
