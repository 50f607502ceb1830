#include "FrequencyRangeDialog.h"

#include "QuantityText.h"

#include <QDialogButtonBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QVBoxLayout>

namespace tauline::ui {

FrequencyRangeDialog::FrequencyRangeDialog(std::pair<double, double> current, bool userSet,
                                           QWidget* parent)
    : QDialog(parent)
{
    setWindowTitle(tr("Frequency Range"));
    if (userSet)
        range_ = current;
    from_ = new QLineEdit(frequencyText(current.first));
    to_ = new QLineEdit(frequencyText(current.second));
    error_ = new QLabel;
    error_->setStyleSheet(QStringLiteral("color: #b02a1a;"));
    error_->hide();
    auto* form = new QFormLayout;
    form->addRow(tr("From"), from_);
    form->addRow(tr("To"), to_);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel);
    QPushButton* follow = buttons->addButton(tr("Follow the Corners"), QDialogButtonBox::ResetRole);
    auto* layout = new QVBoxLayout(this);
    layout->addWidget(new QLabel(tr("Frequencies in Hz, with SI prefixes if you like (10, 1k, 2.2 MHz).")));
    layout->addLayout(form);
    layout->addWidget(error_);
    layout->addWidget(buttons);
    connect(buttons, &QDialogButtonBox::accepted, this, &FrequencyRangeDialog::tryAccept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    connect(follow, &QPushButton::clicked, this, &FrequencyRangeDialog::followCorners);
}

void FrequencyRangeDialog::tryAccept()
{
    const auto from = parseFrequencyText(from_->text());
    const auto to = parseFrequencyText(to_->text());
    if (!from || !to) {
        error_->setText(tr("Type a positive frequency in both fields."));
        error_->show();
        return;
    }
    if (!(*from < *to)) {
        error_->setText(tr("“From” must be below “To”."));
        error_->show();
        return;
    }
    range_ = std::make_pair(*from, *to);
    accept();
}

void FrequencyRangeDialog::followCorners()
{
    range_.reset();
    accept();
}

}  // namespace tauline::ui
