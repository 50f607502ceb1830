#include "PlacementPanel.h"

#include "CornerSensitivity.h"
#include "Errors.h"
#include "QuantityText.h"
#include "SchematicDocument.h"
#include "ValueParser.h"
#include "ValueSeriesSetting.h"

#include <QComboBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>

#include <cmath>

namespace tauline::ui {

namespace {

QString cornerLabel(int index, const tauline::Breakpoint& corner)
{
    const QString type = corner.type == tauline::RootType::Pole
                             ? (corner.q ? QObject::tr("pole pair") : QObject::tr("pole"))
                             : (corner.q ? QObject::tr("zero pair") : QObject::tr("zero"));
    return QStringLiteral("%1 · %2 · %3").arg(index + 1).arg(type, frequencyText(corner.hz));
}

QString offTarget(double hz, double target)
{
    if (std::abs(hz / target - 1.0) < 5e-5)
        return QStringLiteral("0 %");
    QString text = QString::number(100.0 * (hz / target - 1.0), 'f', 2) + QStringLiteral(" %");
    if (hz >= target)
        text.prepend(QLatin1Char('+'));
    return text.replace(QLatin1Char('-'), QChar(0x2212));
}

QTableWidgetItem* cell(const QString& text)
{
    auto* item = new QTableWidgetItem(text);
    item->setFlags(Qt::ItemIsEnabled | Qt::ItemIsSelectable);
    return item;
}

}  // namespace

PlacementPanel::PlacementPanel(SchematicDocument* document, QWidget* parent)
    : QWidget(parent, Qt::Tool), document_(document)
{
    setObjectName(QStringLiteral("placementPanel"));
    setWindowTitle(tr("Place a Corner"));
    corner_ = new QComboBox;
    corner_->setObjectName(QStringLiteral("placementCorner"));
    target_ = new QLineEdit;
    target_->setObjectName(QStringLiteral("placementTarget"));
    target_->setPlaceholderText(tr("e.g. 2.2k or 150 Hz"));
    part_ = new QComboBox;
    part_->setObjectName(QStringLiteral("placementPart"));
    series_ = new QComboBox;
    series_->setObjectName(QStringLiteral("placementSeries"));
    for (auto s : {tauline::ValueSeries::E12, tauline::ValueSeries::E24, tauline::ValueSeries::E96})
        series_->addItem(QString::fromLatin1(tauline::seriesName(s)), static_cast<int>(s));
    series_->setCurrentIndex(series_->findData(static_cast<int>(valueSeriesSetting())));
    solve_ = new QPushButton(tr("&Solve"));
    solve_->setObjectName(QStringLiteral("placementSolve"));
    solve_->setDefault(true);
    message_ = new QLabel;
    message_->setWordWrap(true);
    message_->setTextFormat(Qt::PlainText);
    message_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    results_ = new QTableWidget(0, 4);
    results_->setObjectName(QStringLiteral("placementResults"));
    results_->setHorizontalHeaderLabels({tr("Value"), tr("Corner lands at"), tr("Off target"), QString()});
    results_->verticalHeader()->setVisible(false);
    results_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    results_->setSelectionMode(QAbstractItemView::NoSelection);
    results_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    results_->horizontalHeader()->setSectionResizeMode(0, QHeaderView::Stretch);

    auto* form = new QFormLayout;
    form->addRow(tr("&Corner:"), corner_);
    auto* targetRow = new QHBoxLayout;
    targetRow->addWidget(target_, 1);
    targetRow->addWidget(new QLabel(tr("Hz")));
    auto* targetLabel = new QLabel(tr("&Move to:"));
    targetLabel->setBuddy(target_);
    form->addRow(targetLabel, targetRow);
    form->addRow(tr("By &changing:"), part_);
    form->addRow(tr("&Series:"), series_);
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addWidget(solve_, 0, Qt::AlignRight);
    layout->addWidget(message_);
    layout->addWidget(results_, 1);
    resize(520, 360);

    connect(solve_, &QPushButton::clicked, this, [this] { solve(); });
    connect(target_, &QLineEdit::returnPressed, this, [this] { solve(); });
    connect(corner_, &QComboBox::currentIndexChanged, this, [this] {
        // The default part depends on the corner.
        if (!applying_)
            refreshCorners();
    });
    connect(document_, &SchematicDocument::networkChanged, this, [this] {
        if (!applying_)
            placement_.reset();
        refreshCorners();
        if (!applying_)
            showPlacement();
    });
    refreshCorners();
    showMessage(tr("Type the frequency the corner should move to."), false);
}

PlacementPanel* PlacementPanel::of(QWidget* window, SchematicDocument* document)
{
    auto* panel = window->findChild<PlacementPanel*>(QStringLiteral("placementPanel"), Qt::FindDirectChildrenOnly);
    if (!panel)
        panel = new PlacementPanel(document, window);
    return panel;
}

void PlacementPanel::refreshCorners()
{
    const int keepCorner = corner_->currentIndex();
    const QString keepPart = part_->currentData().toString();
    const QSignalBlocker blockCorner(corner_);
    const QSignalBlocker blockPart(part_);
    corner_->clear();
    part_->clear();
    if (!document_->hasResponse())
        return;
    const tauline::Network network = document_->network();
    tauline::Analysis analysis;
    try {
        analysis = tauline::analyze(network);
    } catch (const std::exception&) {
        return;
    }
    for (std::size_t i = 0; i < analysis.breakpoints.size(); ++i)
        corner_->addItem(cornerLabel(static_cast<int>(i), analysis.breakpoints[i]));
    const int corner = std::clamp(keepCorner, 0, corner_->count() - 1);
    corner_->setCurrentIndex(corner);
    if (corner < 0)
        return;
    const auto best = tauline::mostSensitivePart(network, analysis, corner);
    part_->addItem(best ? tr("Most sensitive (%1)").arg(QString::fromStdString(network.parts[*best].name))
                        : tr("Most sensitive"),
                   QString());
    for (const auto& p : network.parts)
        if (p.kind == tauline::PartKind::Resistor || p.kind == tauline::PartKind::Capacitor)
            part_->addItem(QString::fromStdString(p.name), QString::fromStdString(p.name));
    const int keep = part_->findData(keepPart);
    part_->setCurrentIndex(keep >= 0 ? keep : 0);
}

void PlacementPanel::request(int corner, std::optional<double> targetHz)
{
    if (corner >= 0 && corner < corner_->count())
        corner_->setCurrentIndex(corner);
    part_->setCurrentIndex(0);
    if (targetHz) {
        target_->setText(QString::fromStdString(tauline::formatEngineering(*targetHz, 4)));
        solve();
    } else {
        target_->setFocus();
        target_->selectAll();
    }
}

bool PlacementPanel::solve()
{
    placement_.reset();
    if (corner_->currentIndex() < 0) {
        showPlacement();
        showMessage(tr("There is no corner to place."), true);
        return false;
    }
    tauline::PlacementRequest request;
    request.corner = corner_->currentIndex();
    try {
        request.targetHz = tauline::parseFrequency(target_->text().trimmed().toStdString());
    } catch (const tauline::InputError& e) {
        showPlacement();
        showMessage(tr("Move to: %1").arg(QString::fromStdString(e.what())), true);
        return false;
    }
    if (const QString part = part_->currentData().toString(); !part.isEmpty())
        request.part = part.toStdString();
    request.series = static_cast<tauline::ValueSeries>(series_->currentData().toInt());
    try {
        placement_ = tauline::placeCorner(document_->network(), request);
    } catch (const std::exception& e) {
        showPlacement();
        showMessage(QString::fromStdString(e.what()), true);
        return false;
    }
    showPlacement();
    const auto& p = *placement_;
    showMessage(tr("Corner %1 to %2 by changing %3 (now %4; d ln f / d ln %3 = %5).")
                    .arg(p.corner + 1)
                    .arg(frequencyText(p.targetHz), QString::fromStdString(p.part),
                         QString::fromStdString(tauline::formatValue(p.startValue, p.kind)))
                    .arg(p.sensitivity, 0, 'f', 3),
                false);
    return true;
}

void PlacementPanel::showPlacement()
{
    results_->setRowCount(0);
    if (!placement_)
        return;
    const auto& p = *placement_;
    struct Row {
        QString label;
        double value;
        std::optional<double> hz;
    };
    std::vector<Row> rows{{tr("exact"), p.value, p.hz}};
    for (const auto& v : p.nearest)
        rows.push_back({QString::fromLatin1(tauline::seriesName(p.series)), v.value, v.hz});
    results_->setRowCount(static_cast<int>(rows.size()));
    for (int r = 0; r < static_cast<int>(rows.size()); ++r) {
        const Row& row = rows[r];
        const std::string value = r == 0 ? tauline::formatQuantity(row.value, tauline::valueUnit(p.kind), 6)
                                         : tauline::formatValue(row.value, p.kind);
        results_->setItem(r, 0, cell(QStringLiteral("%1  %2").arg(row.label, QString::fromStdString(value))));
        results_->setItem(r, 1, cell(row.hz ? frequencyText(*row.hz) : tr("not followed")));
        results_->setItem(r, 2, cell(row.hz ? offTarget(*row.hz, p.targetHz) : QStringLiteral("—")));
        auto* apply = new QPushButton(tr("Apply"));
        apply->setObjectName(QStringLiteral("placementApply%1").arg(r));
        apply->setToolTip(tr("Set %1 to this value (one undo step)").arg(QString::fromStdString(p.part)));
        connect(apply, &QPushButton::clicked, this, [this, r] { applyRow(r); });
        results_->setCellWidget(r, 3, apply);
    }
}

void PlacementPanel::applyRow(int row)
{
    if (!placement_ || row < 0)
        return;
    const auto p = *placement_;
    double value = p.value;
    if (row > 0) {
        if (row - 1 >= static_cast<int>(p.nearest.size()))
            return;
        value = p.nearest[row - 1].value;
    }
    // The exact solution goes in with six significant digits (the corner
    // then lands within about 1e-6 of the target), as a value a person can
    // read on the drawing; a series value with its usual text.
    QString text;
    if (row == 0) {
        const std::string shown = tauline::formatQuantity(value, tauline::valueUnit(p.kind), 6);
        value = tauline::parseValue(shown, p.kind);
        text = QString::fromStdString(shown);
    }
    applying_ = true;
    document_->setPartValue(QString::fromStdString(p.part), value, text);
    applying_ = false;
    showMessage(tr("%1 set to %2. Undo to go back.")
                    .arg(QString::fromStdString(p.part),
                         QString::fromStdString(tauline::formatQuantity(value, tauline::valueUnit(p.kind), 6))),
                false);
}

QString PlacementPanel::message() const
{
    return message_->text();
}

void PlacementPanel::showMessage(const QString& text, bool problem)
{
    message_->setText(text);
    message_->setStyleSheet(problem ? QStringLiteral("color: #8a2c22;") : QStringLiteral("color: #333;"));
}

}  // namespace tauline::ui
