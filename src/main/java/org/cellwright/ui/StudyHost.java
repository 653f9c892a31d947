package org.cellwright.ui;

import javax.swing.JFrame;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;

/**
 * What the study views (sweep, plan, bands) need from the main window: the chemistry, the scenario as the
 * form holds it, the look, and a way to show a variant of the scenario in the form and run it. Event thread
 * only.
 */
interface StudyHost {

    /** @return the chemistry library */
    ChemLibrary library();

    /** @return the last version of the form's scenario that checks out, or null */
    Scenario scenario();

    /** @return an independent copy of the form's draft */
    ScenarioDraft draftCopy();

    /** @return the scenario's name (file name or "untitled") */
    String scenarioName();

    /** @return true when the dark look is on */
    boolean dark();

    /** @return the main window's frame (owner of the views) */
    JFrame frame();

    /**
     * Shows a variant of the scenario in the form, runs it and plays it back in the main window.
     *
     * @param d the variant's draft
     * @param what a few words saying where it comes from
     * @return true when it checks out and runs
     */
    boolean load(ScenarioDraft d, String what);

    /** @param text what just happened, for the status bar */
    void say(String text);
}
