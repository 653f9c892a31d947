package org.cellwright.ui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.AtomicFile;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.UnitException;

/**
 * The scenario being worked on: which file it came from, the form's draft, whether it was changed since it
 * was saved, and the last version of it that checks out. Typing in the form checks the whole scenario once
 * the typing pauses and, when a run is shown, replots it; a slider changes the scenario at once (and the form
 * with it) and replots. Event thread only.
 */
final class ScenarioSession {

    /** Quiet time after the last key before the whole scenario is checked (ms): one check per pause in typing. */
    static final int CHECK_AFTER_MS = 300;

    /** Hears of changes to the file name or the changed-since-saved mark. */
    interface TitleListener {
        /**
         * @param name the scenario's name (file name, or "untitled")
         * @param changed true when changed since it was saved
         */
        void titleChanged(String name, boolean changed);
    }

    private final ChemLibrary lib;
    private final ScenarioForm form;
    private final KnobPanel knobs;
    private final RunDirector director;
    private final StatusBar status;
    private final TitleListener title;
    private final Debouncer check;
    private Path file;
    private String name = "untitled";
    private boolean changed;
    private Scenario scenario;
    private WhatIf whatIf;
    private String species;

    ScenarioSession(ChemLibrary lib, ScenarioForm form, KnobPanel knobs, RunDirector director, StatusBar status,
                    TitleListener title) {
        this.lib = lib;
        this.form = form;
        this.knobs = knobs;
        this.director = director;
        this.status = status;
        this.title = title;
        this.check = new Debouncer(CHECK_AFTER_MS, () -> recheck(System.nanoTime()));
    }

    /**
     * Opens scenario text in the form.
     *
     * @param text the text
     * @param displayName the name to show
     * @param source the file it came from, or null (a template: saving asks for a file)
     * @throws ScenarioException when the text is not valid TOML (then nothing changes)
     */
    void open(String text, String displayName, Path source) throws ScenarioException {
        ScenarioDraft d = ScenarioDraft.parse(text, displayName);
        check.cancel();
        file = source;
        name = displayName;
        scenario = null;
        whatIf = null;
        species = null;
        form.show(d);
        DraftCheck.Outcome o = DraftCheck.draft(d, lib, name);
        form.showOutcome(o);
        changed = false;
        title.titleChanged(name, false);
        if (o.ok()) {
            adopt(o.scenario(), true);
            director.prepare(scenario);
            status.say("Opened " + name + ". Press Run (F5) to watch it unfold, or move a slider.");
        } else {
            status.fail(name + " has problems, marked in the form: fix them to run it.");
        }
    }

    /**
     * Opens a scenario file.
     *
     * @param path the file
     * @throws IOException when it cannot be read
     * @throws ScenarioException when it is not valid TOML
     */
    void openFile(Path path) throws IOException, ScenarioException {
        String text = Files.readString(path, StandardCharsets.UTF_8);
        open(text, path.getFileName().toString(), path);
    }

    /**
     * Starts a new scenario from a shipped one (not tied to a file).
     *
     * @param t the template
     */
    void newFrom(ScenarioTemplate t) {
        try {
            open(t.text(), "untitled (from " + t.fileName() + ")", null);
            changed = true;
            title.titleChanged(name, true);
        } catch (ScenarioException e) {
            throw new IllegalStateException("a shipped scenario does not read: " + e.getMessage(), e);
        }
    }

    /**
     * Opens scenario text made from the one shown (a fitted scenario), not tied to a file and marked changed,
     * so that saving asks for a file.
     *
     * @param text the text
     * @param displayName the name to show
     * @throws ScenarioException when the text is not valid TOML (then nothing changes)
     */
    void openDerived(String text, String displayName) throws ScenarioException {
        ScenarioDraft d = ScenarioDraft.parse(text, displayName);
        FormRounding.derived(d);
        open(DraftToml.write(d).text(), displayName, null);
        changed = true;
        title.titleChanged(name, true);
    }

    /** @return the file the scenario is saved in, or null */
    Path file() {
        return file;
    }

    /** @return the scenario's name */
    String name() {
        return name;
    }

    /** @return true when changed since saved */
    boolean changed() {
        return changed;
    }

    /** @return the last version that checks out, or null */
    Scenario scenario() {
        return scenario;
    }

    /** @return what the sliders do */
    WhatIf whatIf() {
        return whatIf;
    }

    /**
     * Writes the form's scenario, as typed, to a file (whole or not at all).
     *
     * @param target the file
     * @return null when saved, else why not (the form has errors)
     * @throws IOException when it cannot be written
     */
    String saveTo(Path target) throws IOException {
        check.flush();
        DraftCheck.Outcome o = DraftCheck.draft(form.draft(), lib, target.getFileName().toString());
        form.showOutcome(o);
        if (!o.ok()) {
            return "The scenario has problems (marked in the form); fix them before saving.";
        }
        byte[] bytes = o.text().getBytes(StandardCharsets.UTF_8);
        AtomicFile.write(target, out -> out.write(bytes));
        file = target;
        name = target.getFileName().toString();
        changed = false;
        title.titleChanged(name, false);
        status.say("Saved " + target + ".");
        return null;
    }

    /** Runs the scenario from the start and plays it back. */
    void run() {
        check.flush();
        if (scenario == null) {
            status.fail("The scenario has problems (marked in the form); fix them to run it.");
            return;
        }
        status.say("Computing the run...");
        director.run(scenario, label());
    }

    /**
     * Puts a variant of the scenario into the form (a sweep point, a planned schedule), keeps the file it
     * belongs to (marked changed) and runs it, as a slider move does.
     *
     * @param d the variant's draft
     * @param what a few words saying where it comes from
     * @return true when it checks out and runs
     */
    boolean showVariant(ScenarioDraft d, String what) {
        check.cancel();
        form.show(d);
        DraftCheck.Outcome o = DraftCheck.draft(d, lib, name);
        form.showOutcome(o);
        markChanged();
        if (!o.ok()) {
            status.fail(what + " has problems, marked in the form.");
            return false;
        }
        adopt(o.scenario(), true);
        status.say("Running " + what + "...");
        director.run(scenario, label());
        return true;
    }

    /** The user typed in the form. */
    void formEdited() {
        markChanged();
        check.trigger();
    }

    /**
     * A slider moved: changes the scenario and the form, and replots.
     *
     * @param k the slider
     * @param text its value as text
     * @param atNanos when it moved
     */
    void knobMoved(Knob k, String text, long atNanos) {
        if (scenario == null || whatIf == null) {
            return;
        }
        Scenario next;
        try {
            next = whatIf.apply(k, scenario, text);
        } catch (UnitException | IllegalArgumentException e) {
            status.fail("Cannot use " + text + ": " + e.getMessage());
            return;
        }
        scenario = next;
        // the engine starts first; the form catches up while it computes
        director.replot(scenario, label(), atNanos);
        whatIf.writeTo(form.draft(), k, text);
        form.refresh(switch (k) {
            case SUPPLY -> FormFields.SUPPLY_VALUE;
            case GAP -> "cell.gap";
            case CONCENTRATION -> FormFields.COMPOSITION;
            case TEMPERATURE -> "electrolyte.temperature";
            case AGITATION -> FormFields.DIFFUSION_LAYER;
        });
        markChanged();
    }

    /** @param chosen the species the concentration slider changes */
    void speciesChosen(String chosen) {
        species = chosen;
        if (scenario != null) {
            whatIf = new WhatIf(scenario, form.draft().supplyKind(), species, lib);
            knobs.configure(whatIf, scenario, form.species());
        }
    }

    /** @return a few words naming a run of the scenario as it stands */
    String label() {
        return scenario == null ? name : WhatIf.describe(scenario, lib, species);
    }

    private void markChanged() {
        if (!changed) {
            changed = true;
            title.titleChanged(name, true);
        }
    }

    /** Checks the whole draft; when it checks out and differs, adopts it and replots a shown run. */
    private void recheck(long atNanos) {
        DraftCheck.Outcome o = DraftCheck.draft(form.draft(), lib, name);
        form.showOutcome(o);
        if (!o.ok()) {
            status.fail("The scenario has problems, marked in the form.");
            return;
        }
        if (o.scenario().equals(scenario)) {
            return;
        }
        adopt(o.scenario(), false);
        if (director.result() != null) {
            director.replot(scenario, label(), atNanos);
        } else {
            director.prepare(scenario);
        }
        status.say("Scenario checked.");
    }

    /** Takes a checked scenario; sets the sliders up again when their scales no longer fit it. */
    private void adopt(Scenario s, boolean fresh) {
        scenario = s;
        List<String> choice = form.species().stream()
                .filter(sp -> s.electrolyte().compositionMolPerM3().getOrDefault(sp, 0.0) > 0).toList();
        if (species == null || !choice.contains(species)) {
            species = defaultSpecies(s, choice);
        }
        boolean refit = fresh || whatIf == null || !fits(whatIf, s);
        if (refit) {
            whatIf = new WhatIf(s, form.draft().supplyKind(), species, lib);
            knobs.configure(whatIf, s, choice);
        } else {
            knobs.sync(s);
        }
    }

    private boolean fits(WhatIf w, Scenario s) {
        if (w.supplyKind() != form.draft().supplyKind() || !java.util.Objects.equals(w.species(), species)) {
            return false;
        }
        for (Knob k : Knob.values()) {
            if (w.enabled(k) && !w.scale(k).covers(w.value(k, s))) {
                return false;
            }
        }
        return true;
    }

    /** @return the ion of the target metal when the bath has it, else the most concentrated cation */
    private String defaultSpecies(Scenario s, List<String> choice) {
        String target = s.run().targetMetal();
        for (String sp : choice) {
            if (target != null && sp.startsWith(target) && sp.length() > target.length()
                    && !Character.isLowerCase(sp.charAt(target.length()))) {
                return sp;
            }
        }
        return choice.isEmpty() ? null : choice.get(0);
    }
}
