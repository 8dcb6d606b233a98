package org.holdpoint.ui.model;

import java.util.HashMap;
import java.util.Map;
import java.util.prefs.Preferences;

/** Where the window keeps what it remembers between runs (recent files, last folder, theme). */
public interface PreferenceStore {
    /**
     * @param key the key
     * @return the value, or null
     */
    String get(String key);

    /**
     * @param key   the key
     * @param value the value, or null to remove it
     */
    void put(String key, String value);

    /** @return the user's preferences of this program ({@link java.util.prefs}) */
    static PreferenceStore user() {
        Preferences p = Preferences.userRoot().node("org/holdpoint/ui");
        return new PreferenceStore() {
            @Override
            public String get(String key) {
                return p.get(key, null);
            }

            @Override
            public void put(String key, String value) {
                if (value == null) {
                    p.remove(key);
                } else {
                    p.put(key, value);
                }
            }
        };
    }

    /** @return a store in memory only (tests, or when preferences cannot be written) */
    static PreferenceStore inMemory() {
        Map<String, String> m = new HashMap<>();
        return new PreferenceStore() {
            @Override
            public String get(String key) {
                return m.get(key);
            }

            @Override
            public void put(String key, String value) {
                if (value == null) {
                    m.remove(key);
                } else {
                    m.put(key, value);
                }
            }
        };
    }
}
