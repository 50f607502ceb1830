#pragma once

#include <QDialog>

#include <optional>
#include <utility>

class QLabel;
class QLineEdit;

namespace tauline::ui {

// Asks for the plot's frequency range. Accepting with "Follow the corners"
// gives no range: the plot then covers every corner with a decade to spare.
class FrequencyRangeDialog : public QDialog {
    Q_OBJECT
public:
    FrequencyRangeDialog(std::pair<double, double> current, bool userSet, QWidget* parent = nullptr);

    std::optional<std::pair<double, double>> range() const { return range_; }

private:
    void tryAccept();
    void followCorners();

    QLineEdit* from_ = nullptr;
    QLineEdit* to_ = nullptr;
    QLabel* error_ = nullptr;
    std::optional<std::pair<double, double>> range_;
};

}  // namespace tauline::ui
