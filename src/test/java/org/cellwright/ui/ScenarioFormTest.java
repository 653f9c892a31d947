package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicInteger;

import javax.swing.SwingUtilities;
import javax.swing.text.JTextComponent;

import org.junit.jupiter.api.Test;

/** The form without a screen: typing goes into the draft, and what is wrong shows under the field at once. */
class ScenarioFormTest {

    @Test
    void typingChecksTheFieldAndShowsWhatIsWrongBesideIt() throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            AtomicInteger edits = new AtomicInteger();
            ScenarioForm form = new ScenarioForm(TinRun.lib(), edits::incrementAndGet);
            try {
                form.show(ScenarioDraft.parse(ScenarioTemplate.defaultTemplate().text(), "tin.toml"));
            } catch (Exception e) {
                throw new AssertionError(e);
            }
            assertEquals(0, form.problemsShown(), "the default scenario is clean");
            assertEquals(0, edits.get(), "showing a draft is not an edit");
            JTextComponent gap = form.field("cell.gap").orElseThrow();
            assertEquals("30 mm", gap.getText());
            gap.setText("30 mmm");
            assertEquals("30 mmm", form.draft().get("cell.gap"));
            assertTrue(edits.get() > 0);
            FieldMessage m = form.message("cell.gap").orElseThrow();
            assertTrue(m.showing());
            assertTrue(m.getText().contains("did you mean 'mm'"), m.getText());
            assertEquals("error", gap.getClientProperty("JComponent.outline"));
            gap.setText("25 mm");
            assertFalse(m.showing(), "fixed: the message goes");
            assertEquals(java.util.List.of("Sn2+", "Fe2+", "H+", "Cl-"), form.species());
        });
    }

    @Test
    void theReadersProblemsShowWhereTheFieldCheckSeesNone() throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            ScenarioForm form = new ScenarioForm(TinRun.lib(), () -> { });
            try {
                form.show(ScenarioDraft.parse(ScenarioTemplate.defaultTemplate().text(), "tin.toml"));
            } catch (Exception e) {
                throw new AssertionError(e);
            }
            // a negative gap has a good unit; only the reader's range check finds it
            form.field("cell.gap").orElseThrow().setText("-5 mm");
            assertFalse(form.message("cell.gap").orElseThrow().showing());
            form.showOutcome(DraftCheck.draft(form.draft(), TinRun.lib(), "tin.toml"));
            assertTrue(form.message("cell.gap").orElseThrow().showing());
        });
    }
}
