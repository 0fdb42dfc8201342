package dev.coilwise;
import net.jqwik.api.*;
import org.junit.jupiter.api.Test;
import static org.assertj.core.api.Assertions.assertThat;
class SmokeTest { @Test void runs() { assertThat(1 + 1).isEqualTo(2); }
 @Property(tries=10) void prop(@ForAll int a) { assertThat(a ^ a).isZero(); } }
