package org.finstack.ui;

import com.formdev.flatlaf.FlatClientProperties;
import javax.swing.JTextField;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * A text field holding one quantity: it shows the value with its unit in the chosen unit system,
 * reads whatever unit the user types, keeps the SI value, and marks itself with the reason when
 * the text cannot be read or the value is refused.
 */
public final class QuantityField extends JTextField {

    private static final long serialVersionUID = 1L;

    private final String key;
    private final Dimension dimension;
    private final boolean whole;
    private double value;
    private UnitSystem units = UnitSystem.SI;
    private String error;
    /** The text last written by {@link #show}; while it stands, {@link #value} is exact. */
    private String shownText;

    /**
     * @param key       the field's path as in a case file (e.g. {@code coil.finPitch}); also its component name
     * @param dimension what the quantity is ({@link Dimension#DIMENSIONLESS} for counts)
     * @param whole     whether only whole numbers are accepted
     */
    public QuantityField(String key, Dimension dimension, boolean whole) {
        super(10);
        this.key = key;
        this.dimension = dimension;
        this.whole = whole;
        setName(key);
    }

    /** @return the field's path */
    public String key() {
        return key;
    }

    /** @return what the quantity is */
    public Dimension dimension() {
        return dimension;
    }

    /** @return the last value read or set [SI] */
    public double value() {
        return value;
    }

    /**
     * Shows a value.
     *
     * @param si the value [SI]
     * @param u  the unit system to show it in
     */
    public void show(double si, UnitSystem u) {
        units = u;
        value = si;
        String text = text(si);
        if (!text.equals(getText())) {
            setText(text);
            setCaretPosition(0);
        }
        shownText = text;
        clearError();
    }

    /**
     * Shows a value unless the text already reads as that value (so typing is not disturbed).
     *
     * @param si the value [SI]
     * @param u  the unit system
     */
    public void showIfChanged(double si, UnitSystem u) {
        if (u != units || error != null) {
            show(si, u);
            return;
        }
        try {
            double now = parse();
            if (Math.abs(now - si) <= 1e-12 * Math.max(1, Math.abs(si))) {
                value = si;
                return;
            }
        } catch (InputException e) {
            // the text does not read as a value: replace it
        }
        show(si, u);
    }

    /**
     * Converts the shown text to another unit system; a text that cannot be read is left as it is.
     *
     * @param u the unit system
     */
    public void convert(UnitSystem u) {
        if (error == null) {
            try {
                value = read();
                units = u;
                String text = text(value);
                setText(text);
                shownText = text;
                setCaretPosition(0);
                return;
            } catch (InputException e) {
                units = u;
                return;
            }
        }
        units = u;
    }

    private String text(double si) {
        if (dimension == Dimension.DIMENSIONLESS) {
            return whole ? Long.toString(Math.round(si)) : Quantities.format(si, dimension, units);
        }
        return Quantities.format(si, dimension, units);
    }

    /**
     * Reads the text. While the text is the one last shown, the exact value shown is returned
     * (the text is rounded to four significant figures), so showing and reading never drifts.
     *
     * @return the value [SI]
     * @throws InputException naming the field and the reason
     */
    public double read() {
        if (shownText != null && shownText.equals(getText())) {
            return value;
        }
        double v = parse();
        value = v;
        shownText = null;
        return v;
    }

    private double parse() {
        double v = Quantities.parse(key, getText(), dimension);
        if (whole && (v != Math.rint(v) || Math.abs(v) > 1e6)) {
            throw new InputException(key, Msg.NOT_WHOLE, v);
        }
        return v;
    }

    /** @param message why the entry is refused, shown at the field */
    public void showError(String message) {
        error = message;
        putClientProperty(FlatClientProperties.OUTLINE, FlatClientProperties.OUTLINE_ERROR);
        setToolTipText(message);
    }

    /** Removes the error mark. */
    public void clearError() {
        error = null;
        putClientProperty(FlatClientProperties.OUTLINE, null);
        setToolTipText(null);
    }

    /** @return the reason the entry is refused, or null */
    public String error() {
        return error;
    }
}
