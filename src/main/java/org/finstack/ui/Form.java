package org.finstack.ui;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;

/** Lays out labelled fields in titled groups, two columns of label and field. */
final class Form {

    private final JPanel panel = new JPanel(new GridBagLayout());
    private int row;

    Form() {
        panel.setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
    }

    /** @return the panel */
    JPanel panel() {
        return panel;
    }

    /** Starts a group with a heading. */
    Form group(String title) {
        JLabel l = new JLabel(title);
        l.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        l.setForeground(Theme.color("Finstack.form.heading", l.getForeground()));
        GridBagConstraints c = cell(0, 2);
        c.insets = new Insets(row == 0 ? 0 : 12, 0, 4, 0);
        panel.add(l, c);
        row++;
        return this;
    }

    /** Adds a labelled field; the help text, if any, becomes the label's and field's tooltip. */
    Form field(String label, JComponent field, String help) {
        JLabel l = new JLabel(label);
        l.setLabelFor(field);
        if (help != null) {
            l.setToolTipText(help);
            if (field.getToolTipText() == null) {
                field.setToolTipText(help);
            }
        }
        GridBagConstraints c = cell(0, 1);
        c.insets = new Insets(2, 8, 2, 8);
        panel.add(l, c);
        GridBagConstraints f = cell(1, 1);
        f.weightx = 1;
        f.fill = GridBagConstraints.HORIZONTAL;
        f.insets = new Insets(2, 0, 2, 0);
        panel.add(field, f);
        row++;
        return this;
    }

    /** Adds a component across both columns. */
    Form wide(JComponent comp) {
        GridBagConstraints c = cell(0, 2);
        c.fill = GridBagConstraints.HORIZONTAL;
        c.insets = new Insets(4, 8, 4, 0);
        panel.add(comp, c);
        row++;
        return this;
    }

    /** Fills the rest so the fields stay at the top. */
    JPanel end() {
        GridBagConstraints c = cell(0, 2);
        c.weighty = 1;
        panel.add(new JPanel(), c);
        return panel;
    }

    private GridBagConstraints cell(int x, int width) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridx = x;
        c.gridy = row;
        c.gridwidth = width;
        c.anchor = GridBagConstraints.WEST;
        return c;
    }

    /**
     * A list renderer that shows each item through a function (e.g. an enum's message text).
     *
     * @param text how to show an item
     * @return the renderer
     */
    static javax.swing.ListCellRenderer<Object> renderer(java.util.function.Function<Object, String> text) {
        return renderer(text, text);
    }

    /**
     * A list renderer with a short text for the closed combo box and a longer one in its list.
     *
     * @param shown  how to show the chosen item in the closed box
     * @param listed how to show an item in the open list
     * @return the renderer
     */
    static javax.swing.ListCellRenderer<Object> renderer(java.util.function.Function<Object, String> shown,
            java.util.function.Function<Object, String> listed) {
        javax.swing.DefaultListCellRenderer d = new javax.swing.DefaultListCellRenderer();
        return (list, value, index, selected, focus) -> d.getListCellRendererComponent(list,
                value == null ? "" : (index < 0 ? shown : listed).apply(value), index, selected, focus);
    }

    /** Calls {@code r} on every change of a text component's document. */
    static void onEdit(JTextComponent t, Runnable r) {
        t.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                r.run();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                r.run();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                r.run();
            }
        });
    }
}
