#pragma once

#include "CornerPlacement.h"

#include <QWidget>

#include <optional>

class QComboBox;
class QLabel;
class QLineEdit;
class QPushButton;
class QTableWidget;

namespace tauline::ui {

class SchematicDocument;

// Placing a corner from the editor: pick a corner, type the frequency it
// should move to, pick the part to change (by default the one the corner is
// most sensitive to) and a standard series; Tauline solves for the exact
// value and lists it with the nearest series values below and above and
// where the corner lands with each. "Apply" on a row sets that value as one
// undo step.
class PlacementPanel : public QWidget {
    Q_OBJECT
public:
    explicit PlacementPanel(SchematicDocument* document, QWidget* parent = nullptr);

    // The panel of a window, made on first use (a tool window of its own).
    static PlacementPanel* of(QWidget* window, SchematicDocument* document);

    // Fills in corner and target (a drag on the plot, the corner table's
    // menu) and solves at once when a target is given.
    void request(int corner, std::optional<double> targetHz = std::nullopt);

    // Solves with what the fields hold; false (and a message) when it cannot.
    bool solve();
    // Sets the value of a result row (0 exact, then the series values).
    void applyRow(int row);

    const std::optional<tauline::CornerPlacement>& placement() const { return placement_; }
    QString message() const;
    QTableWidget* results() const { return results_; }
    QComboBox* cornerBox() const { return corner_; }
    QComboBox* partBox() const { return part_; }
    QComboBox* seriesBox() const { return series_; }
    QLineEdit* targetEdit() const { return target_; }

private:
    void refreshCorners();
    void showPlacement();
    void showMessage(const QString& text, bool problem);

    SchematicDocument* document_;
    QComboBox* corner_;
    QLineEdit* target_;
    QComboBox* part_;
    QComboBox* series_;
    QPushButton* solve_;
    QLabel* message_;
    QTableWidget* results_;
    std::optional<tauline::CornerPlacement> placement_;
    bool applying_ = false;
};

}  // namespace tauline::ui
