package dev.coilwise.error;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** The message catalogue itself: every template's placeholders match its declared arity and it formats. */
class MessageTest {
    /** A java.util.Formatter specifier (the grammar of its javadoc), capturing the conversion character. */
    private static final Pattern SPECIFIER =
            Pattern.compile("%(\\d+\\$)?([-#+ 0,(<]*)?(\\d+)?(\\.\\d+)?([tT])?([a-zA-Z%])");

    private static List<Character> conversions(String template) {
        List<Character> out = new ArrayList<>();
        Matcher m = SPECIFIER.matcher(template);
        while (m.find()) {
            char c = m.group(6).charAt(0);
            if (c != '%' && c != 'n') {
                out.add(c);
            }
        }
        return out;
    }

    @ParameterizedTest
    @EnumSource(Message.class)
    void placeholderCountEqualsArity(Message message) {
        List<Character> conv = conversions(message.template());
        assertThat(conv).as(message.name()).hasSize(message.arity());
        // Fill each placeholder with an argument of its kind; the result carries no unfilled specifier.
        Object[] args = conv.stream().map(c -> "fgeaEG".indexOf(c) >= 0 ? (Object) 1.5 : "dxXo".indexOf(c) >= 0 ? (Object) 2 : (Object) "x").toArray();
        assertThat(message.format(args)).doesNotContainPattern("%[sdfgeaEGxo]");
    }

    @Test
    void wrongArgumentCountIsAnInternalFault() {
        assertThatThrownBy(() -> Message.NOT_POSITIVE.format("wire diameter"))
                .isInstanceOf(InternalFaultException.class).hasMessageContaining("NOT_POSITIVE");
    }

    @Test
    void checksNameTheQuantityTheValueAndTheRange() {
        assertThatThrownBy(() -> Check.positive("wire diameter", -2e-3, "m")).isInstanceOf(BadInputException.class)
                .hasMessage("wire diameter must be a finite number greater than zero, got -0.002 m");
        assertThatThrownBy(() -> Check.inRange("losses", Double.NaN, 0, 0.95, "")).isInstanceOf(BadInputException.class)
                .hasMessage("losses must lie between 0 and 0.95, got NaN");
        assertThatThrownBy(() -> Check.nonNegative("drive force", Double.POSITIVE_INFINITY, "N"))
                .hasMessage("drive force must be a finite number of zero or more, got Infinity N");
        assertThatThrownBy(() -> Check.notNull("material", null)).hasMessage("material is required");
        assertThat(Check.positive("rate", 3.5, "N/m")).isEqualTo(3.5);
    }
}
