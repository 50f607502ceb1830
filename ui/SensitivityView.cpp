#include "SensitivityView.h"

#include "QuantityText.h"
#include "SchematicDocument.h"

#include <QHeaderView>
#include <QLabel>
#include <QTableWidget>
#include <QTimer>
#include <QVBoxLayout>

#include <algorithm>
#include <cmath>
#include <map>

namespace tauline::ui {

namespace {

QString signedText(double s)
{
    if (s == 0.0)
        return QStringLiteral("0");
    QString number = QString::number(s, 'f', 2);
    if (number == QStringLiteral("-0.00") || number == QStringLiteral("0.00"))
        number = QString::number(s, 'e', 0);
    number.replace(QLatin1Char('-'), QChar(0x2212));
    if (s > 0)
        number.prepend(QLatin1Char('+'));
    return number;
}

}  // namespace

QColor sensitivityColor(double value)
{
    // White at 0, full colour at |1| and beyond: most corners of an RC
    // network have sensitivities within [-1, 1].
    const double t = std::min(1.0, std::abs(value));
    const QColor full = value < 0 ? QColor(0x2b, 0x63, 0xb8) : QColor(0xc4, 0x3b, 0x2c);
    auto mix = [t](int a, int b) { return static_cast<int>(std::lround(a + (b - a) * t)); };
    return QColor(mix(255, full.red()), mix(255, full.green()), mix(255, full.blue()));
}

SensitivityView::SensitivityView(SchematicDocument* document, QWidget* parent)
    : QWidget(parent, Qt::Tool), document_(document)
{
    setObjectName(QStringLiteral("sensitivityView"));
    setWindowTitle(tr("Corner Sensitivities"));
    caption_ = new QLabel;
    caption_->setWordWrap(true);
    table_ = new QTableWidget;
    table_->setObjectName(QStringLiteral("sensitivityTable"));
    table_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    table_->setSelectionMode(QAbstractItemView::SingleSelection);
    table_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    table_->verticalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    auto* layout = new QVBoxLayout(this);
    layout->addWidget(caption_);
    layout->addWidget(table_, 1);
    resize(560, 300);

    connect(table_, &QTableWidget::cellDoubleClicked, this, [this](int row, int column) {
        if (column >= 0 && column < columnParts_.size())
            emit placeRequested(row, columnParts_[column]);
    });
    connect(document_, &SchematicDocument::networkChanged, this, [this] {
        // One refresh per burst of edits, and none while hidden.
        if (!isVisible() || refreshQueued_)
            return;
        refreshQueued_ = true;
        QTimer::singleShot(0, this, [this] {
            refreshQueued_ = false;
            refresh();
        });
    });
}

SensitivityView* SensitivityView::of(QWidget* window, SchematicDocument* document)
{
    auto* view = window->findChild<SensitivityView*>(QStringLiteral("sensitivityView"), Qt::FindDirectChildrenOnly);
    if (!view)
        view = new SensitivityView(document, window);
    return view;
}

void SensitivityView::showEvent(QShowEvent* event)
{
    QWidget::showEvent(event);
    refresh();
}

void SensitivityView::refresh()
{
    table_->clear();
    table_->setRowCount(0);
    table_->setColumnCount(0);
    columnParts_.clear();
    if (!document_->hasResponse()) {
        caption_->setText(tr("Place a port, or an input and an output, to see the sensitivities."));
        return;
    }
    const tauline::Network network = document_->network();
    try {
        const tauline::Analysis analysis = tauline::analyze(network);
        setSensitivities(network, analysis, tauline::cornerSensitivities(network, analysis));
    } catch (const std::exception& e) {
        caption_->setText(QString::fromStdString(e.what()));
    }
}

void SensitivityView::setSensitivities(const tauline::Network& network, const tauline::Analysis& analysis,
                                       const std::vector<tauline::CornerSensitivity>& sensitivities)
{
    table_->clear();
    columnParts_.clear();
    for (const auto& p : network.parts)
        if (p.kind == tauline::PartKind::Resistor || p.kind == tauline::PartKind::Capacitor)
            columnParts_ << QString::fromStdString(p.name);
    const int rows = static_cast<int>(std::min(analysis.breakpoints.size(), sensitivities.size()));
    table_->setRowCount(rows);
    table_->setColumnCount(static_cast<int>(columnParts_.size()));
    table_->setHorizontalHeaderLabels(columnParts_);
    bool differenced = false;
    for (int r = 0; r < rows; ++r) {
        const auto& corner = analysis.breakpoints[r];
        const auto& s = sensitivities[r];
        const bool exact = s.method == tauline::SensitivityMethod::Exact;
        differenced |= !exact;
        QString label = QStringLiteral("%1  %2 %3")
                            .arg(r + 1)
                            .arg(corner.type == tauline::RootType::Pole ? tr("pole") : tr("zero"),
                                 frequencyText(corner.hz));
        if (!exact)
            label += QStringLiteral("  ≈");
        auto* header = new QTableWidgetItem(label);
        if (!exact)
            header->setToolTip(QString::fromStdString(s.note));
        table_->setVerticalHeaderItem(r, header);
        std::map<std::string, double> byPart;
        for (const auto& p : s.parts)
            byPart[p.part] = p.value;
        for (int c = 0; c < columnParts_.size(); ++c) {
            const auto it = byPart.find(columnParts_[c].toStdString());
            auto* item = new QTableWidgetItem;
            item->setTextAlignment(Qt::AlignRight | Qt::AlignVCenter);
            if (it == byPart.end()) {
                item->setText(QStringLiteral("?"));
                item->setToolTip(tr("Not known: the corner could not be followed when this part changed"));
            } else {
                item->setText((exact ? QString() : QStringLiteral("≈")) + signedText(it->second));
                item->setData(ValueRole, it->second);
                item->setBackground(sensitivityColor(it->second));
                item->setForeground(std::abs(it->second) > 0.6 ? QColor(Qt::white) : QColor(0x22, 0x22, 0x22));
                item->setToolTip(tr("d ln f / d ln %1 = %2 for corner %3 (%4)%5")
                                     .arg(columnParts_[c])
                                     .arg(it->second, 0, 'g', 6)
                                     .arg(r + 1)
                                     .arg(frequencyText(corner.hz),
                                          exact ? QString() : tr(", by central differences")));
            }
            table_->setItem(r, c, item);
        }
    }
    QString text = tr("d ln f / d ln x: how far each corner (row) moves, in proportion, when a part "
                      "(column) changes by a small proportion. Blue: the corner falls as the part "
                      "grows; red: it rises. Double-click a cell to place that corner with that part.");
    if (differenced)
        text += tr(" ≈: a double root, where the exact derivative does not exist; central differences shown.");
    if (rows == 0)
        text = tr("The response has no corners.");
    caption_->setText(text);
}

QString SensitivityView::caption() const
{
    return caption_->text();
}

}  // namespace tauline::ui
