#include "Errors.h"
#include "ValueParser.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <string>

using tauline::InputError;
using tauline::PartKind;
using tauline::formatEngineering;
using tauline::formatQuantity;
using tauline::formatValue;
using tauline::parseFrequency;
using tauline::parseValue;

namespace {

// Relative comparison: parsed values are correctly rounded decimals, so the
// tolerance only absorbs the rounding of the expected literal.
bool near(double a, double b)
{
    return std::fabs(a - b) <= 1e-15 * std::fabs(b);
}

std::string rejection(std::string_view text, PartKind kind)
{
    try {
        parseValue(text, kind);
    } catch (const InputError& e) {
        return e.what();
    }
    return "(accepted)";
}

}  // namespace

// IEC 60062:2016, Marking codes for resistors and capacitors, §4 (RKM code):
// the letter stands for the decimal point and the multiplier (R = 1,
// k/K = 10^3, M = 10^6, p, n, µ for capacitances). The example codes are
// from memory of that clause.
TEST_CASE("RKM codes as IEC 60062 writes them", "[value]")
{
    CHECK(near(parseValue("4K7", PartKind::Resistor), 4700.0));
    CHECK(near(parseValue("R47", PartKind::Resistor), 0.47));
    CHECK(near(parseValue("47K3", PartKind::Resistor), 47300.0));
    CHECK(near(parseValue("4n7", PartKind::Capacitor), 4.7e-9));
    CHECK(near(parseValue("2\u00B52", PartKind::Capacitor), 2.2e-6));
    // Further forms from the same clause's pattern (digits, letter, digits).
    CHECK(near(parseValue("4R7", PartKind::Resistor), 4.7));
    CHECK(near(parseValue("47R", PartKind::Resistor), 47.0));
    CHECK(near(parseValue("1M5", PartKind::Resistor), 1.5e6));
    CHECK(near(parseValue("4k99", PartKind::Resistor), 4990.0));
    CHECK(near(parseValue("2n2", PartKind::Capacitor), 2.2e-9));
    CHECK(near(parseValue("4u7", PartKind::Capacitor), 4.7e-6));
    CHECK(near(parseValue("4\u03BC7", PartKind::Capacitor), 4.7e-6));  // Greek mu
    CHECK(near(parseValue("4k7", PartKind::Resistor), 4700.0));
    CHECK(near(parseValue("4k7\u03A9", PartKind::Resistor), 4700.0));  // a unit may follow
    CHECK(near(parseValue("4k7ohm", PartKind::Resistor), 4700.0));
    CHECK(near(parseValue("100p", PartKind::Capacitor), 100e-12));
}

// SI prefixes (BIPM, The International System of Units, 9th edition 2019,
// §3, table of SI prefixes; clause from memory): f 1e-15, p 1e-12, n 1e-9, µ 1e-6, m 1e-3, k 1e3, M 1e6,
// G 1e9, T 1e12; symbols are case-sensitive. "u" and "K" for micro and kilo
// are common practice (no source) on keyboards and resistor codes.
TEST_CASE("SI values with exponent, prefix and unit", "[value]")
{
    CHECK(parseValue("4700", PartKind::Resistor) == 4700.0);
    CHECK(parseValue("4.7e3", PartKind::Resistor) == 4700.0);
    CHECK(parseValue("4.7k", PartKind::Resistor) == 4700.0);
    CHECK(parseValue("4.7 k\u03A9", PartKind::Resistor) == 4700.0);
    CHECK(parseValue("4.7 k\u2126", PartKind::Resistor) == 4700.0);  // ohm sign
    CHECK(parseValue("  4.7 kohm ", PartKind::Resistor) == 4700.0);
    CHECK(parseValue("10n", PartKind::Capacitor) == 10e-9);
    CHECK(parseValue("10 nF", PartKind::Capacitor) == 10e-9);
    CHECK(parseValue("2.2u", PartKind::Capacitor) == 2.2e-6);
    CHECK(parseValue("2.2\u00B5F", PartKind::Capacitor) == 2.2e-6);
    CHECK(parseValue("1e-9F", PartKind::Capacitor) == 1e-9);
    CHECK(parseValue(".5", PartKind::Resistor) == 0.5);
    CHECK(parseValue("1f", PartKind::Capacitor) == 1e-15);
    CHECK(parseValue("1p", PartKind::Capacitor) == 1e-12);
    CHECK(parseValue("1G", PartKind::Resistor) == 1e9);
    CHECK(parseValue("1T", PartKind::Resistor) == 1e12);
    CHECK(parseValue("1K", PartKind::Resistor) == 1e3);
    CHECK(parseValue("10mH", PartKind::Inductor) == 10e-3);
}

TEST_CASE("m is milli, M is mega, F is farad", "[value]")
{
    CHECK(parseValue("1M", PartKind::Resistor) == 1e6);
    CHECK(parseValue("1m", PartKind::Resistor) == 1e-3);
    CHECK(parseValue("1F", PartKind::Capacitor) == 1.0);
    CHECK(parseValue("1 F", PartKind::Capacitor) == 1.0);
    CHECK(parseValue("10fF", PartKind::Capacitor) == 10e-15);
    CHECK(parseValue("1mF", PartKind::Capacitor) == 1e-3);
}

TEST_CASE("controlled sources take negative values but not zero", "[value]")
{
    CHECK(parseValue("-10", PartKind::VoltageAmplifier) == -10.0);
    CHECK(parseValue("-2m", PartKind::Transconductance) == -2e-3);
    CHECK(parseValue("5 mS", PartKind::Transconductance) == 5e-3);
    CHECK(parseValue("100 V/V", PartKind::VoltageAmplifier) == 100.0);
    CHECK_THROWS_AS(parseValue("0", PartKind::VoltageAmplifier), InputError);
    CHECK(rejection("0", PartKind::Transconductance).find("non-zero") != std::string::npos);
    CHECK(tauline::checkValue(-3.0, PartKind::VoltageAmplifier) == -3.0);
    CHECK_THROWS_AS(tauline::checkValue(0.0, PartKind::Transconductance), InputError);
}

TEST_CASE("every rejection quotes the text and says what is wrong", "[value]")
{
    struct Case {
        const char* text;
        PartKind kind;
        const char* says;
    };
    const Case cases[] = {
        {"", PartKind::Resistor, "empty"},
        {"   ", PartKind::Resistor, "empty"},
        {"0", PartKind::Resistor, "zero"},
        {"0k", PartKind::Resistor, "zero"},
        {"-4k7", PartKind::Resistor, "negative"},
        {"-10n", PartKind::Capacitor, "negative"},
        {"nan", PartKind::Resistor, "not a finite number"},
        {"NaN", PartKind::Capacitor, "not a finite number"},
        {"inf", PartKind::Resistor, "not a finite number"},
        {"-Infinity", PartKind::Resistor, "not a finite number"},
        {"1e400", PartKind::Resistor, "too large"},
        {"1e-400", PartKind::Capacitor, "zero"},
        {"4x7", PartKind::Resistor, "not a number"},
        {"abc", PartKind::Resistor, "not a number"},
        {"4.7kk", PartKind::Resistor, "not a number"},
        {"1e", PartKind::Resistor, "not a number"},
        {"R", PartKind::Resistor, "not a number"},
        {"4k7k", PartKind::Resistor, "not a number"},
        {"4.7.1", PartKind::Resistor, "not a number"},
        {"4,7k", PartKind::Resistor, "comma"},
        {"k\u03A9", PartKind::Resistor, "not a number"},
        {"\u03A9", PartKind::Resistor, "no number"},
        {"10 nF", PartKind::Resistor, "does not fit a resistor"},
        {"4.7 k\u03A9", PartKind::Capacitor, "does not fit a capacitor"},
        {"1 H", PartKind::Capacitor, "does not fit a capacitor"},
        {"1 F", PartKind::Inductor, "does not fit an inductor"},
        {"1 Hz", PartKind::Resistor, "does not fit a resistor"},
    };
    for (const auto& c : cases) {
        INFO("text: \"" << c.text << "\"");
        std::string message = rejection(c.text, c.kind);
        CHECK(message.find(std::string("\"") + c.text + "\"") != std::string::npos);
        CHECK(message.find(c.says) != std::string::npos);
    }
}

TEST_CASE("numeric JSON values: positive and finite", "[value]")
{
    CHECK(tauline::checkValue(2.2e-9, PartKind::Capacitor) == 2.2e-9);
    CHECK_THROWS_AS(tauline::checkValue(0.0, PartKind::Capacitor), InputError);
    CHECK_THROWS_AS(tauline::checkValue(-1.0, PartKind::Resistor), InputError);
    CHECK_THROWS_AS(tauline::checkValue(HUGE_VAL, PartKind::Resistor), InputError);
    CHECK_THROWS_AS(tauline::checkValue(std::nan(""), PartKind::Resistor), InputError);
}

TEST_CASE("formatValue writes engineering notation with the unit", "[value]")
{
    CHECK(formatValue(4700.0, PartKind::Resistor) == "4.7 k\u03A9");
    CHECK(formatValue(10e-9, PartKind::Capacitor) == "10 nF");
    CHECK(formatValue(2.2e-6, PartKind::Capacitor) == "2.2 \u00B5F");
    CHECK(formatValue(499.0, PartKind::Resistor) == "499 \u03A9");
    CHECK(formatValue(1.5e6, PartKind::Resistor) == "1.5 M\u03A9");
    CHECK(formatValue(4990.0, PartKind::Resistor) == "4.99 k\u03A9");
    CHECK(formatValue(1e-3, PartKind::Inductor) == "1 mH");
    CHECK(formatValue(100e-12, PartKind::Capacitor) == "100 pF");
    CHECK(formatValue(1.0, PartKind::Capacitor) == "1 F");
    CHECK(formatValue(-10.0, PartKind::VoltageAmplifier) == "-10");
}

// The E96 series values (IEC 60063:2015, Preferred number series for
// resistors and capacitors, E96 series; values from memory), across
// decades: the formatted text has three significant digits and reads back
// to the same double.
TEST_CASE("E96 values round-trip through formatValue", "[value]")
{
    const double e96[] = {1.00, 1.02, 1.05, 1.07, 1.10, 1.13, 1.15, 1.18, 1.21, 1.24, 1.27, 1.30, 1.33,
                          1.37, 1.40, 1.43, 1.47, 1.50, 1.54, 1.58, 1.62, 1.65, 1.69, 1.74, 1.78, 1.82,
                          1.87, 1.91, 1.96, 2.00, 2.05, 2.10, 2.15, 2.21, 2.26, 2.32, 2.37, 2.43, 2.49,
                          2.55, 2.61, 2.67, 2.74, 2.80, 2.87, 2.94, 3.01, 3.09, 3.16, 3.24, 3.32, 3.40,
                          3.48, 3.57, 3.65, 3.74, 3.83, 3.92, 4.02, 4.12, 4.22, 4.32, 4.42, 4.53, 4.64,
                          4.75, 4.87, 4.99, 5.11, 5.23, 5.36, 5.49, 5.62, 5.76, 5.90, 6.04, 6.19, 6.34,
                          6.49, 6.65, 6.81, 6.98, 7.15, 7.32, 7.50, 7.68, 7.87, 8.06, 8.25, 8.45, 8.66,
                          8.87, 9.09, 9.31, 9.53, 9.76};
    for (int decade = -2; decade <= 6; ++decade) {
        for (double mantissa : e96) {
            double value = parseValue(std::to_string(mantissa) + "e" + std::to_string(decade), PartKind::Resistor);
            std::string text = formatValue(value, PartKind::Resistor);
            INFO(text);
            CHECK(parseValue(text, PartKind::Resistor) == value);
            // at most three significant digits: "4.99 kΩ" is 4 digits + point
            std::string digits;
            for (char c : text)
                if (c >= '0' && c <= '9')
                    digits += c;
            while (digits.size() > 1 && digits.back() == '0')
                digits.pop_back();
            while (digits.size() > 1 && digits.front() == '0')
                digits.erase(digits.begin());
            CHECK(digits.size() <= 3);
        }
    }
}

TEST_CASE("formatValue keeps every digit an odd value needs", "[value]")
{
    for (double value : {7234.3276113, 1.0 / 3.0, 123456789.0, 2.2e-9 * 1.000001}) {
        std::string text = formatValue(value, PartKind::Resistor);
        INFO(text);
        CHECK(parseValue(text, PartKind::Resistor) == value);
    }
}

TEST_CASE("formatEngineering and formatQuantity", "[value]")
{
    CHECK(formatEngineering(22626.5) == "22.6 k");
    CHECK(formatEngineering(1000.0) == "1 k");
    CHECK(formatEngineering(999.9999) == "1 k");  // rounding carries into the next prefix
    CHECK(formatEngineering(500.0) == "500");
    CHECK(formatEngineering(0.0) == "0");
    CHECK(formatEngineering(7234.3276, 4) == "7.234 k");
    CHECK(formatEngineering(-0.0015) == "-1.5 m");
    CHECK(formatQuantity(7234.3276, "Hz") == "7.234 kHz");
    CHECK(formatQuantity(500.0, "Hz") == "500 Hz");
    CHECK(formatQuantity(22e-6, "s") == "22 \u00B5s");
    // Past the SI prefixes: powers of ten, not a row of zeros.
    CHECK(formatQuantity(1.369e-55, "s") == "1.369e-55 s");
    CHECK(formatEngineering(-2e-16) == "-2e-16");
    CHECK(formatEngineering(3.3e-15) == "3.3 f");
    CHECK(formatEngineering(4.7e18) == "4.7e18");
}

TEST_CASE("frequencies use the same prefixes, with an optional Hz", "[value]")
{
    CHECK(parseFrequency("10k") == 10e3);
    CHECK(parseFrequency("1M") == 1e6);  // mega, as in the file format
    CHECK(parseFrequency("1m") == 1e-3);
    CHECK(parseFrequency("1.5 MHz") == 1.5e6);
    CHECK(parseFrequency("10 kHz") == 10e3);
    CHECK(parseFrequency("1k5") == 1500.0);
    CHECK_THROWS_AS(parseFrequency("0"), InputError);
    CHECK_THROWS_AS(parseFrequency("-1k"), InputError);
    CHECK_THROWS_AS(parseFrequency("10 F"), InputError);
    CHECK_THROWS_AS(parseFrequency("fast"), InputError);
}
