package org.finstack.ui;

import java.text.MessageFormat;
import java.util.Locale;
import java.util.MissingResourceException;
import java.util.ResourceBundle;

/** The workbench's strings, from {@code org/finstack/ui/Messages.properties}; keys start with their panel. */
public final class Messages {

    /** The bundle's base name. */
    public static final String BUNDLE = "org.finstack.ui.Messages";

    private Messages() {
    }

    /**
     * @param key a key
     * @return its text, or {@code !key!} when it is missing (the catalogue test prevents that)
     */
    public static String get(String key) {
        try {
            return ResourceBundle.getBundle(BUNDLE, Locale.getDefault()).getString(key);
        } catch (MissingResourceException e) {
            return "!" + key + "!";
        }
    }

    /**
     * @param key  a key whose text is a {@link MessageFormat} pattern
     * @param args the arguments
     * @return the formatted text
     */
    public static String format(String key, Object... args) {
        return new MessageFormat(get(key).replace("'", "''"), Locale.ROOT).format(args);
    }

    /**
     * @param key a key
     * @return whether the bundle has it
     */
    public static boolean has(String key) {
        try {
            ResourceBundle.getBundle(BUNDLE, Locale.getDefault()).getString(key);
            return true;
        } catch (MissingResourceException e) {
            return false;
        }
    }
}
