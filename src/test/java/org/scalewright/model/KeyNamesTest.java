package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Key numbers and note names of the standard 88-key piano keyboard (A0 = 1, C4 = 40,
 * A4 = 49, C8 = 88; scientific pitch notation, octave numbers change at C): common
 * practice, no source.
 */
class KeyNamesTest {

    @ParameterizedTest(name = "{0} <-> {1}")
    @CsvSource({"1, A0", "2, A#0", "3, B0", "4, C1", "40, C4", "41, C#4", "49, A4", "51, B4", "52, C5",
            "88, C8", "0, G#0", "-1, G0", "-8, C0", "89, C#8"})
    @DisplayName("key number to note name and back (sharps on output)")
    void nameAndParse(int key, String name) {
        assertEquals(name, KeyNames.name(key));
        assertEquals(key, KeyNames.parse(name));
    }

    @ParameterizedTest(name = "{0} = key {1}")
    @CsvSource({"Bb2, 26", "A#2, 26", "Db4, 41", "c4, 40", "bb2, 26", "' C#4 ', 41", "Cb4, 39", "B#3, 40",
            "E#4, 45", "Fb4, 44", "Ab0, 0", "40, 40", "0, 0", "-1, -1", "' 88 ', 88"})
    @DisplayName("flats, lower case, enharmonics, blanks and key numbers are read")
    void parseVariants(String text, int key) {
        assertEquals(key, KeyNames.parse(text));
    }

    @Test
    @DisplayName("every key from -20 to 108 survives name → parse")
    void roundTrip() {
        for (int k = -20; k <= 108; k++) {
            assertEquals(k, KeyNames.parse(KeyNames.name(k)), "key " + k);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "H4", "C#", "4.5", "C##4", "middle C", "C 4"})
    void notAKey(String text) {
        InvalidInput e = assertThrows(InvalidInput.class, () -> KeyNames.parse(text));
        assertTrue(e.getMessage().contains("'" + text + "'"), e.getMessage());
    }

    @ParameterizedTest
    @DisplayName("keys outside -20 … 108 are refused as typed, also past the int range, never overflowed")
    @ValueSource(strings = {"-21", "109", "200", "13000", "2147483647", "2147483648", "-99999999999999999999",
        "C9999999999", "A10", "G#-2"})
    void keyOutsideTheAcceptedRange(String text) {
        InvalidInput e = assertThrows(InvalidInput.class, () -> KeyNames.parse(text));
        assertTrue(e.getMessage().startsWith("key must be -20 to 108"), e.getMessage());
        assertTrue(e.getMessage().contains(text), e.getMessage());
    }

    @Test
    @DisplayName("the accepted range's ends are accepted, by number and by name")
    void acceptedEnds() {
        assertEquals(-20, KeyNames.parse("-20"));
        assertEquals(108, KeyNames.parse("+108"));
        assertEquals(108, KeyNames.parse(KeyNames.name(108)));
        assertEquals(-20, KeyNames.parse(KeyNames.name(-20)));
    }

    @Test
    @DisplayName("key ranges A-B with key numbers, note names and extended keys")
    void keyRanges() {
        assertEquals(new KeyRange(33, 88), KeyRange.parse("F3-C8"));
        assertEquals(new KeyRange(33, 88), KeyRange.parse("33-88"));
        assertEquals(new KeyRange(-2, 10), KeyRange.parse("-2-10"));
        assertEquals(new KeyRange(-2, -1), KeyRange.parse("-2--1"));
        assertEquals(new KeyRange(0, 3), KeyRange.parse("G#0-B0"));
        assertEquals(new KeyRange(26, 40), KeyRange.parse(" Bb2-C4 "));
        assertEquals(new KeyRange(40, 40), KeyRange.parse("40-40"));
        KeyRange r = KeyRange.parse("33-88");
        assertTrue(r.contains(33));
        assertTrue(r.contains(88));
        assertFalse(r.contains(32));
        assertFalse(r.contains(89));
        assertEquals("33-88", r.toString());
    }

    @ParameterizedTest
    @ValueSource(strings = {"40", "C4", "", "88-1", "X-88", "33-", "33-H9", "C8-F3"})
    void badKeyRanges(String text) {
        InvalidInput e = assertThrows(InvalidInput.class, () -> KeyRange.parse(text));
        assertTrue(e.getMessage().contains("key range"), e.getMessage());
    }

    @Test
    @DisplayName("a key range reaching past 108 or below -20 names the end refused")
    void keyRangeOutsideTheAcceptedKeys() {
        InvalidInput e = assertThrows(InvalidInput.class, () -> KeyRange.parse("40-200"));
        assertEquals("key range '40-200': key must be -20 to 108 (A0 is 1, C8 is 88), was 200", e.getMessage());
        assertThrows(InvalidInput.class, () -> KeyRange.parse("-21-40"));
        assertThrows(InvalidInput.class, () -> KeyRange.parse("1-2147483648"));
    }
}
