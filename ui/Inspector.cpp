#include "Inspector.h"

#include "Errors.h"
#include "SchematicDocument.h"
#include "ValueParser.h"
#include "ValueSeriesSetting.h"

#include <QComboBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QFrame>
#include <QVBoxLayout>

#include <algorithm>
#include <cmath>

namespace tauline::ui {

namespace {

QString kindText(tauline::PartKind kind)
{
    switch (kind) {
    case tauline::PartKind::Resistor: return QObject::tr("Resistor");
    case tauline::PartKind::Capacitor: return QObject::tr("Capacitor");
    case tauline::PartKind::Inductor: return QObject::tr("Inductor");
    case tauline::PartKind::Transconductance: return QObject::tr("Transconductance");
    case tauline::PartKind::VoltageAmplifier: return QObject::tr("Voltage amplifier");
    }
    return {};
}

QString responseText(const tauline::Network& network)
{
    const auto& r = network.response;
    auto pair = [](const std::array<std::string, 2>& nodes) {
        return QStringLiteral("%1 → %2").arg(QString::fromStdString(nodes[0]),
                                             QString::fromStdString(nodes[1]));
    };
    switch (r.kind) {
    case tauline::ResponseKind::Impedance:
        return QObject::tr("Impedance at port %1").arg(pair(r.input));
    case tauline::ResponseKind::VoltageGain:
        return QObject::tr("Voltage gain, input %1, output %2").arg(pair(r.input), pair(r.output));
    case tauline::ResponseKind::Transimpedance:
        return QObject::tr("Transimpedance, input %1, output %2").arg(pair(r.input), pair(r.output));
    }
    return {};
}

}  // namespace

Inspector::Inspector(SchematicDocument* document, QWidget* parent)
    : QWidget(parent), document_(document)
{
    // Either a hint or the part's fields, each only as tall as it needs.
    emptyPage_ = new QLabel(tr("Select a part on the canvas to see and change it."));
    emptyPage_->setWordWrap(true);
    emptyPage_->setAlignment(Qt::AlignTop | Qt::AlignLeft);
    emptyPage_->setStyleSheet(QStringLiteral("color: #666; padding: 4px;"));

    partPage_ = new QWidget;
    auto* partPage = partPage_;
    auto* form = new QFormLayout(partPage);
    form->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
    name_ = new QLabel;
    name_->setStyleSheet(QStringLiteral("font-weight: bold;"));
    kind_ = new QLabel;
    valueEdit_ = new QLineEdit;
    valueEdit_->setPlaceholderText(tr("e.g. 4k7, 10 nF, 2.2µ"));
    valueEdit_->setToolTip(tr("SI (4.7k, 10 nF) or an IEC 60062 code (4k7, 2n2, R47); "
                              "press Enter to apply"));
    valueError_ = new QLabel;
    valueError_->setWordWrap(true);
    valueError_->setStyleSheet(QStringLiteral("color: #b02a1a;"));
    valueError_->hide();
    auto* valueBox = new QWidget;
    auto* valueLayout = new QVBoxLayout(valueBox);
    valueLayout->setContentsMargins(0, 0, 0, 0);
    valueLayout->setSpacing(2);
    valueLayout->addWidget(valueEdit_);
    valueLayout->addWidget(valueError_);
    form->addRow(tr("Name"), name_);
    form->addRow(tr("Kind"), kind_);
    form->addRow(tr("Value"), valueBox);

    // Settings that hold whatever is selected.
    auto* common = new QWidget;
    auto* commonForm = new QFormLayout(common);
    commonForm->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
    series_ = new QComboBox;
    for (auto s : {tauline::ValueSeries::E12, tauline::ValueSeries::E24, tauline::ValueSeries::E96})
        series_->addItem(QString::fromLatin1(tauline::seriesName(s)), static_cast<int>(s));
    series_->setCurrentIndex(series_->findData(static_cast<int>(valueSeriesSetting())));
    series_->setToolTip(tr("The IEC 60063 series that the mouse wheel and value drags step "
                           "through (hold Ctrl for continuous steps)"));
    responseKind_ = new QComboBox;
    responseKind_->addItem(tr("Impedance (port)"), static_cast<int>(tauline::ResponseKind::Impedance));
    responseKind_->addItem(tr("Voltage gain"), static_cast<int>(tauline::ResponseKind::VoltageGain));
    responseKind_->addItem(tr("Transimpedance"), static_cast<int>(tauline::ResponseKind::Transimpedance));
    responseKind_->setToolTip(tr("What the plot shows; the port, or the input and output markers, "
                                 "on the canvas say where"));
    response_ = new QLabel;
    response_->setWordWrap(true);
    response_->setStyleSheet(QStringLiteral("color: #555;"));
    commonForm->addRow(tr("Value steps"), series_);
    commonForm->addRow(tr("Response"), responseKind_);
    commonForm->addRow(QString(), response_);

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(6, 6, 6, 6);
    layout->addWidget(emptyPage_);
    layout->addWidget(partPage_);
    auto* rule = new QFrame;
    rule->setFrameShape(QFrame::HLine);
    rule->setFrameShadow(QFrame::Sunken);
    layout->addWidget(rule);
    layout->addWidget(common);
    layout->addStretch(1);

    connect(valueEdit_, &QLineEdit::returnPressed, this, &Inspector::applyValue);
    connect(valueEdit_, &QLineEdit::editingFinished, this, &Inspector::applyValue);
    connect(valueEdit_, &QLineEdit::textEdited, this, [this] { valueError_->hide(); });
    connect(series_, &QComboBox::currentIndexChanged, this, [this](int index) {
        if (index >= 0)
            setValueSeriesSetting(static_cast<tauline::ValueSeries>(series_->itemData(index).toInt()));
    });
    connect(responseKind_, &QComboBox::activated, this, [this](int index) {
        document_->setResponseKind(
            static_cast<tauline::ResponseKind>(responseKind_->itemData(index).toInt()));
    });
    connect(document_, &SchematicDocument::selectedPartChanged, this, &Inspector::showPart);
    connect(document_, &SchematicDocument::networkChanged, this, &Inspector::refresh);
    showPart(document_->selectedPart());
}

QString Inspector::valueError() const
{
    return valueError_->isHidden() ? QString() : valueError_->text();
}

void Inspector::showPart(const QString& part)
{
    part_ = part;
    valueError_->hide();
    refresh();
}

void Inspector::refresh()
{
    const std::optional<tauline::Part> part =
        part_.isEmpty() ? std::nullopt : document_->part(part_);
    refreshResponse();
    emptyPage_->setVisible(!part);
    partPage_->setVisible(part.has_value());
    if (!part)
        return;
    name_->setText(part_);
    kind_->setText(kindText(part->kind));
    // Leave a value being typed alone; show the drawing's value otherwise.
    if (!valueEdit_->hasFocus() || !valueEdit_->isModified()) {
        valueEdit_->setText(QString::fromStdString(tauline::formatValue(part->value, part->kind)));
        valueEdit_->setModified(false);
    }
}

void Inspector::refreshResponse()
{
    const std::optional<tauline::ResponseKind> kind = document_->responseKind();
    {
        const QSignalBlocker block(responseKind_);
        responseKind_->setEnabled(kind.has_value());
        responseKind_->setCurrentIndex(kind ? responseKind_->findData(static_cast<int>(*kind)) : -1);
    }
    response_->setText(document_->hasResponse() ? responseText(document_->network())
                                                : tr("None yet: place a port, or an input and an "
                                                     "output, on the canvas."));
}

void Inspector::applyValue()
{
    if (part_.isEmpty() || !valueEdit_->isModified())
        return;
    const std::optional<tauline::Part> part = document_->part(part_);
    if (!part)
        return;
    const QString text = valueEdit_->text().trimmed();
    // Parse first: an unchanged value is no edit (and no undo step).
    try {
        if (tauline::parseValue(text.toStdString(), part->kind) == part->value) {
            valueError_->hide();
            valueEdit_->setModified(false);
            refresh();
            return;
        }
    } catch (const tauline::InputError&) {
        // The document words the error with the part's name; ask it.
    }
    const QString error = document_->setPartValueText(part_, text);
    if (error.isEmpty()) {
        valueError_->hide();
        valueEdit_->setModified(false);
        refresh();
    } else {
        valueError_->setText(error);
        valueError_->show();
    }
}

}  // namespace tauline::ui
