package org.finstack.ui;

import com.formdev.flatlaf.FlatLightLaf;

/** The light theme: FlatLaf Light with Finstack's colours from {@code FinstackLightLaf.properties}. */
public class FinstackLightLaf extends FlatLightLaf {

    private static final long serialVersionUID = 1L;

    /** The theme's name. */
    public static final String NAME = "Finstack Light";

    @Override
    public String getName() {
        return NAME;
    }
}
