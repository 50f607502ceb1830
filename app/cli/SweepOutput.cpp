#include "SweepOutput.h"

#include "HazardCaution.h"
#include "TextTable.h"
#include "ValueParser.h"

#include <nlohmann/json.hpp>

#include <cmath>
#include <cstdio>

namespace tauline::cli {

namespace {

void writeJson(std::ostream& out, const std::vector<SweepPoint>& points)
{
    nlohmann::ordered_json array = nlohmann::ordered_json::array();
    for (const auto& p : points)
        array.push_back({{"hz", p.hz}, {"re", p.value.real()}, {"im", p.value.imag()}, {"db", p.db}, {"deg", p.deg}});
    out << array.dump(2) << '\n';
}

void writeCsv(std::ostream& out, const std::vector<SweepPoint>& points)
{
    out << "hz,re,im,db,deg\n";
    for (const auto& p : points)
        out << exactNumber(p.hz) << ',' << exactNumber(p.value.real()) << ',' << exactNumber(p.value.imag()) << ','
            << exactNumber(p.db) << ',' << exactNumber(p.deg) << '\n';
}

void writeTable(std::ostream& out, const AnalysedFile& file, const std::vector<SweepPoint>& points)
{
    const Analysis& a = file.analysis;
    const bool impedance = a.kind != ResponseKind::VoltageGain;
    if (!file.loaded.network.title.empty())
        out << file.loaded.network.title << '\n';
    out << "File: " << file.path << "  (" << responseKindName(a.kind) << ", " << unitSymbol(a.kind) << ")\n";
    TextTable table({"frequency", "magnitude", impedance ? "dB\u03A9" : "dB", "phase \u00B0"});
    for (const auto& p : points)
        table.addRow({formatQuantity(p.hz, "Hz", 4), formatQuantity(std::abs(p.value), unitSymbol(a.kind), 4),
                      fixedPoint(p.db, 2), fixedPoint(p.deg, 2)});
    table.print(out);
    for (const auto& w : file.warnings())
        out << "Warning: " << w << '\n';
    if (file.needsCaution())
        out << "Caution: " << hazardCautionText() << '\n';
}

}  // namespace

void writeSweep(std::ostream& out, const AnalysedFile& file, const std::vector<SweepPoint>& points, SweepFormat format)
{
    switch (format) {
    case SweepFormat::Json: writeJson(out, points); break;
    case SweepFormat::Csv: writeCsv(out, points); break;
    case SweepFormat::Table: writeTable(out, file, points); break;
    }
}

}  // namespace tauline::cli
