#include "SafetyCaution.h"

#include "HazardCaution.h"

namespace tauline::ui {

// One rule and one wording for the editor and the command line: core's.
QString safetyCautionText()
{
    return QString::fromUtf8(tauline::hazardCautionText());
}

bool suggestsHazardousUse(const QString& title)
{
    return tauline::suggestsHazardousUse(title.toStdString());
}

}  // namespace tauline::ui
