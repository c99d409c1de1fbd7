package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class HeaderTextTest {
    @ParameterizedTest
    @CsvSource(delimiter = '|', nullValues = "null", value = {
        "Area (mAU·s)|Area (mAU·s)|Area|mAU·s",
        "Conc [ng/mL]|Conc [ng/mL]|Conc|ng/mL",
        "Peak area|Peak area|Peak area|null",
        "  Nominal   (mg/L) |Nominal (mg/L)|Nominal|mg/L",
        "(mg/L)|(mg/L)|(mg/L)|null",
        "Area ()|Area ()|Area|null",
    })
    void splitsUnit(String written, String header, String name, String unit) {
        HeaderText h = HeaderText.parse(written);
        assertEquals(header, h.header());
        assertEquals(name, h.name());
        assertEquals(unit, h.unit());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', nullValues = "null", value = {
        "Area (mAU·s)|Inj 1|Area (mAU·s) Inj 1|Area Inj 1|mAU·s",
        "Day 1|Area [mV]|Day 1 Area [mV]|Day 1 Area|mV",
        "Conc|(mg/L)|Conc (mg/L)|Conc|mg/L",
        "|Sample|Sample|Sample|null",
    })
    void combinesTwoRows(String upper, String lower, String header, String name, String unit) {
        HeaderText h = HeaderText.combine(upper == null ? "" : upper, lower);
        assertEquals(header, h.header());
        assertEquals(name, h.name());
        assertEquals(unit, h.unit());
    }
}
