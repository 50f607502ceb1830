#include "DrawingSnapshot.h"

namespace tauline::ui {

const char* markerRoleName(MarkerRole role)
{
    switch (role) {
    case MarkerRole::Port: return "port";
    case MarkerRole::Input: return "input";
    case MarkerRole::Output: return "output";
    }
    return "port";
}

const char* driveKindName(DriveKind drive)
{
    return drive == DriveKind::Current ? "current" : "voltage";
}

bool markerRoleFromName(const QString& name, MarkerRole* role)
{
    for (MarkerRole r : {MarkerRole::Port, MarkerRole::Input, MarkerRole::Output}) {
        if (name == QLatin1String(markerRoleName(r))) {
            *role = r;
            return true;
        }
    }
    return false;
}

bool driveKindFromName(const QString& name, DriveKind* drive)
{
    if (name == QLatin1String("voltage")) {
        *drive = DriveKind::Voltage;
        return true;
    }
    if (name == QLatin1String("current")) {
        *drive = DriveKind::Current;
        return true;
    }
    return false;
}

}  // namespace tauline::ui
