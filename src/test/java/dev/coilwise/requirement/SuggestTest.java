package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class SuggestTest {
    // Classic Levenshtein examples: kitten -> sitting = 3, flaw -> lawn = 2 (V. I. Levenshtein, 1965; the pairs are
    // the ones most textbooks use, e.g. Jurafsky & Martin, Speech and Language Processing, 3rd ed. draft, ch. 2; from memory).
    @Test
    void editDistanceOfTextbookPairs() {
        assertThat(Suggest.distance("kitten", "sitting")).isEqualTo(3);
        assertThat(Suggest.distance("flaw", "lawn")).isEqualTo(2);
        assertThat(Suggest.distance("", "abc")).isEqualTo(3);
        assertThat(Suggest.distance("same", "same")).isZero();
    }

    @Test
    void suggestsOnlyCloseWords() {
        List<String> keys = List.of("stroke", "peak_force", "deceleration");
        assertThat(Suggest.nearest("strok", keys)).contains("stroke");
        assertThat(Suggest.nearest("peak-force", keys)).contains("peak_force");
        assertThat(Suggest.nearest("decelleration", keys)).contains("deceleration");
        assertThat(Suggest.nearest("colour", keys)).isEmpty();
        assertThat(Suggest.hint("xyz", keys)).isEmpty();
    }
}
