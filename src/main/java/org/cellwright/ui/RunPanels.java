package org.cellwright.ui;

/**
 * The panels that show a run, handed to the {@link RunDirector} together.
 *
 * @param charts the chart grid
 * @param playback the playback bar
 * @param events the event log
 * @param summary the summary
 * @param cautions the caution panel
 * @param strip the caution strip beside the charts
 * @param comparison the compared runs
 * @param status the status bar
 */
record RunPanels(ChartGrid charts, PlaybackBar playback, EventLogPanel events, SummaryPanel summary,
                 CautionPanel cautions, CautionStrip strip, RunComparison comparison, StatusBar status) {
}
