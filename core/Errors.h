#pragma once

#include <stdexcept>
#include <string>
#include <vector>

namespace tauline {

// A problem the user can act on: a file that cannot be read, a value that
// does not parse, a network whose response is undefined. Holds one message per
// problem; what() joins them with newlines.
class InputError : public std::runtime_error {
public:
    explicit InputError(std::vector<std::string> problems);
    explicit InputError(const std::string& problem);
    const std::vector<std::string>& problems() const { return problems_; }

private:
    std::vector<std::string> problems_;
};

}  // namespace tauline
