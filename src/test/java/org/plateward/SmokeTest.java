package org.plateward;
import org.junit.jupiter.api.Test;
import static org.assertj.core.api.Assertions.assertThat;
class SmokeTest { @Test void one() { assertThat(1 + 1).isEqualTo(2); } }
