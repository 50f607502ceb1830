#pragma once

#include "Analysis.h"
#include "CornerSensitivity.h"
#include "Network.h"

#include <QByteArray>
#include <QDate>
#include <QString>

#include <nlohmann/json.hpp>

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace tauline::ui {

class SchematicDocument;

// Everything a design-review page shows, gathered before it is drawn, so
// the editor and `tauline report` print the same page.
struct ReviewContent {
    QString title;      // the network's title, else the file's name
    QString fileName;   // where it came from ("" for an unsaved drawing)
    QDate date;
    tauline::Network network;
    nlohmann::json drawing;  // the file's drawing; null: placed automatically
    tauline::Analysis analysis;
    std::vector<tauline::CornerSensitivity> sensitivities;  // per breakpoint
    std::optional<std::pair<double, double>> rangeHz;

    // The expressions in part names (core/FactoredForm, ResistanceExpressions):
    // one text per breakpoint (its ω, "" where no single time constant sets
    // it), one per time constant (input zeroed, and response nulled), and the
    // factored response with its ω definitions, one per line. Empty: the page
    // leaves those columns and lines out.
    std::vector<std::string> cornerExpressions;
    std::vector<std::string> tauExpressions;
    std::vector<std::string> nullTauExpressions;
    std::string factoredForm;
};

// Runs the engine on a network (analysis, exact corner sensitivities, the
// expressions in part names) and fills in the rest. Throws tauline::InputError when the response is undefined.
ReviewContent reviewContentOf(const tauline::Network& network, const nlohmann::json& drawing,
                              const QString& fileName);

// The drawing an editor document holds now, as a file would store it.
nlohmann::json drawingOf(const SchematicDocument& document);

// The page: A4 wide (794 px at 96 dpi), at least A4 tall, taller when the
// tables need it. All text is SVG text, so the page can be searched.
inline constexpr int kReviewPageWidth = 794;
inline constexpr int kReviewPageMinHeight = 1123;
QByteArray reviewPageSvg(const ReviewContent& content);

// Through a temporary file and a rename: nothing is written on failure.
bool writeReviewPageSvg(const ReviewContent& content, const QString& path, QString* error);

}  // namespace tauline::ui
