package org.cellwright.ui;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;

import javax.swing.BorderFactory;
import javax.swing.JEditorPane;
import javax.swing.JScrollPane;
import javax.swing.UIManager;
import javax.swing.event.HyperlinkEvent;

import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunEvent;

/**
 * The event log: what happened in the run and why the curves bend there, in plain words, growing as the
 * play head passes each event. Clicking an event's time moves the play head there.
 */
final class EventLogPanel extends JScrollPane {

    private static final long serialVersionUID = 1L;
    private static final String EMPTY = "Events appear here as the run passes them: the supply reaching a limit,"
            + " a metal's supply to the cathode reaching its limit, stop conditions, a short circuit.";

    private final JEditorPane pane = new JEditorPane();
    private final List<RunEvent> events = new ArrayList<>();

    /** @param scrub hears of a click on an event's time (s) */
    EventLogPanel(DoubleConsumer scrub) {
        pane.setContentType("text/html");
        pane.setEditable(false);
        pane.putClientProperty(JEditorPane.HONOR_DISPLAY_PROPERTIES, Boolean.TRUE);
        pane.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        pane.addHyperlinkListener(e -> {
            if (e.getEventType() == HyperlinkEvent.EventType.ACTIVATED && e.getDescription().startsWith("t:")) {
                scrub.accept(Double.parseDouble(e.getDescription().substring(2)));
            }
        });
        setViewportView(pane);
        setBorder(BorderFactory.createEmptyBorder());
        render();
    }

    /** @param shown the events to show (replaces the log) */
    void show(List<RunEvent> shown) {
        events.clear();
        events.addAll(shown);
        render();
    }

    /** @param more events to add at the end */
    void add(List<RunEvent> more) {
        if (!more.isEmpty()) {
            events.addAll(more);
            render();
        }
    }

    /** @return the events shown */
    List<RunEvent> events() {
        return List.copyOf(events);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (pane != null) {
            render();
        }
    }

    private void render() {
        Color accent = UiTheme.color("section.foreground");
        Color muted = UiTheme.color("muted.foreground");
        StringBuilder sb = new StringBuilder("<html><body style='margin:0'>");
        if (events.isEmpty()) {
            sb.append("<p style='color:").append(hex(muted)).append("'>").append(FieldMessage.escape(EMPTY)).append("</p>");
        } else {
            sb.append("<table cellspacing='0' cellpadding='2' width='100%'>");
            for (RunEvent e : events) {
                sb.append("<tr><td valign='top' nowrap><a style='color:").append(hex(accent))
                        .append(";text-decoration:none' href='t:").append(e.timeS()).append("'><b>")
                        .append(RunClock.format(e.timeS())).append("</b></a></td><td valign='top' width='100%'>")
                        .append(FieldMessage.escape(e.message())).append("</td></tr>");
            }
            sb.append("</table>");
        }
        pane.setText(sb.append("</body></html>").toString());
        pane.setCaretPosition(pane.getDocument().getLength());
        pane.setBackground(UIManager.getColor("Panel.background"));
    }

    static String hex(Color c) {
        return String.format("#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }
}
