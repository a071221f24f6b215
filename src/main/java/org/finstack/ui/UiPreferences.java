package org.finstack.ui;

import java.awt.Rectangle;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;
import org.finstack.units.UnitSystem;

/** The workbench's remembered state (window, theme, units, recent files) in {@link java.util.prefs}. */
public final class UiPreferences {

    /** How many recent files are kept. */
    public static final int RECENT_MAX = 8;

    private final Preferences node;

    /** @param node the preferences node to use (tests pass their own) */
    public UiPreferences(Preferences node) {
        this.node = node;
    }

    /** @return the user's preferences for the workbench */
    public static UiPreferences user() {
        return new UiPreferences(Preferences.userRoot().node("org/finstack/workbench"));
    }

    /** @return the theme last chosen */
    public Theme theme() {
        return Theme.parse(node.get("theme", Theme.LIGHT.name()));
    }

    /** @param t the chosen theme */
    public void theme(Theme t) {
        node.put("theme", t.name());
    }

    /** @return the unit system last chosen */
    public UnitSystem units() {
        return "US".equals(node.get("units", "SI")) ? UnitSystem.US : UnitSystem.SI;
    }

    /** @param u the chosen unit system */
    public void units(UnitSystem u) {
        node.put("units", u.name());
    }

    /** @return the window's last bounds, or null */
    public Rectangle bounds() {
        int w = node.getInt("window.width", 0);
        int h = node.getInt("window.height", 0);
        if (w < 200 || h < 150) {
            return null;
        }
        return new Rectangle(node.getInt("window.x", 0), node.getInt("window.y", 0), w, h);
    }

    /** @param r the window's bounds */
    public void bounds(Rectangle r) {
        node.putInt("window.x", r.x);
        node.putInt("window.y", r.y);
        node.putInt("window.width", r.width);
        node.putInt("window.height", r.height);
    }

    /** @return recent project files, newest first */
    public List<Path> recent() {
        List<Path> out = new ArrayList<>();
        for (int i = 0; i < RECENT_MAX; i++) {
            String s = node.get("recent." + i, null);
            if (s != null && !s.isBlank()) {
                out.add(Path.of(s));
            }
        }
        return out;
    }

    /** @param file a file just opened or saved, put first in the recent list */
    public void addRecent(Path file) {
        List<Path> list = new ArrayList<>(recent());
        Path abs = file.toAbsolutePath().normalize();
        list.remove(abs);
        list.add(0, abs);
        for (int i = 0; i < RECENT_MAX; i++) {
            if (i < list.size()) {
                node.put("recent." + i, list.get(i).toString());
            } else {
                node.remove("recent." + i);
            }
        }
    }
}
