#pragma once

#include <Eigen/Dense>
#include <complex>

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

    explicit EquilibratedLu(const Matrix& a) : a_(a)
    {
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
        using Extended = std::conditional_t<Eigen::NumTraits<Scalar>::IsComplex, std::complex<long double>, long double>;
        using ExtendedMatrix = Eigen::Matrix<Extended, Eigen::Dynamic, Eigen::Dynamic>;
        auto once = [&](const Matrix& b) -> Matrix {
            return colScale_.asDiagonal() * lu_.solve(rowScale_.asDiagonal() * b);
        };
        Matrix x = once(rhs);
        if (refinements == 0)
            return x;
        const ExtendedMatrix aExt = a_.template cast<Extended>();
        for (int step = 0; step < refinements; ++step) {
            const ExtendedMatrix residual = rhs.template cast<Extended>() - aExt * x.template cast<Extended>();
            x += once(residual.template cast<Scalar>());
        }
        return x;
    }

private:
    Matrix a_;
    Eigen::VectorXd rowScale_;
    Eigen::VectorXd colScale_;
    Eigen::PartialPivLU<Matrix> lu_;
    bool finiteScales_ = true;
};

}  // namespace tauline
