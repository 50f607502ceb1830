#include "ValueSeriesSetting.h"

#include <QSettings>
#include <QString>

namespace tauline::ui {

namespace {
const char* const kKey = "values/series";
}

tauline::ValueSeries valueSeriesSetting()
{
    const QString name = QSettings().value(kKey, QStringLiteral("E24")).toString();
    return tauline::seriesFromName(name.toStdString()).value_or(tauline::ValueSeries::E24);
}

void setValueSeriesSetting(tauline::ValueSeries series)
{
    QSettings().setValue(kKey, QString::fromLatin1(tauline::seriesName(series)));
}

}  // namespace tauline::ui
