#include "NetworkComparison.h"

#include <map>

namespace tauline::ui {

bool sameAnalysis(const tauline::Network& a, const tauline::Network& b)
{
    if (a.parts.size() != b.parts.size())
        return false;
    for (size_t i = 0; i < a.parts.size(); ++i) {
        const tauline::Part& p = a.parts[i];
        const tauline::Part& q = b.parts[i];
        if (p.name != q.name || p.kind != q.kind || p.value != q.value || p.nodes != q.nodes
            || p.control != q.control)
            return false;
    }
    const auto& r = a.response;
    const auto& s = b.response;
    return r.kind == s.kind && r.input == s.input && r.output == s.output;
}

bool sameConnectivity(const tauline::Network& file, const tauline::Network& drawn, bool allowExtraParts)
{
    if (!allowExtraParts && file.parts.size() != drawn.parts.size())
        return false;
    std::map<std::string, std::string> forward;
    std::map<std::string, std::string> backward;
    auto match = [&](const std::string& a, const std::string& b) {
        if ((a == kGroundNode) != (b == kGroundNode))
            return false;
        auto f = forward.find(a);
        auto g = backward.find(b);
        if (f == forward.end() && g == backward.end()) {
            forward[a] = b;
            backward[b] = a;
            return true;
        }
        return f != forward.end() && g != backward.end() && f->second == b && g->second == a;
    };
    std::map<std::string, const tauline::Part*> drawnByName;
    for (const tauline::Part& p : drawn.parts)
        drawnByName[p.name] = &p;
    for (const tauline::Part& p : file.parts) {
        auto it = drawnByName.find(p.name);
        if (it == drawnByName.end())
            return false;
        const tauline::Part& q = *it->second;
        if (p.kind != q.kind || p.value != q.value)
            return false;
        if (!match(p.nodes[0], q.nodes[0]) || !match(p.nodes[1], q.nodes[1]))
            return false;
    }
    const auto& r = file.response;
    const auto& s = drawn.response;
    if (r.kind != s.kind)
        return false;
    for (int i = 0; i < 2; ++i) {
        if (!match(r.input[i], s.input[i]) || !match(r.output[i], s.output[i]))
            return false;
    }
    return true;
}

}  // namespace tauline::ui
