#pragma once

#include <QWidget>

class QComboBox;
class QLabel;
class QLineEdit;

namespace tauline::ui {

class SchematicDocument;

// The selected part: its name, kind and value (typed in SI or an IEC 60062
// code, parse errors shown in place), the standard series that value steps
// follow, and the response the drawing sets up.
class Inspector : public QWidget {
    Q_OBJECT
public:
    explicit Inspector(SchematicDocument* document, QWidget* parent = nullptr);

    QString part() const { return part_; }
    QLineEdit* valueEdit() const { return valueEdit_; }
    QComboBox* responseKindBox() const { return responseKind_; }
    QString valueError() const;

public slots:
    void showPart(const QString& part);
    void refresh();

private:
    void applyValue();
    void refreshResponse();

    SchematicDocument* document_;
    QString part_;
    QLabel* emptyPage_ = nullptr;
    QWidget* partPage_ = nullptr;
    QLabel* name_ = nullptr;
    QLabel* kind_ = nullptr;
    QLineEdit* valueEdit_ = nullptr;
    QLabel* valueError_ = nullptr;
    QComboBox* series_ = nullptr;
    QComboBox* responseKind_ = nullptr;
    QLabel* response_ = nullptr;
};

}  // namespace tauline::ui
