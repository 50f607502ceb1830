#include "Errors.h"

namespace tauline {

namespace {
std::string joinLines(const std::vector<std::string>& lines)
{
    std::string out;
    for (const auto& line : lines) {
        if (!out.empty())
            out += '\n';
        out += line;
    }
    return out;
}
}  // namespace

InputError::InputError(std::vector<std::string> problems)
    : std::runtime_error(joinLines(problems)), problems_(std::move(problems))
{
}

InputError::InputError(const std::string& problem) : InputError(std::vector<std::string>{problem}) {}

}  // namespace tauline
