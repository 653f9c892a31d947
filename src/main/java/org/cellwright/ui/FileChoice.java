package org.cellwright.ui;

import java.awt.Component;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import javax.swing.JFileChooser;
import javax.swing.JOptionPane;
import javax.swing.filechooser.FileNameExtensionFilter;

/**
 * File choosers for one kind of file at a time that remember the last folder (starting in {@code scenarios/}
 * when the program runs from the project), add the extension when it is missing and ask before replacing.
 */
final class FileChoice {

    private final Component owner;
    private File folder;

    /** @param owner the window the choosers belong to */
    FileChoice(Component owner) {
        this.owner = owner;
        Path scenarios = Path.of("scenarios");
        folder = Files.isDirectory(scenarios) ? scenarios.toAbsolutePath().toFile() : null;
    }

    /**
     * @param title the chooser's title
     * @param description the filter's name
     * @param ext the extension, without the dot
     * @return the file to read, or null when cancelled
     */
    Path open(String title, String description, String ext) {
        JFileChooser fc = new JFileChooser(folder);
        fc.setDialogTitle(title);
        fc.setFileFilter(new FileNameExtensionFilter(description, ext));
        if (fc.showOpenDialog(owner) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        folder = fc.getCurrentDirectory();
        return fc.getSelectedFile().toPath();
    }

    /**
     * @param parent the window to centre on (a dialog, or null for the main window)
     * @param title the chooser's title
     * @param description the filter's name
     * @param ext the extension, without the dot
     * @param base the name to suggest, without extension
     * @return the file to write (with the extension), or null when cancelled or not to be replaced
     */
    Path save(Component parent, String title, String description, String ext, String base) {
        Component on = parent != null ? parent : owner;
        JFileChooser fc = new JFileChooser(folder);
        fc.setDialogTitle(title);
        fc.setAcceptAllFileFilterUsed(false);
        fc.setFileFilter(new FileNameExtensionFilter(description, ext));
        fc.setSelectedFile(new File(folder, base + "." + ext));
        if (fc.showSaveDialog(on) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        folder = fc.getCurrentDirectory();
        Path p = fc.getSelectedFile().toPath();
        String name = p.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!name.endsWith("." + ext) && !(ext.equals("html") && name.endsWith(".htm"))) {
            p = p.resolveSibling(p.getFileName() + "." + ext);
        }
        boolean replace = !Files.exists(p) || JOptionPane.showConfirmDialog(on, p.getFileName() + " exists. Replace"
                + " it?", "Replace file", JOptionPane.OK_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE)
                == JOptionPane.OK_OPTION;
        return replace ? p : null;
    }
}
