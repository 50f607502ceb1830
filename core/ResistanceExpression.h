// A resistance written in part names, as a designer reduces it by hand:
// series sums and parallel combinations of resistors, e.g. R4 ∥ (R2 + R3).
// Where the network is not series–parallel (a bridge), the irreducible rest
// is kept as a small network whose branches are themselves expressions.
#pragma once

#include <functional>
#include <string>
#include <vector>

namespace tauline {

class ResistanceExpression {
public:
    enum class Kind {
        Part,      // one resistor
        Series,    // sum of two or more terms
        Parallel,  // parallel combination of two or more terms
        Bridge,    // a remainder no series or parallel step reduces further
        Short,     // 0 Ω: the two ends are joined
        Open       // ∞: no resistive path between the ends
    };
    // A branch of a bridge: between remainder nodes a and b, resistance
    // terms()[index of the branch].
    struct Branch {
        int a = 0;
        int b = 0;
    };

    static ResistanceExpression part(std::string name, double ohms);
    // Nested sums (or parallels) are flattened, terms put in a fixed order:
    // single parts first by name (R2 before R10), then compound terms.
    static ResistanceExpression series(std::vector<ResistanceExpression> terms);
    static ResistanceExpression parallel(std::vector<ResistanceExpression> terms);
    // The resistance between `from` and `to` of `nodes` nodes joined by
    // `branches`, branch k carrying terms[k].
    static ResistanceExpression bridge(std::vector<ResistanceExpression> terms, std::vector<Branch> branches,
                                       int nodes, int from, int to);
    static ResistanceExpression shorted();
    static ResistanceExpression open();

    Kind kind() const { return kind_; }
    const std::string& name() const { return name_; }  // Part only
    const std::vector<ResistanceExpression>& terms() const { return terms_; }
    const std::vector<Branch>& branches() const { return branches_; }

    // Ohms from the part values the expression was built with; +∞ for Open.
    double evaluate() const;
    // Ohms with other part values (e.g. a part being dragged).
    double evaluate(const std::function<double(const std::string&)>& ohmsOf) const;

    // "R4 ∥ (R2 + R3)"; "0" for Short, "∞" for Open; a bridge reads
    // "bridge(R1, R2 + R3, R4, R5, R6)", its branches' expressions.
    std::string text() const;
    // False when a bridge is left anywhere inside.
    bool seriesParallel() const;
    // Every part named, in the order text() shows them.
    std::vector<std::string> parts() const;
    // The first of them ("" for Short and Open), and how many there are.
    const std::string& firstPart() const { return first_; }
    int partCount() const { return count_; }

private:
    Kind kind_ = Kind::Open;
    std::string name_;
    double ohms_ = 0.0;
    std::vector<ResistanceExpression> terms_;
    std::vector<Branch> branches_;
    int nodes_ = 0;
    int from_ = 0;
    int to_ = 0;
    std::string first_;
    int count_ = 0;
    void summarise();
    static std::vector<ResistanceExpression> flattened(Kind kind, std::vector<ResistanceExpression> terms);
};

// "R2" < "R10" < "Ra": letters compared as text, digit runs as numbers.
bool partNameLess(const std::string& a, const std::string& b);

}  // namespace tauline
