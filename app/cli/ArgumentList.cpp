#include "ArgumentList.h"

#include <algorithm>

namespace tauline::cli {

const std::string* ArgumentList::value(const std::string& name) const
{
    auto it = values.find(name);
    return it == values.end() || it->second.empty() ? nullptr : &it->second.front();
}

ArgumentList parseArguments(const std::vector<std::string>& arguments, const std::vector<OptionSpec>& options)
{
    ArgumentList list;
    bool optionsEnded = false;
    for (size_t i = 0; i < arguments.size(); ++i) {
        const std::string& argument = arguments[i];
        if (optionsEnded || argument == "-" || argument.empty() || argument[0] != '-') {
            list.positional.push_back(argument);
            continue;
        }
        if (argument == "--") {
            optionsEnded = true;
            continue;
        }
        std::string name = argument;
        std::optional<std::string> inlineValue;
        if (size_t eq = argument.find('='); eq != std::string::npos) {
            name = argument.substr(0, eq);
            inlineValue = argument.substr(eq + 1);
        }
        auto spec = std::find_if(options.begin(), options.end(), [&](const OptionSpec& o) { return o.name == name; });
        if (spec == options.end())
            throw UsageError("unknown option " + name);
        if (!spec->repeatable && list.has(name))
            throw UsageError(name + " is given more than once");
        if (!spec->takesValue) {
            if (inlineValue)
                throw UsageError(name + " takes no value");
            list.flags.insert(name);
            continue;
        }
        if (!inlineValue) {
            if (i + 1 >= arguments.size())
                throw UsageError(name + " needs a value");
            inlineValue = arguments[++i];
        }
        list.values[name].push_back(*inlineValue);
    }
    return list;
}

}  // namespace tauline::cli
