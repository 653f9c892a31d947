package org.cellwright.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;

import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;

/**
 * Arranges the window: the scenario form in a left column; the playback bar, the six charts and the event
 * log in the middle; the what-if sliders, the caution strip and the tabs (summary, cautions, comparison) in a
 * right column. The columns are split panes, so each can be widened.
 */
final class WindowLayout {

    /** Width of the form column (px): the captions and the fields with their units. */
    static final int LEFT_WIDTH = 350;
    /** Width of the right column (px): sliders, summary, cautions. */
    static final int RIGHT_WIDTH = 380;

    private WindowLayout() {
    }

    /**
     * @return the window's content, all parts in place
     */
    static JComponent arrange(ScenarioForm form, KnobPanel knobs, PlaybackBar bar, ChartGrid grid,
                              EventLogPanel events, CautionStrip strip, JTabbedPane tabs, SummaryPanel summary,
                              CautionPanel cautions, ComparisonPanel comparisonPanel) {
        JScrollPane formScroll = new JScrollPane(form);
        formScroll.setBorder(BorderFactory.createEmptyBorder());
        formScroll.getViewport().setOpaque(false);
        formScroll.setOpaque(false);
        form.setOpaque(false);
        Sidebar left = new Sidebar();
        left.add(heading("Scenario"), BorderLayout.NORTH);
        left.add(formScroll, BorderLayout.CENTER);
        left.setPreferredSize(new Dimension(LEFT_WIDTH, 100));
        left.setMinimumSize(new Dimension(300, 100));

        JPanel middle = new JPanel(new BorderLayout());
        middle.add(bar, BorderLayout.NORTH);
        grid.setBorder(BorderFactory.createEmptyBorder(2, 8, 6, 8));
        grid.setPreferredSize(new Dimension(600, 500));
        middle.add(grid, BorderLayout.CENTER);
        JPanel log = new JPanel(new BorderLayout());
        log.add(heading("Event log: why the curves bend"), BorderLayout.NORTH);
        log.add(events, BorderLayout.CENTER);
        log.setPreferredSize(new Dimension(100, 150));

        JSplitPane chartsAndLog = new JSplitPane(JSplitPane.VERTICAL_SPLIT, middle, log);
        chartsAndLog.setResizeWeight(1);
        chartsAndLog.setBorder(null);

        Sidebar right = new Sidebar();
        JPanel knobBox = new JPanel(new BorderLayout());
        knobBox.setOpaque(false);
        knobBox.add(heading("What if"), BorderLayout.NORTH);
        knobs.setOpaque(false);
        knobBox.add(knobs, BorderLayout.CENTER);
        JPanel stripBox = new JPanel(new BorderLayout());
        stripBox.setOpaque(false);
        stripBox.setBorder(BorderFactory.createEmptyBorder(2, 8, 8, 8));
        stripBox.add(strip, BorderLayout.CENTER);
        JScrollPane summaryScroll = new JScrollPane(summary);
        summaryScroll.setBorder(BorderFactory.createEmptyBorder());
        JPanel cautionBox = new JPanel(new BorderLayout());
        cautionBox.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        cautionBox.add(cautions, BorderLayout.NORTH);
        JScrollPane cautionScroll = new JScrollPane(cautionBox);
        cautionScroll.setBorder(BorderFactory.createEmptyBorder());
        cautionScroll.getVerticalScrollBar().setUnitIncrement(16);
        tabs.addTab("Summary", summaryScroll);
        tabs.addTab("Cautions", new GlyphIcon(GlyphIcon.Shape.CAUTION, 13, "Cellwright.caution.mark"), cautionScroll);
        tabs.addTab("Compare", comparisonPanel);
        tabs.setToolTipTextAt(0, "The run's key figures and where the charge went");
        tabs.setToolTipTextAt(1, "The safety cautions the run triggers, and notes on the chemistry and data");
        tabs.setToolTipTextAt(2, "Pinned runs side by side; the selected one is drawn dashed");
        JPanel lower = new JPanel(new BorderLayout());
        lower.setOpaque(false);
        lower.add(stripBox, BorderLayout.NORTH);
        lower.add(tabs, BorderLayout.CENTER);
        right.add(knobBox, BorderLayout.NORTH);
        right.add(lower, BorderLayout.CENTER);
        right.setPreferredSize(new Dimension(RIGHT_WIDTH, 100));
        right.setMinimumSize(new Dimension(330, 100));

        JSplitPane centerRight = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, chartsAndLog, right);
        centerRight.setResizeWeight(1);
        centerRight.setBorder(null);
        JSplitPane all = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, centerRight);
        all.setResizeWeight(0);
        all.setBorder(null);

        all.addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                // once, when first laid out: the columns at their widths, the middle takes the rest
                all.removeComponentListener(this);
                all.setDividerLocation(LEFT_WIDTH);
                centerRight.setDividerLocation(Math.max(300,
                        all.getWidth() - LEFT_WIDTH - RIGHT_WIDTH - 2 * all.getDividerSize()));
            }
        });
        return all;
    }

    private static JComponent heading(String text) {
        JLabel l = new JLabel(text.toUpperCase(java.util.Locale.ROOT)) {
            private static final long serialVersionUID = 1L;

            @Override
            public Color getForeground() {
                return UiTheme.color("section.foreground");
            }
        };
        l.setFont(UiTheme.font(-1, Font.BOLD));
        l.setBorder(BorderFactory.createEmptyBorder(8, 10, 4, 10));
        return l;
    }

    /** A side column in the look's sidebar colour. */
    private static final class Sidebar extends JPanel {
        private static final long serialVersionUID = 1L;

        Sidebar() {
            super(new BorderLayout());
        }

        @Override
        public Color getBackground() {
            return UiTheme.color("sidebar.background");
        }
    }

}
