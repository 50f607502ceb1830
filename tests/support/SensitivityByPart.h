// A corner's sensitivities looked up by part name.
#pragma once

#include "CornerSensitivity.h"

#include <map>
#include <string>

namespace tauline::testing {

inline std::map<std::string, double> byPart(const CornerSensitivity& corner)
{
    std::map<std::string, double> out;
    for (const auto& p : corner.parts)
        out[p.part] = p.value;
    return out;
}

}  // namespace tauline::testing
