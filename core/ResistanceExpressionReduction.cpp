#include "ResistanceExpressionReduction.h"

#include <algorithm>
#include <functional>
#include <map>
#include <numeric>

namespace tauline {

namespace {

using Type = ReductionBranch::Type;

class NodeJoins {
public:
    explicit NodeJoins(int nodes) : parent_(nodes) { std::iota(parent_.begin(), parent_.end(), 0); }
    int find(int i)
    {
        while (parent_[i] != i)
            i = parent_[i] = parent_[parent_[i]];
        return i;
    }
    void join(int a, int b) { parent_[find(a)] = find(b); }

private:
    std::vector<int> parent_;
};

bool pathological(const ReductionBranch& b)
{
    return b.type == Type::Nullator || b.type == Type::Norator;
}

// Branches in the biconnected block that holds a virtual branch from–to:
// only they can carry the current of a source between from and to (Tarjan's
// block decomposition). Everything else hangs off a cut node, or lies in
// another piece, and carries none.
std::vector<bool> inTerminalBlock(int nodes, const std::vector<ReductionBranch>& branches, int from, int to)
{
    const int virtualId = static_cast<int>(branches.size());
    std::vector<std::vector<std::pair<int, int>>> adjacent(nodes);  // (branch, other node)
    for (int k = 0; k < virtualId; ++k) {
        adjacent[branches[k].a].push_back({k, branches[k].b});
        adjacent[branches[k].b].push_back({k, branches[k].a});
    }
    adjacent[from].push_back({virtualId, to});
    adjacent[to].push_back({virtualId, from});

    std::vector<int> discovered(nodes, 0);
    std::vector<int> low(nodes, 0);
    std::vector<int> stack;
    std::vector<bool> keep(branches.size(), false);
    int time = 0;
    std::function<void(int, int)> visit = [&](int u, int parentBranch) {
        discovered[u] = low[u] = ++time;
        for (const auto& [id, v] : adjacent[u]) {
            if (id == parentBranch)
                continue;
            if (!discovered[v]) {
                stack.push_back(id);
                visit(v, id);
                low[u] = std::min(low[u], low[v]);
                if (low[v] >= discovered[u]) {
                    std::vector<int> block;
                    while (true) {
                        const int top = stack.back();
                        stack.pop_back();
                        block.push_back(top);
                        if (top == id)
                            break;
                    }
                    if (std::find(block.begin(), block.end(), virtualId) != block.end())
                        for (int b : block)
                            if (b != virtualId)
                                keep[b] = true;
                }
            } else if (discovered[v] < discovered[u]) {
                stack.push_back(id);
                low[u] = std::min(low[u], discovered[v]);
            }
        }
    };
    visit(from, -1);
    return keep;
}

struct Step {
    bool changed = false;
    bool unresolved = false;  // a nullator or norator dropped without its partner
};

// Parallel branches between the same two nodes become one.
Step mergeParallel(std::vector<ReductionBranch>& branches, NodeJoins& joins)
{
    Step step;
    std::map<std::pair<int, int>, std::vector<int>> groups;
    for (int k = 0; k < static_cast<int>(branches.size()); ++k)
        groups[{std::min(branches[k].a, branches[k].b), std::max(branches[k].a, branches[k].b)}].push_back(k);
    std::vector<ReductionBranch> out;
    for (const auto& [ends, members] : groups) {
        if (members.size() == 1) {
            out.push_back(std::move(branches[members.front()]));
            continue;
        }
        step.changed = true;
        int nullators = 0;
        int norators = 0;
        std::vector<ResistanceExpression> terms;
        for (int k : members) {
            nullators += branches[k].type == Type::Nullator;
            norators += branches[k].type == Type::Norator;
            if (branches[k].type == Type::Resistance)
                terms.push_back(std::move(branches[k].resistance));
        }
        ReductionBranch merged;
        merged.a = ends.first;
        merged.b = ends.second;
        if (nullators > 0 && norators > 0) {
            // No voltage, any current: a short. What ran beside it is shorted.
            step.unresolved = step.unresolved || nullators > 1 || norators > 1;
            joins.join(ends.first, ends.second);
            continue;
        }
        if (nullators > 0 || norators > 0) {
            // Beside a nullator a resistor has no voltage, so no current;
            // beside a norator it changes nothing the norator does not.
            step.unresolved = step.unresolved || nullators > 1 || norators > 1;
            merged.type = nullators > 0 ? Type::Nullator : Type::Norator;
        } else {
            merged.resistance = ResistanceExpression::parallel(std::move(terms));
        }
        out.push_back(std::move(merged));
    }
    branches = std::move(out);
    return step;
}

ReductionBranch seriesOf(ReductionBranch first, ReductionBranch second, int a, int b, bool& open, bool& unresolved)
{
    ReductionBranch out;
    out.a = a;
    out.b = b;
    const Type x = first.type;
    const Type y = second.type;
    if (x == Type::Resistance && y == Type::Resistance) {
        // Not an initializer list: that would copy both subtrees.
        std::vector<ResistanceExpression> terms;
        terms.reserve(2);
        terms.push_back(std::move(first.resistance));
        terms.push_back(std::move(second.resistance));
        out.resistance = ResistanceExpression::series(std::move(terms));
    } else if (x == Type::Resistance || y == Type::Resistance) {
        // The ideal element fixes what the series pair does.
        out.type = x == Type::Resistance ? y : x;
    } else if (x != y) {
        // Nullator and norator in series: no current can flow, an open circuit.
        open = true;
    } else {
        unresolved = true;
        out.type = x;
    }
    return out;
}

// Series merges through every node of degree two, and dangling branches
// dropped, in one pass (a branch takes part in one merge per pass).
Step mergeSeries(std::vector<ReductionBranch>& branches, int nodes, int from, int to)
{
    Step step;
    std::vector<std::vector<int>> at(nodes);
    for (int k = 0; k < static_cast<int>(branches.size()); ++k) {
        at[branches[k].a].push_back(k);
        at[branches[k].b].push_back(k);
    }
    std::vector<bool> used(branches.size(), false);
    std::vector<ReductionBranch> merged;
    for (int m = 0; m < nodes; ++m) {
        if (m == from || m == to || at[m].empty() || at[m].size() > 2)
            continue;
        if (std::any_of(at[m].begin(), at[m].end(), [&](int k) { return used[k]; }))
            continue;
        step.changed = true;
        if (at[m].size() == 1) {
            step.unresolved = step.unresolved || pathological(branches[at[m][0]]);
            used[at[m][0]] = true;
            continue;
        }
        const int k1 = at[m][0];
        const int k2 = at[m][1];
        used[k1] = used[k2] = true;
        const int x = branches[k1].a == m ? branches[k1].b : branches[k1].a;
        const int y = branches[k2].a == m ? branches[k2].b : branches[k2].a;
        bool open = false;
        ReductionBranch joined = seriesOf(std::move(branches[k1]), std::move(branches[k2]), x, y, open, step.unresolved);
        if (!open)
            merged.push_back(std::move(joined));
    }
    if (!step.changed)
        return step;
    for (size_t k = 0; k < branches.size(); ++k)
        if (!used[k])
            merged.push_back(std::move(branches[k]));
    branches = std::move(merged);
    return step;
}

}  // namespace

std::optional<ResistanceExpression> reduceTwoTerminal(int nodes, std::vector<ReductionBranch> branches, int from, int to)
{
    NodeJoins joins(nodes);
    for (const auto& b : branches)
        if (b.type == Type::Short)
            joins.join(b.a, b.b);
    std::erase_if(branches, [](const ReductionBranch& b) { return b.type == Type::Short; });

    bool unresolved = false;
    while (true) {
        const int f = joins.find(from);
        const int t = joins.find(to);
        if (f == t)
            return ResistanceExpression::shorted();
        std::vector<ReductionBranch> current;
        for (auto& b : branches) {
            b.a = joins.find(b.a);
            b.b = joins.find(b.b);
            if (b.a != b.b)
                current.push_back(std::move(b));
            else
                unresolved = unresolved || pathological(b);  // a loop on one node carries nothing
        }
        // A nullator straight across the ends holds them at one voltage.
        for (const auto& b : current)
            if (b.type == Type::Nullator && ((b.a == f && b.b == t) || (b.a == t && b.b == f)))
                return ResistanceExpression::shorted();
        const std::vector<bool> keep = inTerminalBlock(nodes, current, f, t);
        branches.clear();
        for (size_t k = 0; k < current.size(); ++k) {
            // A nullator and norator cut off together constrain only their
            // own block; one left alone in the terminals' block stays below
            // and makes the answer "no form".
            if (keep[k])
                branches.push_back(std::move(current[k]));
        }
        if (branches.empty())
            return ResistanceExpression::open();

        const Step parallel = mergeParallel(branches, joins);
        unresolved = unresolved || parallel.unresolved;
        if (parallel.changed)
            continue;
        const Step series = mergeSeries(branches, nodes, f, t);
        unresolved = unresolved || series.unresolved;
        if (!series.changed)
            break;
    }
    if (unresolved || std::any_of(branches.begin(), branches.end(), pathological))
        return std::nullopt;
    if (branches.size() == 1)
        return std::move(branches.front().resistance);

    // A bridge: renumber the nodes left, branches in the order terms sort.
    std::sort(branches.begin(), branches.end(), [](const ReductionBranch& x, const ReductionBranch& y) {
        return partNameLess(x.resistance.firstPart(), y.resistance.firstPart());
    });
    std::map<int, int> renumber;
    auto index = [&](int node) { return renumber.emplace(node, static_cast<int>(renumber.size())).first->second; };
    const int f = index(joins.find(from));
    const int t = index(joins.find(to));
    std::vector<ResistanceExpression> terms;
    std::vector<ResistanceExpression::Branch> shape;
    for (auto& b : branches) {
        shape.push_back({index(b.a), index(b.b)});
        terms.push_back(std::move(b.resistance));
    }
    return ResistanceExpression::bridge(std::move(terms), std::move(shape), static_cast<int>(renumber.size()), f, t);
}

}  // namespace tauline
