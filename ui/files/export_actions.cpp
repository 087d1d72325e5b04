#include "ui/files/export_actions.h"

#include "core/file/atomic_file.h"
#include "core/results/results_csv.h"
#include "render/free_body_painter.h"
#include "render/review_report.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/free_body_view.h"
#include "ui/results/plot_stack.h"
#include "ui/shell/display_units.h"

#include <qcustomplot.h>
#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QInputDialog>
#include <QMainWindow>
#include <QMenu>
#include <QMessageBox>
#include <QProgressDialog>

#include <set>

namespace clevis::ui {

QStringList exportBodyDiagrams(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, bool atPeaks,
                               int step, const QString& directory, const QString& suffix, const RenderUnits& units,
                               const std::function<bool(int, int)>& progress, QString* error)
{
    std::set<std::pair<int, int>> jobs;  // (body, step)
    if (atPeaks)
        for (std::size_t j = 0; j < s.joints.size(); ++j)
            for (const int body : m.joints[j].body)
                if (body != kGround && s.joints[j].peak.step >= 0) jobs.insert({body, s.joints[j].peak.step});
    if (!atPeaks)
        for (std::size_t b = 0; b < m.bodies.size(); ++b) jobs.insert({int(b), step});
    QStringList written;
    int done = 0;
    for (const auto& [body, at] : jobs) {
        if (progress && !progress(done++, int(jobs.size()))) {
            if (error) *error = QObject::tr("export cancelled");
            return written;
        }
        const QString path = QDir(directory).filePath(
            QString("%1_step%2.%3").arg(QString::fromStdString(m.bodies[body].name)).arg(at).arg(suffix));
        const FreeBodyPainter figure(m, r, freeBodyDiagram(m, r, body, at), {units, false, true});
        if (!exportFigure(figure, path, QString::fromStdString("Free-body diagram: " + m.bodies[body].name), error))
            return written;
        written << path;
    }
    if (progress) progress(done, int(jobs.size()));
    return written;
}

ExportActions::ExportActions(QMainWindow* window, MechanismDocument* doc, AnalysisState* analysis,
                             FreeBodyView* diagram, PlotStack* plots)
    : QObject(window), window_(window), doc_(doc), analysis_(analysis), diagram_(diagram), plots_(plots)
{}

void ExportActions::fill(QMenu* menu)
{
    menu->addAction(tr("Free-body diagram…"), this, &ExportActions::exportDiagram);
    menu->addAction(tr("All bodies' free-body diagrams…"), this, &ExportActions::exportAllDiagrams);
    menu->addAction(tr("Plots…"), this, &ExportActions::exportPlots);
    menu->addAction(tr("Step data as CSV…"), this, &ExportActions::exportCsv);
    menu->addSeparator();
    menu->addAction(tr("Design-review report…"), this, &ExportActions::exportReport);
}

bool ExportActions::ready()
{
    if (analysis_->hasResult()) return true;
    failed(tr("There is no solved cycle to export. %1").arg(analysis_->errorText()));
    return false;
}

void ExportActions::failed(const QString& message) { QMessageBox::warning(window_, tr("Export"), message); }

void ExportActions::exportDiagram()
{
    if (!ready()) return;
    if (!diagram_->diagram()) return failed(tr("Select a moving body first: its diagram is what is exported."));
    const QString path = QFileDialog::getSaveFileName(window_, tr("Export free-body diagram"),
                                                      QString::fromStdString(diagram_->diagram()->bodyName) + ".svg",
                                                      tr("SVG drawing (*.svg);;PDF (*.pdf);;PNG image (*.png)"));
    if (path.isEmpty()) return;
    const FreeBodyPainter figure(analysis_->compiled(), analysis_->result(), *diagram_->diagram(),
                                 {renderUnits(DisplayUnits::instance()), diagram_->dAlembert(), true});
    QString error;
    if (!exportFigure(figure, path, QString::fromStdString("Free-body diagram: " + diagram_->diagram()->bodyName),
                      &error))
        failed(error);
}

void ExportActions::exportAllDiagrams()
{
    if (!ready()) return;
    bool ok = false;
    const QStringList where{tr("At the current position"), tr("At each joint's peak")};
    const QString choice =
        QInputDialog::getItem(window_, tr("Export all diagrams"), tr("Position:"), where, 0, false, &ok);
    if (!ok) return;
    const QString suffix =
        QInputDialog::getItem(window_, tr("Export all diagrams"), tr("Format:"), {"svg", "pdf", "png"}, 0, false, &ok);
    if (!ok) return;
    const QString dir = QFileDialog::getExistingDirectory(window_, tr("Folder for the diagrams"));
    if (dir.isEmpty()) return;
    QProgressDialog progress(tr("Drawing free-body diagrams…"), tr("Cancel"), 0, 1, window_);
    progress.setWindowModality(Qt::WindowModal);
    progress.setMinimumDuration(300);
    QString error;
    exportBodyDiagrams(
        analysis_->compiled(), analysis_->result(), analysis_->summary(), choice == where[1], analysis_->currentStep(),
        dir, suffix, renderUnits(DisplayUnits::instance()),
        [&](int done, int total) {
            progress.setMaximum(total);
            progress.setValue(done);
            return !progress.wasCanceled();
        },
        &error);
    if (!error.isEmpty()) failed(error);
}

void ExportActions::exportPlots()
{
    if (!ready()) return;
    const QString path =
        QFileDialog::getSaveFileName(window_, tr("Export plots"), "loads.png", tr("PNG image (*.png);;PDF (*.pdf)"));
    if (path.isEmpty()) return;
    QCustomPlot* plot = plots_->plot();
    const bool pdf = QFileInfo(path).suffix().compare("pdf", Qt::CaseInsensitive) == 0;
    const bool ok = pdf ? plot->savePdf(path) : plot->savePng(path, 0, 0, 2.0);
    if (!ok) failed(tr("%1: could not be written").arg(path));
}

void ExportActions::exportCsv()
{
    if (!ready()) return;
    const QString path = QFileDialog::getSaveFileName(window_, tr("Export step data"), "steps.csv", tr("CSV (*.csv)"));
    if (path.isEmpty()) return;
    try {
        // Written as it is made: a large machine's table is never held whole.
        writeFileAtomically(
            path.toStdString(),
            [&](const TextPieces& write) { writeResultsCsv(write, analysis_->compiled(), analysis_->result()); },
            false);
    } catch (const FileWriteError& e) {
        failed(QString::fromStdString(e.what()));
    }
}

void ExportActions::exportReport()
{
    if (!ready()) return;
    const QString path =
        QFileDialog::getSaveFileName(window_, tr("Design-review report"), "review.pdf", tr("PDF (*.pdf)"));
    if (path.isEmpty()) return;
    QProgressDialog progress(tr("Writing the design-review report…"), tr("Cancel"), 0, 1, window_);
    progress.setWindowModality(Qt::WindowModal);
    progress.setMinimumDuration(300);
    const QString source =
        doc_->filePath().isEmpty() ? tr("unsaved mechanism") : QFileInfo(doc_->filePath()).fileName();
    // The document is the solved mechanism unless an edit is being solved.
    const ReviewReportInput in{analysis_->compiled(),
                               analysis_->result(),
                               analysis_->summary(),
                               source,
                               renderUnits(DisplayUnits::instance()),
                               analysis_->busy() ? nullptr : &doc_->mechanism(),
                               analysis_->found() ? &*analysis_->found() : nullptr};
    QString error;
    const bool ok = writeReviewReport(in, path, &error, [&](int done, int total) {
        progress.setMaximum(total);
        progress.setValue(done);
        return !progress.wasCanceled();
    });
    if (!ok) failed(error);
}

}  // namespace clevis::ui
