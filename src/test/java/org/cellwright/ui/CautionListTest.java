package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class CautionListTest {

    @Test
    void sortsSafetyCautionsFromNotes() {
        CautionList l = CautionList.of(List.of("Chlorine: toxic gas.", "Data validity: outside 10 to 70 C.",
                "Tin(IV) builds up to 11 g/L: it steals cathode current.", "Electrical: up to 6 A flows."));
        assertEquals(List.of("Chlorine", "Electrical"), l.safety().stream().map(CautionList.Caution::topic).toList());
        assertEquals(2, l.notes().size());
        assertEquals("Data validity", l.notes().get(0).topic());
        // a colon late in a sentence is not a topic
        assertEquals("", l.notes().get(1).topic());
        assertEquals("Tin(IV) builds up to 11 g/L: it steals cathode current.", l.notes().get(1).full());
    }

    @Test
    void theTinRunTriggersChlorineHydrogenAndAcid() {
        List<String> warnings = TinRun.run().summary().warnings();
        CautionList l = CautionList.of(warnings);
        // a dendrite shorts the 30 mm gap (the leads then carry the whole current); a graphite anode in a
        // chloride bath gives chlorine; hydrogen at the cathode; 1.5 mol/L HCl
        assertEquals(List.of("Short circuit", "Chlorine", "Hydrogen", "Acid"),
                l.safety().stream().map(CautionList.Caution::topic).toList());
        assertEquals(warnings.size(), l.safety().size() + l.notes().size(), "every warning is shown once");
        String strip = CautionStrip.line(l);
        assertTrue(strip.startsWith("Safety: Short circuit, chlorine, hydrogen, acid."), strip);
    }

    @Test
    void thePanelKeepsItsRowsWhenOnlyFiguresChange() throws Exception {
        javax.swing.SwingUtilities.invokeAndWait(() -> {
            CautionPanel p = new CautionPanel();
            p.show(CautionList.of(List.of("Hydrogen: about 3.00 L of hydrogen.", "Tin(IV) builds up to 11 g/L.")));
            int parts = p.getComponentCount();
            java.awt.Component first = p.getComponent(2);
            CautionList changed = CautionList.of(List.of("Hydrogen: about 5.33 L of hydrogen.", "Tin(IV) builds up to 13 g/L."));
            p.show(changed);
            assertEquals(changed, p.shown());
            assertEquals(parts, p.getComponentCount());
            assertTrue(first == p.getComponent(2), "same components, new text");
            assertEquals("about 5.33 L of hydrogen.", ((WrapText) p.getComponent(2)).getText());
            p.show(CautionList.of(List.of("Chlorine: toxic.")));
            assertEquals("Safety cautions", ((javax.swing.JLabel) p.getComponent(0)).getText());
            assertEquals("toxic.", ((WrapText) p.getComponent(2)).getText());
        });
    }

    @Test
    void hotBathAndNitrateAreSafetyCautions() {
        CautionList l = CautionList.of(List.of("Acid: the bath holds 0.15 mol/L of acid.",
                "Hot bath: the bath reaches 60 C.", "Nitrate: the bath holds 0.52 mol/L of nitrate with acid.",
                "Data validity: the bath runs at 60 to 75 C."));
        assertEquals(List.of("Acid", "Hot bath", "Nitrate"), l.safety().stream().map(CautionList.Caution::topic).toList());
        assertEquals(1, l.notes().size());
        assertTrue(CautionStrip.line(l).startsWith("Safety: Acid, hot bath, nitrate."), CautionStrip.line(l));
    }

    @Test
    void noCautionsSaysSo() {
        assertTrue(CautionStrip.line(CautionList.of(List.of())).startsWith("No safety cautions"));
    }
}
