#pragma once

#include <map>
#include <optional>
#include <set>
#include <stdexcept>
#include <string>
#include <vector>

namespace tauline::cli {

// Bad usage: a missing file, an unknown option, a value that does not parse.
// The command line reports it and exits with status 2.
class UsageError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

struct OptionSpec {
    std::string name;         // "--at"
    bool takesValue = false;  // "--at 1k" or "--at=1k"
    bool repeatable = false;  // values of every occurrence are kept
};

struct ArgumentList {
    std::vector<std::string> positional;
    std::map<std::string, std::vector<std::string>> values;
    std::set<std::string> flags;

    bool has(const std::string& name) const { return flags.count(name) || values.count(name); }
    // The single value of an option, or nullptr when it was not given.
    const std::string* value(const std::string& name) const;
};

// Splits arguments into positionals, flags and option values. "--" ends the
// options; a value is taken from the next argument even when it starts with
// "-", so "--from -5" reaches the frequency check and is reported there.
// Throws UsageError for unknown options, a missing value, a value on a flag,
// or an option given twice that is not repeatable.
ArgumentList parseArguments(const std::vector<std::string>& arguments, const std::vector<OptionSpec>& options);

}  // namespace tauline::cli
