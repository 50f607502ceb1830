// The canvas's own look: grid pitch, symbol sizes and a calm paper-and-ink
// palette. Every item paints with these so a change of taste is one edit.
#pragma once

#include <QColor>
#include <QFont>

namespace tauline::ui::style {

inline constexpr int kGrid = 10;          // scene units per grid step
inline constexpr double kWireWidth = 1.6;
inline constexpr double kInkWidth = 1.6;
inline constexpr double kTerminalHit = 5.0;  // how near a press must be to a terminal

inline QColor paper() { return QColor(0xfb, 0xfa, 0xf6); }
inline QColor gridDot() { return QColor(0xd8, 0xd3, 0xc6); }
inline QColor gridMajor() { return QColor(0xbf, 0xb8, 0xa6); }
inline QColor ink() { return QColor(0x2b, 0x35, 0x38); }
inline QColor wire() { return QColor(0x2e, 0x5e, 0x7e); }
inline QColor resistorFill() { return QColor(0xf1, 0xe6, 0xcf); }
inline QColor selection() { return QColor(0xc8, 0x5a, 0x32); }
inline QColor highlight() { return QColor(0xe3, 0xa7, 0x3c); }
inline QColor nameText() { return QColor(0x5b, 0x61, 0x63); }
inline QColor valueText() { return QColor(0x1d, 0x55, 0x7d); }
inline QColor problem() { return QColor(0xb8, 0x3a, 0x34); }
inline QColor hint() { return QColor(0xcf, 0x86, 0x2b); }
inline QColor portMarker() { return QColor(0x1f, 0x7a, 0x80); }
inline QColor inputMarker() { return QColor(0x3b, 0x7a, 0x4b); }
inline QColor outputMarker() { return QColor(0x7a, 0x4d, 0x8c); }
inline QColor nodeLabel() { return QColor(0x2e, 0x5e, 0x7e); }

inline QFont labelFont()
{
    QFont font(QStringLiteral("DejaVu Sans"));
    font.setPixelSize(10);
    return font;
}

inline QFont markerFont()
{
    QFont font(QStringLiteral("DejaVu Sans"));
    font.setPixelSize(9);
    font.setBold(true);
    return font;
}

}  // namespace tauline::ui::style
