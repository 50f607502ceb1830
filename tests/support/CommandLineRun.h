// Runs the command line in-process as a script would meet it: the exit
// status and what went to stdout and to stderr.
#pragma once

#include "CommandLine.h"

#include <sstream>
#include <string>
#include <vector>

namespace tauline::testing {

struct CommandLineRun {
    int status = -1;
    std::string out;
    std::string err;
};

// `arguments` without the program name.
inline CommandLineRun runTauline(std::vector<std::string> arguments)
{
    arguments.insert(arguments.begin(), "tauline");
    std::vector<char*> argv;
    for (auto& a : arguments)
        argv.push_back(a.data());
    argv.push_back(nullptr);
    std::ostringstream out, err;
    CommandLineRun r;
    r.status = tauline::runCommandLine(int(arguments.size()), argv.data(), out, err);
    r.out = out.str();
    r.err = err.str();
    return r;
}

inline bool contains(const std::string& text, const std::string& piece)
{
    return text.find(piece) != std::string::npos;
}

}  // namespace tauline::testing
