package org.finstack.ui;

import com.formdev.flatlaf.FlatDarkLaf;

/** The dark theme: FlatLaf Dark with Finstack's colours from {@code FinstackDarkLaf.properties}. */
public class FinstackDarkLaf extends FlatDarkLaf {

    private static final long serialVersionUID = 1L;

    /** The theme's name. */
    public static final String NAME = "Finstack Dark";

    @Override
    public String getName() {
        return NAME;
    }

    @Override
    public boolean isDark() {
        return true;
    }
}
