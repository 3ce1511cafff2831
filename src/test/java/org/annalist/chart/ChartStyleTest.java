package org.annalist.chart;

import static org.assertj.core.api.Assertions.assertThat;

import org.jfree.chart.ui.TextAnchor;
import org.junit.jupiter.api.Test;

class ChartStyleTest {

    @Test
    void aPointerLabelNearAnEndOfTheAxisExtendsInwardsSoThePlotEdgeCannotCutIt() {
        // our rule: within ChartStyle.LABEL_EDGE_SHARE (7 %) of either end the label turns inwards
        assertThat(ChartStyle.pointer("Q3 1986", 0, 0, false, 0.99).getTextAnchor()).isEqualTo(TextAnchor.TOP_RIGHT);
        assertThat(ChartStyle.pointer("Q3 1986", 0, 0, true, 0.99).getTextAnchor()).isEqualTo(TextAnchor.BOTTOM_RIGHT);
        assertThat(ChartStyle.pointer("Q1 1960", 0, 0, true, 0.0).getTextAnchor()).isEqualTo(TextAnchor.BOTTOM_LEFT);
        assertThat(ChartStyle.pointer("Jul 2019", 0, 0, true, 0.5).getTextAnchor()).isEqualTo(TextAnchor.BOTTOM_CENTER);
    }
}
