package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import javax.swing.BorderFactory;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.ListSelectionModel;
import javax.swing.filechooser.FileNameExtensionFilter;

import org.cellwright.io.Problem;

/** The window's dialogs: file choosers, the template picker, problem lists, the key list and the about box. */
final class WindowDialogs {

    private final Component owner;
    private File lastFolder;

    /** @param owner the window the dialogs belong to */
    WindowDialogs(Component owner) {
        this.owner = owner;
        Path scenarios = Path.of("scenarios");
        lastFolder = Files.isDirectory(scenarios) ? scenarios.toAbsolutePath().toFile() : null;
    }

    /** @return the scenario file to open, or null when cancelled */
    Path chooseScenarioToOpen() {
        JFileChooser fc = chooser("Open a scenario");
        fc.setFileFilter(new FileNameExtensionFilter("Scenario files (*.toml)", "toml"));
        if (fc.showOpenDialog(owner) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        lastFolder = fc.getCurrentDirectory();
        return fc.getSelectedFile().toPath();
    }

    /**
     * @param suggested the name to suggest
     * @return the file to save the scenario to (".toml" added when missing), or null when cancelled
     */
    Path chooseScenarioToSave(String suggested) {
        JFileChooser fc = chooser("Save the scenario as");
        fc.setFileFilter(new FileNameExtensionFilter("Scenario files (*.toml)", "toml"));
        fc.setSelectedFile(new File(lastFolder, suggested.endsWith(".toml") ? suggested : suggested + ".toml"));
        if (fc.showSaveDialog(owner) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        lastFolder = fc.getCurrentDirectory();
        Path p = fc.getSelectedFile().toPath();
        if (!p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".toml")) {
            p = p.resolveSibling(p.getFileName() + ".toml");
        }
        return confirmOverwrite(p) ? p : null;
    }

    /**
     * @param baseName the scenario's name without extension
     * @param kind the kind to write, or null to let the user choose
     * @return the file to export to, with the chosen kind's extension, or null when cancelled
     */
    Path chooseExport(String baseName, RunExport.Kind kind) {
        JFileChooser fc = chooser("Export the run");
        fc.setAcceptAllFileFilterUsed(false);
        List<RunExport.Kind> kinds = kind == null ? RunExport.kinds() : List.of(kind);
        for (RunExport.Kind k : kinds) {
            fc.addChoosableFileFilter(new FileNameExtensionFilter(k.toString(), k.extension()));
        }
        fc.setFileFilter(fc.getChoosableFileFilters()[0]);
        fc.setSelectedFile(new File(lastFolder, baseName));
        if (fc.showSaveDialog(owner) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        lastFolder = fc.getCurrentDirectory();
        String ext = ((FileNameExtensionFilter) fc.getFileFilter()).getExtensions()[0];
        RunExport.Kind chosen = kinds.stream().filter(k -> k.extension().equals(ext)).findFirst().orElse(kinds.get(0));
        Path p = RunExport.withExtension(fc.getSelectedFile().toPath(), chosen);
        return confirmOverwrite(p) ? p : null;
    }

    private boolean confirmOverwrite(Path p) {
        return !Files.exists(p) || JOptionPane.showConfirmDialog(owner, p.getFileName() + " exists. Replace it?",
                "Replace file", JOptionPane.OK_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE) == JOptionPane.OK_OPTION;
    }

    private JFileChooser chooser(String title) {
        JFileChooser fc = new JFileChooser(lastFolder);
        fc.setDialogTitle(title);
        return fc;
    }

    /** @return the shipped scenario to start from, or null when cancelled */
    ScenarioTemplate chooseTemplate() {
        List<ScenarioTemplate> all = ScenarioTemplate.all();
        JList<ScenarioTemplate> list = new JList<>(all.toArray(new ScenarioTemplate[0]));
        list.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        list.setSelectedIndex(0);
        JTextArea notes = new JTextArea(8, 50);
        notes.setLineWrap(true);
        notes.setWrapStyleWord(true);
        notes.setEditable(false);
        list.addListSelectionListener(e -> {
            ScenarioTemplate t = list.getSelectedValue();
            notes.setText(t == null ? "" : t.notes());
            notes.setCaretPosition(0);
        });
        notes.setText(all.get(0).notes());
        JPanel p = new JPanel(new BorderLayout(0, 8));
        p.add(new JLabel("Start a new scenario from one of the shipped scenarios:"), BorderLayout.NORTH);
        p.add(new JScrollPane(list), BorderLayout.CENTER);
        JScrollPane notesScroll = new JScrollPane(notes);
        notesScroll.setBorder(BorderFactory.createTitledBorder("What to look at"));
        p.add(notesScroll, BorderLayout.SOUTH);
        p.setPreferredSize(new Dimension(560, 330));
        int ok = JOptionPane.showConfirmDialog(owner, p, "New from template", JOptionPane.OK_CANCEL_OPTION,
                JOptionPane.PLAIN_MESSAGE);
        return ok == JOptionPane.OK_OPTION ? list.getSelectedValue() : null;
    }

    /**
     * @param name what has unsaved changes
     * @return YES to save first, NO to discard, CANCEL to stay
     */
    int confirmDiscard(String name) {
        return JOptionPane.showConfirmDialog(owner, "Save the changes to " + name + " first?", "Unsaved changes",
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.QUESTION_MESSAGE);
    }

    /**
     * @param what the file
     * @param problems what is wrong, each with line and column
     */
    void showProblems(String what, List<Problem> problems) {
        StringBuilder sb = new StringBuilder();
        problems.forEach(p -> sb.append(p.format()).append('\n'));
        JTextArea area = new JTextArea(sb.toString(), Math.min(14, problems.size() + 1), 70);
        area.setEditable(false);
        JPanel p = new JPanel(new BorderLayout(0, 8));
        p.add(new JLabel(what + " cannot be read; nothing was changed:"), BorderLayout.NORTH);
        p.add(new JScrollPane(area), BorderLayout.CENTER);
        JOptionPane.showMessageDialog(owner, p, "Scenario problems", JOptionPane.ERROR_MESSAGE);
    }

    /** @param message what went wrong */
    void showError(String message) {
        JOptionPane.showMessageDialog(owner, message, "Cellwright", JOptionPane.ERROR_MESSAGE);
    }

    /** Lists the keys. */
    void showShortcuts() {
        StringBuilder sb = new StringBuilder("<html><table cellpadding='3'>");
        for (String[] k : WindowActions.KEYS) {
            sb.append("<tr><td><b>").append(k[0]).append("</b></td><td>").append(k[1]).append("</td></tr>");
        }
        JOptionPane.showMessageDialog(owner, sb.append("</table></html>").toString(), "Keyboard shortcuts",
                JOptionPane.PLAIN_MESSAGE);
    }

    /** Shows version, licence and where the data come from. */
    void showAbout() {
        String version = CellwrightWindow.class.getPackage().getImplementationVersion();
        JOptionPane.showMessageDialog(owner, "<html><div style='width:380px'><b>Cellwright</b> "
                + (version == null ? "(development build)" : version)
                + "<br><br>A time-stepping simulator of electrolytic cells: bath depletion, competing electrode"
                + " reactions, mass transfer, ohmic losses with gas, heating and the deposit.<br><br>"
                + "Every number of the data library is traced to a published source (docs/library.md)."
                + " Licence: Apache-2.0.<br><br><i>" + CautionPanel.DEFER + "</i></div></html>",
                "About Cellwright", JOptionPane.PLAIN_MESSAGE);
    }
}
