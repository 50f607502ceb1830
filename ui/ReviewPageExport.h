#pragma once

#include "ReviewPage.h"

#include <QString>

#include <optional>

class QWidget;

namespace tauline::ui {

class BodeChart;
class SchematicDocument;

// The review page of what the editor shows: the document's network, title
// and drawing, the plot's chosen range. Empty (with the reason) when the
// drawing cannot be analysed yet.
std::optional<ReviewContent> reviewContentOfEditor(const SchematicDocument& document, const BodeChart& chart,
                                                   QString* why);

// File ▸ Export Review Page…: asks where, writes the page. Returns the
// status line to show and whether it is a problem; nothing when cancelled.
struct ExportOutcome {
    QString message;
    bool problem = false;
};
std::optional<ExportOutcome> exportReviewPage(QWidget* parent, const SchematicDocument& document,
                                              const BodeChart& chart);

}  // namespace tauline::ui
