#pragma once

#include <Eigen/Dense>
#include <complex>
#include <type_traits>
#include <utility>
#include <vector>

namespace tauline {

// LU of a row- and column-scaled nodal matrix, with refinement. Conductances,
// susceptances and source stamps differ by many decades: scaling first makes
// the singularity test (reciprocal condition estimate) mean something, and
// refining with the residual in extended precision recovers the digits plain
// elimination loses to that spread.
template <typename Scalar>
class EquilibratedLu {
public:
    using Matrix = Eigen::Matrix<Scalar, Eigen::Dynamic, Eigen::Dynamic>;
    using Extended = std::conditional_t<Eigen::NumTraits<Scalar>::IsComplex, std::complex<long double>, long double>;
    using ExtendedMatrix = Eigen::Matrix<Extended, Eigen::Dynamic, Eigen::Dynamic>;

    explicit EquilibratedLu(const Matrix& a) : EquilibratedLu(a, a.template cast<Extended>()) {}

    // `exact` is the same matrix formed in extended precision (its entries
    // summed there from the part values): the refinement then converges to
    // its solution, not to that of `a`, whose rounded sums break the
    // relations (a dead-end branch carrying no current, a floating piece)
    // that near-cancelling responses rest on.
    EquilibratedLu(const Matrix& a, ExtendedMatrix exact) : aExt_(std::move(exact))
    {
        collectEntries();
        rowScale_ = a.cwiseAbs().rowwise().maxCoeff().cwiseInverse();
        const Matrix rowScaled = rowScale_.asDiagonal() * a;
        colScale_ = rowScaled.cwiseAbs().colwise().maxCoeff().transpose().cwiseInverse();
        // An all-zero row or column is singular outright.
        finiteScales_ = rowScale_.allFinite() && colScale_.allFinite();
        if (finiteScales_)
            lu_.compute(rowScaled * colScale_.asDiagonal());
    }

    bool regular() const { return reciprocalCondition() > 1e-13; }
    // Of the scaled matrix; 0 when a row or column is all zero or a pivot is
    // exactly zero (Eigen's estimate is meaningless then).
    double reciprocalCondition() const
    {
        if (!finiteScales_ || (lu_.matrixLU().diagonal().array().abs() == 0.0).any())
            return 0.0;
        return lu_.rcond();
    }

    // `refinements` extended-precision correction steps: two for a response
    // value that must hold to rounding; fewer where many right-hand sides
    // feed an eigenproblem (each step costs a long-double product).
    Matrix solve(const Matrix& rhs, int refinements = 2) const
    {
        auto once = [&](const Matrix& b) -> Matrix {
            return colScale_.asDiagonal() * lu_.solve(rowScale_.asDiagonal() * b);
        };
        Matrix x = once(rhs);
        if (refinements == 0)
            return x;
        // A column's corrections must shrink, or they stop: where the
        // matrix is too ill-conditioned for the double factors to reach the
        // extended matrix's solution, x stays the double one.
        Eigen::VectorXd previous = x.colwise().norm().transpose();
        std::vector<bool> converging(x.cols(), true);
        for (int step = 0; step < refinements; ++step) {
            const ExtendedMatrix residual = this->residual(rhs, x);
            const Matrix correction = once(residual.template cast<Scalar>());
            for (int j = 0; j < x.cols(); ++j) {
                const double size = correction.col(j).norm();
                if (!converging[j] || !(size <= 0.5 * previous(j))) {
                    converging[j] = false;
                    continue;
                }
                x.col(j) += correction.col(j);
                previous(j) = size;
            }
        }
        return x;
    }

    // Aᵀ·y = rhs with the same factors, unrefined: for the left vectors of
    // a root's two-sided Rayleigh quotient, which needs a direction only.
    Matrix solveTransposed(const Matrix& rhs) const
    {
        const Matrix scaled = colScale_.asDiagonal() * rhs;
        Matrix y = lu_.transpose().solve(scaled);
        return rowScale_.asDiagonal() * y;
    }

    // The matrix in extended precision, as given.
    const ExtendedMatrix& extended() const { return aExt_; }

    // The residual rhs − A·x in extended precision, for callers that keep
    // the last correction apart from x.
    ExtendedMatrix residual(const Matrix& rhs, const Matrix& x) const
    {
        if (!sparse_)
            return rhs.template cast<Extended>() - aExt_ * x.template cast<Extended>();
        // A nodal matrix has a few entries per row: a dense long-double
        // product (no vector unit for it) would spend n² per column on
        // zeros.
        ExtendedMatrix out = rhs.template cast<Extended>();
        for (const Entry& e : entries_)
            for (Eigen::Index j = 0; j < x.cols(); ++j)
                out(e.row, j) -= e.value * Extended(x(e.col, j));
        return out;
    }

private:
    struct Entry {
        Eigen::Index row;
        Eigen::Index col;
        Extended value;
    };

    // The non-zero entries, where they are few enough to pay.
    void collectEntries()
    {
        const Eigen::Index n = aExt_.rows() * aExt_.cols();
        std::vector<Entry> entries;
        for (Eigen::Index j = 0; j < aExt_.cols(); ++j)
            for (Eigen::Index i = 0; i < aExt_.rows(); ++i)
                if (aExt_(i, j) != Extended(0))
                    entries.push_back({i, j, aExt_(i, j)});
        sparse_ = static_cast<Eigen::Index>(entries.size()) * 4 < n;
        if (sparse_)
            entries_ = std::move(entries);
    }

    ExtendedMatrix aExt_;
    std::vector<Entry> entries_;
    bool sparse_ = false;
    Eigen::VectorXd rowScale_;
    Eigen::VectorXd colScale_;
    Eigen::PartialPivLU<Matrix> lu_;
    bool finiteScales_ = true;
};

}  // namespace tauline
