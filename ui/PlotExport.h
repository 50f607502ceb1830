#pragma once

#include "Analysis.h"

#include <QByteArray>
#include <QImage>
#include <QSize>
#include <QString>

#include <optional>
#include <utility>

namespace tauline::ui {

class BodeChart;

// Everything that decides how an exported plot looks, taken from the chart
// on screen (or built from the command line): the export is drawn by a chart
// of its own at a fixed size, so the window's plot is never disturbed.
struct PlotSnapshot {
    tauline::Analysis analysis;
    std::optional<std::pair<double, double>> userRangeHz;
    bool phaseVisible = false;
    int highlightedCorner = -1;
    QString title;
    // The curve kept to compare with, drawn faintly as on screen.
    std::optional<tauline::Analysis> reference;
};

PlotSnapshot snapshotOf(const BodeChart& chart, const QString& title);

inline constexpr QSize kExportSize{960, 600};

QByteArray plotSvg(const PlotSnapshot& snapshot, QSize size = kExportSize);
QImage plotImage(const PlotSnapshot& snapshot, QSize size = kExportSize, qreal scale = 2.0);

// Writes through a temporary file and renames it over `path`, so a failed
// export leaves nothing behind and never damages an existing file.
bool writeFileAtomically(const QString& path, const QByteArray& bytes, QString* error);
bool writePlotSvg(const PlotSnapshot& snapshot, const QString& path, QString* error);
bool writePlotPng(const PlotSnapshot& snapshot, const QString& path, QString* error);

}  // namespace tauline::ui
