#pragma once

#include "Network.h"

#include <string>
#include <string_view>

namespace tauline {

// Parses a part value as the network file allows: SI with optional prefix and
// unit ("4.7k", "10 nF", "2.2µF", "1e-9F") or an IEC 60062 RKM code ("4k7",
// "R47", "2n2", "4µ7"). Prefixes are case-sensitive (m milli, M mega); "F" is
// always farad. Throws InputError whose message quotes the text and says what
// is wrong; it does not name the part (callers prefix that).
// Resistors, capacitors and inductors need a positive value; controlled
// sources (transconductance, voltage-amplifier) may be negative, not zero.
double parseValue(std::string_view text, PartKind kind);

// The same checks for a value given as a JSON number: finite, positive (non-
// zero for controlled sources). Returns the value; throws InputError.
double checkValue(double value, PartKind kind);

// A frequency for the command line: the same SI prefixes and RKM codes, an
// optional "Hz" unit ("10k", "1.5 MHz", "1M" = 1 MHz, "1m" = 1 mHz).
// Must be positive and finite.
double parseFrequency(std::string_view text);

// Engineering notation with the kind's unit: "4.7 kΩ", "10 nF", "2.2 µF",
// "499 Ω", "1.5 MΩ". Uses the fewest significant digits (at least the three
// of an E96 value) that parse back to exactly the same double, so a saved
// value reads back identically.
std::string formatValue(double value, PartKind kind);

// The unit formatValue appends: "Ω", "F", "H", "S", "" (voltage gain).
const char* valueUnit(PartKind kind);

// The same without a unit, for frequencies and axis labels: "1 k", "22.6 k".
// Rounds to significantDigits and drops trailing zeros.
std::string formatEngineering(double value, int significantDigits = 3);

// A prefixed quantity with any unit: "7.234 kHz", "500 Hz", "22 µs".
std::string formatQuantity(double value, std::string_view unit, int significantDigits = 4);

}  // namespace tauline
