#include "ResistanceExpression.h"

#include <Eigen/Dense>

#include <algorithm>
#include <iterator>
#include <cctype>
#include <limits>

namespace tauline {

namespace {

using Kind = ResistanceExpression::Kind;

bool compound(const ResistanceExpression& e)
{
    return e.kind() == Kind::Series || e.kind() == Kind::Parallel || e.kind() == Kind::Bridge;
}

// Single parts first, by name; compound terms after, by their first part.
bool termLess(const ResistanceExpression& x, const ResistanceExpression& y)
{
    if (compound(x) != compound(y))
        return !compound(x);
    if (x.partCount() == 0 || y.partCount() == 0)
        return x.partCount() < y.partCount();
    if (x.firstPart() != y.firstPart())
        return partNameLess(x.firstPart(), y.firstPart());
    return x.partCount() < y.partCount();
}

// The two-terminal resistance of a small network by nodal analysis: `to`
// as the reference, one ampere into `from`.
double bridgeOhms(const std::vector<double>& ohms, const std::vector<ResistanceExpression::Branch>& branches,
                  int nodes, int from, int to)
{
    std::vector<int> index(nodes, -1);
    int unknowns = 0;
    for (int k = 0; k < nodes; ++k)
        if (k != to)
            index[k] = unknowns++;
    Eigen::MatrixXd g = Eigen::MatrixXd::Zero(unknowns, unknowns);
    for (size_t k = 0; k < branches.size(); ++k) {
        const double y = 1.0 / ohms[k];
        const int a = index[branches[k].a];
        const int b = index[branches[k].b];
        if (a >= 0) g(a, a) += y;
        if (b >= 0) g(b, b) += y;
        if (a >= 0 && b >= 0) {
            g(a, b) -= y;
            g(b, a) -= y;
        }
    }
    Eigen::VectorXd rhs = Eigen::VectorXd::Zero(unknowns);
    rhs(index[from]) = 1.0;
    return g.fullPivLu().solve(rhs)(index[from]);
}

}  // namespace

bool partNameLess(const std::string& a, const std::string& b)
{
    size_t i = 0;
    size_t j = 0;
    while (i < a.size() && j < b.size()) {
        const bool da = std::isdigit(static_cast<unsigned char>(a[i])) != 0;
        const bool db = std::isdigit(static_cast<unsigned char>(b[j])) != 0;
        if (da && db) {
            size_t ei = i;
            size_t ej = j;
            while (ei < a.size() && std::isdigit(static_cast<unsigned char>(a[ei])))
                ++ei;
            while (ej < b.size() && std::isdigit(static_cast<unsigned char>(b[ej])))
                ++ej;
            // Compare digit runs as numbers: longer (without leading zeros) is larger.
            std::string ra = a.substr(i, ei - i);
            std::string rb = b.substr(j, ej - j);
            ra.erase(0, std::min(ra.find_first_not_of('0'), ra.size() - 1));
            rb.erase(0, std::min(rb.find_first_not_of('0'), rb.size() - 1));
            if (ra.size() != rb.size())
                return ra.size() < rb.size();
            if (ra != rb)
                return ra < rb;
            i = ei;
            j = ej;
        } else {
            if (a[i] != b[j])
                return a[i] < b[j];
            ++i;
            ++j;
        }
    }
    if ((a.size() - i) != (b.size() - j))
        return (a.size() - i) < (b.size() - j);
    return a < b;
}

std::vector<ResistanceExpression> ResistanceExpression::flattened(Kind kind, std::vector<ResistanceExpression> terms)
{
    std::vector<ResistanceExpression> out;
    for (auto& t : terms) {
        if (t.kind_ == kind)
            std::move(t.terms_.begin(), t.terms_.end(), std::back_inserter(out));
        else
            out.push_back(std::move(t));
    }
    std::stable_sort(out.begin(), out.end(), termLess);
    return out;
}

ResistanceExpression ResistanceExpression::part(std::string name, double ohms)
{
    ResistanceExpression e;
    e.kind_ = Kind::Part;
    e.name_ = std::move(name);
    e.ohms_ = ohms;
    e.summarise();
    return e;
}

ResistanceExpression ResistanceExpression::series(std::vector<ResistanceExpression> terms)
{
    if (terms.size() == 1)
        return std::move(terms.front());
    ResistanceExpression e;
    e.kind_ = Kind::Series;
    e.terms_ = flattened(Kind::Series, std::move(terms));
    e.summarise();
    return e;
}

ResistanceExpression ResistanceExpression::parallel(std::vector<ResistanceExpression> terms)
{
    if (terms.size() == 1)
        return std::move(terms.front());
    ResistanceExpression e;
    e.kind_ = Kind::Parallel;
    e.terms_ = flattened(Kind::Parallel, std::move(terms));
    e.summarise();
    return e;
}

ResistanceExpression ResistanceExpression::bridge(std::vector<ResistanceExpression> terms, std::vector<Branch> branches,
                                                  int nodes, int from, int to)
{
    ResistanceExpression e;
    e.kind_ = Kind::Bridge;
    e.terms_ = std::move(terms);
    e.branches_ = std::move(branches);
    e.nodes_ = nodes;
    e.from_ = from;
    e.to_ = to;
    e.summarise();
    return e;
}

void ResistanceExpression::summarise()
{
    if (kind_ == Kind::Part) {
        first_ = name_;
        count_ = 1;
        return;
    }
    first_.clear();
    count_ = 0;
    for (const auto& t : terms_) {
        if (first_.empty())
            first_ = t.firstPart();
        count_ += t.partCount();
    }
}

ResistanceExpression ResistanceExpression::shorted()
{
    ResistanceExpression e;
    e.kind_ = Kind::Short;
    return e;
}

ResistanceExpression ResistanceExpression::open()
{
    return ResistanceExpression();
}

double ResistanceExpression::evaluate() const
{
    return evaluate([](const std::string&) { return std::numeric_limits<double>::quiet_NaN(); });
}

double ResistanceExpression::evaluate(const std::function<double(const std::string&)>& ohmsOf) const
{
    switch (kind_) {
    case Kind::Part: {
        const double v = ohmsOf(name_);
        return v == v ? v : ohms_;  // NaN: keep the value it was built with
    }
    case Kind::Series: {
        double sum = 0.0;
        for (const auto& t : terms_)
            sum += t.evaluate(ohmsOf);
        return sum;
    }
    case Kind::Parallel: {
        double conductance = 0.0;
        for (const auto& t : terms_)
            conductance += 1.0 / t.evaluate(ohmsOf);
        return 1.0 / conductance;
    }
    case Kind::Bridge: {
        std::vector<double> ohms;
        for (const auto& t : terms_)
            ohms.push_back(t.evaluate(ohmsOf));
        return bridgeOhms(ohms, branches_, nodes_, from_, to_);
    }
    case Kind::Short: return 0.0;
    case Kind::Open: return std::numeric_limits<double>::infinity();
    }
    return 0.0;
}

std::string ResistanceExpression::text() const
{
    auto inner = [](const ResistanceExpression& t) {
        std::string out = t.text();
        if (t.kind() == Kind::Series || t.kind() == Kind::Parallel)
            out.insert(out.begin(), '(');
        if (t.kind() == Kind::Series || t.kind() == Kind::Parallel)
            out.push_back(')');
        return out;
    };
    switch (kind_) {
    case Kind::Part: return name_;
    case Kind::Series:
    case Kind::Parallel: {
        const char* op = kind_ == Kind::Series ? " + " : " \u2225 ";
        std::string out;
        for (size_t k = 0; k < terms_.size(); ++k)
            out += (k ? op : "") + inner(terms_[k]);
        return out;
    }
    case Kind::Bridge: {
        std::string out = "bridge(";
        for (size_t k = 0; k < terms_.size(); ++k)
            out += (k ? ", " : "") + terms_[k].text();
        return out + ")";
    }
    case Kind::Short: return "0";
    case Kind::Open: return "\u221E";
    }
    return "";
}

bool ResistanceExpression::seriesParallel() const
{
    if (kind_ == Kind::Bridge)
        return false;
    return std::all_of(terms_.begin(), terms_.end(), [](const auto& t) { return t.seriesParallel(); });
}

std::vector<std::string> ResistanceExpression::parts() const
{
    if (kind_ == Kind::Part)
        return {name_};
    std::vector<std::string> out;
    for (const auto& t : terms_) {
        const auto sub = t.parts();
        out.insert(out.end(), sub.begin(), sub.end());
    }
    return out;
}

}  // namespace tauline
