#include "CornerTable.h"

#include "BreakpointTable.h"
#include "LowQPair.h"
#include "QuantityText.h"

#include <QAction>
#include <QHeaderView>

#include <cmath>

namespace tauline::ui {

namespace {

QTableWidgetItem* cell(const QString& text, Qt::Alignment align = Qt::AlignLeft | Qt::AlignVCenter)
{
    auto* item = new QTableWidgetItem(text);
    item->setFlags(Qt::ItemIsSelectable | Qt::ItemIsEnabled);
    item->setTextAlignment(align);
    return item;
}

QString typeText(const tauline::Breakpoint& corner)
{
    const bool pole = corner.type == tauline::RootType::Pole;
    if (corner.q)
        return (pole ? QObject::tr("pole pair, Q %1") : QObject::tr("zero pair, Q %1"))
            .arg(QString::fromStdString(tauline::qualityFactorText(*corner.q)));
    return pole ? QObject::tr("pole") : QObject::tr("zero");
}

QString sensitivityText(double s)
{
    QString number = QString::number(s, 'f', 2);
    number.replace(QLatin1Char('-'), QChar(0x2212));
    if (s > 0)
        number.prepend(QLatin1Char('+'));
    return number;
}

}  // namespace

CornerTable::CornerTable(QWidget* parent) : QTableWidget(parent)
{
    setColumnCount(ColumnCount);
    setHorizontalHeaderLabels({tr("Frequency"), tr("Type"), tr("Estimate"), tr("Error"),
                               tr("Separation"), tr("Set by")});
    horizontalHeaderItem(PartsColumn)->setToolTip(
        tr("The parts with the largest normalised sensitivity d ln f / d ln x"));
    horizontalHeaderItem(EstimateColumn)->setToolTip(
        tr("From the time-constant sums (ratios of successive coefficients)"));
    setSelectionBehavior(QAbstractItemView::SelectRows);
    setSelectionMode(QAbstractItemView::SingleSelection);
    setEditTriggers(QAbstractItemView::NoEditTriggers);
    setAlternatingRowColors(true);
    verticalHeader()->setVisible(false);
    verticalHeader()->setDefaultSectionSize(fontMetrics().height() + 6);
    horizontalHeader()->setStretchLastSection(true);
    horizontalHeader()->setSectionResizeMode(QHeaderView::Interactive);
    horizontalHeader()->setHighlightSections(false);
    setColumnWidth(FrequencyColumn, 84);
    setColumnWidth(TypeColumn, 72);
    setColumnWidth(EstimateColumn, 84);
    setColumnWidth(ErrorColumn, 62);
    setColumnWidth(SeparationColumn, 84);
    connect(this, &QTableWidget::itemSelectionChanged, this, &CornerTable::emitSelection);
    auto* place = new QAction(tr("&Place This Corner…"), this);
    place->setObjectName(QStringLiteral("placeThisCornerAction"));
    connect(place, &QAction::triggered, this, [this] {
        if (selectedCorner() >= 0)
            emit placementRequested(selectedCorner());
    });
    addAction(place);
    setContextMenuPolicy(Qt::ActionsContextMenu);
}

void CornerTable::setAnalysis(const tauline::Analysis& analysis)
{
    const int keep = selectedCorner();
    QSignalBlocker block(this);
    const auto& corners = analysis.breakpoints;
    // Rows are kept and their cells rewritten in place: a value dragged
    // through a series re-fills the same rows many times a second, and new
    // items each time cost the view a full relayout.
    setRowCount(static_cast<int>(corners.size()));
    parts_.assign(corners.size(), {});
    const Qt::Alignment right = Qt::AlignRight | Qt::AlignVCenter;
    auto put = [this](int row, int column, const QString& text, Qt::Alignment align) {
        QTableWidgetItem* it = item(row, column);
        if (!it) {
            it = cell(text, align);
            setItem(row, column, it);
        } else {
            it->setText(text);
            it->setTextAlignment(align);
        }
        return it;
    };
    const Qt::Alignment left = Qt::AlignLeft | Qt::AlignVCenter;
    for (int row = 0; row < rowCount(); ++row) {
        const auto& corner = corners[row];
        auto* frequency = put(row, FrequencyColumn, frequencyText(corner.hz), right);
        frequency->setData(HzRole, corner.hz);
        auto* type = put(row, TypeColumn, typeText(corner), left);
        type->setForeground(corner.type == tauline::RootType::Pole ? QColor(0x8a, 0x2c, 0x22)
                                                                   : QColor(0x1f, 0x6a, 0x40));
        auto* estimate = put(row, EstimateColumn, frequencyText(corner.estimateHz), right);
        estimate->setData(HzRole, corner.estimateHz);
        put(row, ErrorColumn, percentText(corner.estimateError), right);
        auto* separation = put(row, SeparationColumn, corner.poorlySeparated ? tr("⚠ too close") : tr("ok"), left);
        if (corner.poorlySeparated) {
            separation->setForeground(QColor(0x9a, 0x5b, 0x00));
            separation->setToolTip(tr("The corners lie too close together for the time-constant "
                                      "estimate; read the exact frequency."));
        } else {
            separation->setForeground(QColor(0x70, 0x76, 0x80));
            separation->setToolTip(QString());
        }
        auto* parts = put(row, PartsColumn, QStringLiteral("…"), left);
        parts->setData(PartsRole, QVariant());
        parts->setForeground(QColor(0x70, 0x76, 0x80));
        parts->setToolTip(tr("Working out which parts set this corner…"));
    }
    // Close pairs read as one quadratic (LowQPair.h): where that lands.
    for (const auto& pair : tauline::lowQPairs(analysis)) {
        QString tip = tr("Read with its neighbour as one quadratic: f0 = %1, Q = %2.\n"
                         "Simple estimates off by %3 and %4.")
                          .arg(frequencyText(pair.omega0Hz()))
                          .arg(pair.q, 0, 'f', 3)
                          .arg(percentText(pair.estimateLowError), percentText(pair.estimateHighError));
        if (pair.quadraticLowHz)
            tip += tr("\nThe quadratic's roots f0·Q/F, f0·F/Q: %1 and %2 (%3, %4 off).")
                       .arg(frequencyText(*pair.quadraticLowHz), frequencyText(*pair.quadraticHighHz),
                            percentText(*pair.quadraticLowError), percentText(*pair.quadraticHighError));
        // The pair's quadratic in the cell itself, not only in the tooltip:
        // it is what to read where the simple estimate fails.
        const QString text = tr("pair: f0 %1, Q %2").arg(frequencyText(pair.omega0Hz())).arg(pair.q, 0, 'f', 2);
        for (int row : {pair.lowBreakpoint, pair.highBreakpoint})
            if (QTableWidgetItem* separation = item(row, SeparationColumn)) {
                const bool flagged = corners[row].poorlySeparated;
                separation->setText(flagged ? QStringLiteral("⚠ ") + text : text);
                separation->setToolTip(tip);
            }
    }
    if (keep >= 0 && keep < rowCount())
        selectRow(keep);
    block.unblock();
    if (keep >= 0 && selectedCorner() != keep)
        emit cornerSelected(-1, {});
}

void CornerTable::setSensitivities(const std::vector<tauline::CornerSensitivity>& sensitivities)
{
    const int rows = std::min<int>(rowCount(), static_cast<int>(sensitivities.size()));
    for (int row = 0; row < rows; ++row) {
        const auto dominant = tauline::dominantParts(sensitivities[row]);
        QStringList names;
        QStringList shown;
        for (const auto& part : dominant) {
            names << QString::fromStdString(part.part);
            shown << QStringLiteral("%1 %2").arg(names.back(), sensitivityText(part.value));
        }
        QStringList all;
        for (const auto& part : sensitivities[row].parts)
            if (part.value != 0.0)
                all << QStringLiteral("%1: %2").arg(QString::fromStdString(part.part),
                                                    sensitivityText(part.value));
        parts_[row] = names;
        // A double root has no exact derivative: the values are differences.
        const bool exact = sensitivities[row].method == tauline::SensitivityMethod::Exact;
        QString text = shown.isEmpty() ? tr("—") : shown.join(QStringLiteral(", "));
        if (!exact && !shown.isEmpty())
            text.prepend(QStringLiteral("≈ "));
        auto* item = cell(text);
        item->setData(PartsRole, names);
        QString tip = all.isEmpty() ? tr("No part moves this corner.")
                                    : tr("d ln f / d ln x for every part that moves it:\n")
                                          + all.join(QLatin1Char('\n'));
        if (!exact)
            tip += QStringLiteral("\n≈ ") + QString::fromStdString(sensitivities[row].note);
        item->setToolTip(tip);
        setItem(row, PartsColumn, item);
    }
    if (selectedCorner() >= 0)
        emitSelection();
}

void CornerTable::clearCorners()
{
    const bool hadSelection = selectedCorner() >= 0;
    {
        const QSignalBlocker block(this);
        clearContents();
        setRowCount(0);
        parts_.clear();
    }
    if (hadSelection)
        emit cornerSelected(-1, {});
}

int CornerTable::selectedCorner() const
{
    const auto rows = selectionModel() ? selectionModel()->selectedRows() : QModelIndexList{};
    return rows.isEmpty() ? -1 : rows.front().row();
}

void CornerTable::selectCorner(int index)
{
    if (index < 0 || index >= rowCount())
        clearSelection();
    else
        selectRow(index);
}

QStringList CornerTable::partsForCorner(int index) const
{
    if (index < 0 || index >= static_cast<int>(parts_.size()))
        return {};
    return parts_[index];
}

void CornerTable::emitSelection()
{
    const int index = selectedCorner();
    emit cornerSelected(index, partsForCorner(index));
}

}  // namespace tauline::ui
