// The rank, dependent rows and null space found by rowDependence, checked
// against sympy's exact arithmetic (tests/sympy_row_dependence.py) on
// integer matrices with dependencies planted in them: rows that are sums of
// others, repeated rows, zero rows and columns no row holds.
#include "core/solver/row_dependence.h"
#include "tests/python_check.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <random>

using namespace clevis;

namespace {

struct Case {
    std::vector<std::vector<int>> rows;
    int leading = 0;
};

// Rows with a few small entries near the diagonal, then some replaced by
// integer combinations of others, some zeroed, one column left empty; the
// rows shuffled so that the band order has work to do.
Case plantedCase(std::mt19937& random, int columns, int rows)
{
    const auto uniform = [&](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(random); };
    Case c;
    c.rows.assign(rows, std::vector<int>(columns, 0));
    const int empty = uniform(0, columns - 1);
    for (int r = 0; r < rows; ++r) {
        const int centre = r * columns / rows;
        for (int k = uniform(1, 4); k-- > 0;) {
            const int col = std::clamp(centre + uniform(-2, 2), 0, columns - 1);
            if (col != empty || columns == 1) c.rows[r][col] = uniform(-3, 3);
        }
    }
    for (int planted = uniform(0, 1 + rows / 6); planted-- > 0;) {
        const int target = uniform(0, rows - 1);
        std::vector<int> sum(columns, 0);
        for (int k = uniform(1, 3); k-- > 0;) {
            const int source = uniform(0, rows - 1), factor = uniform(1, 2) * (uniform(0, 1) ? 1 : -1);
            if (source == target) continue;
            for (int col = 0; col < columns; ++col) sum[col] += factor * c.rows[source][col];
        }
        c.rows[target] = sum;
    }
    if (uniform(0, 3) == 0) c.rows[uniform(0, rows - 1)].assign(columns, 0);
    std::shuffle(c.rows.begin(), c.rows.end(), random);
    c.leading = uniform(0, rows);
    return c;
}

std::vector<Eigen::Triplet<double>> entriesOf(const Case& c)
{
    std::vector<Eigen::Triplet<double>> entries;
    for (std::size_t r = 0; r < c.rows.size(); ++r)
        for (std::size_t col = 0; col < c.rows[r].size(); ++col)
            if (c.rows[r][col] != 0) entries.emplace_back(int(r), int(col), double(c.rows[r][col]));
    // A repeated entry is summed: split one in two.
    if (!entries.empty()) {
        const Eigen::Triplet<double> e = entries.front();
        entries.front() = {e.row(), e.col(), 0.25 * e.value()};
        entries.emplace_back(e.row(), e.col(), 0.75 * e.value());
    }
    return entries;
}

TEST(RowDependence, AgreesWithExactArithmetic)
{
    std::mt19937 random(20261202);
    std::vector<Case> cases;
    std::vector<RowDependence> found;
    nlohmann::json input;
    for (const int columns : {1, 3, 6, 12, 30})
        for (const int extra : {-3, -1, 0, 0, 1, 4})
            for (int repeat = 0; repeat < 3; ++repeat) {
                const int rows = std::max(1, columns + extra);
                cases.push_back(plantedCase(random, columns, rows));
                const Case& c = cases.back();
                found.push_back(rowDependence(rows, columns, entriesOf(c), c.leading));
                nlohmann::json dependent = nlohmann::json::array();
                for (const DependentRow& d : found.back().dependent)
                    dependent.push_back({{"row", d.row}, {"repeats", d.repeats}});
                input["cases"].push_back({{"rows", c.rows}, {"leading", c.leading}, {"dependent", dependent}});
            }
    const nlohmann::json exact = test::runPythonCheck(CLEVIS_SYMPY_ROW_DEPENDENCE, input);
    ASSERT_EQ(exact.size(), cases.size());
    int dependentRows = 0;
    for (std::size_t i = 0; i < cases.size(); ++i) {
        const Case& c = cases[i];
        const RowDependence& d = found[i];
        SCOPED_TRACE("case " + std::to_string(i) + ": " + nlohmann::json(c.rows).dump());
        EXPECT_EQ(d.rank, exact[i]["rank"].get<int>());
        EXPECT_EQ(d.leadingRank, exact[i]["leading_rank"].get<int>());
        EXPECT_EQ(std::vector<int>(d.nullSpaceReaches.begin(), d.nullSpaceReaches.end()),
                  exact[i]["reach"].get<std::vector<int>>());
        ASSERT_EQ(d.dependent.size(), c.rows.size() - std::size_t(d.rank));
        int leadingDependent = 0;
        for (std::size_t k = 0; k < d.dependent.size(); ++k) {
            EXPECT_TRUE(exact[i]["circuits"][k].get<bool>()) << "row " << d.dependent[k].row;
            if (d.dependent[k].row >= c.leading) continue;
            ++leadingDependent;
            for (const int row : d.dependent[k].repeats) EXPECT_LT(row, c.leading) << "row " << d.dependent[k].row;
        }
        EXPECT_EQ(leadingDependent, std::min<int>(c.leading, int(c.rows.size())) - d.leadingRank);
        dependentRows += int(d.dependent.size());
    }
    EXPECT_GT(dependentRows, int(cases.size()));  // the planted dependencies are there to be found
}

}  // namespace
