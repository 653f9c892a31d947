package org.cellwright.study;

/**
 * Receives a study's progress: how many engine runs are done out of how many are planned. Called from the
 * study's worker threads, in no particular order of {@code done}, possibly from several threads at once: a
 * Swing caller hands the numbers to the event thread itself (e.g. {@code SwingUtilities.invokeLater}), a
 * command line prints them when standard error is a terminal.
 */
@FunctionalInterface
public interface StudyProgress {

    /** Progress that goes nowhere. */
    StudyProgress NONE = (done, total) -> {
    };

    /**
     * @param done runs finished so far
     * @param total runs planned; for a study that cannot know in advance (the planner), an estimate that
     *     may grow
     */
    void progress(int done, int total);
}
