// Interruption and resume (DESIGN.md §5): SIGINT and SIGTERM stop a run within 2 s wherever
// it is (inside a Newton step included), with exit 3 and a readable file; --resume then
// takes the path the uninterrupted run took (RestartPoint.hpp) and gives its answer. A
// SIGKILL at any moment, during a checkpoint write included, leaves no file or a readable
// one, and nothing that a later run trusts. The moments are random; the seed is printed
// (and taken from COLDTIP_TEST_SEED if set) so that a failure can be replayed.
#include <catch2/catch.hpp>

#include <chrono>
#include <cmath>
#include <csignal>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fmt/format.h>
#include <fstream>
#include <random>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

#include "solver/output/Hdf5File.hpp"
#include "solver/output/OutputFile.hpp"
#include "tests/solver/CliSupport.hpp"

using namespace coldtip;
using namespace coldtip::testing;
using Clock = std::chrono::steady_clock;

namespace {

//! Start `coldtip run case -o out --quiet [extra]`; returns the child's pid.
pid_t startRun(const std::string& case_file, const std::string& out,
               const std::vector<std::string>& extra = {})
{
    const pid_t pid = fork();
    if (pid == 0) {
        const std::string exe = COLDTIP_EXE;
        std::vector<std::string> args = {exe, "run", case_file, "-o", out, "--quiet"};
        args.insert(args.end(), extra.begin(), extra.end());
        std::vector<char*> argv;
        for (auto& a : args) argv.push_back(a.data());
        argv.push_back(nullptr);
        std::freopen("/dev/null", "w", stderr);
        execv(exe.c_str(), argv.data());
        _exit(127);
    }
    return pid;
}

int exitCode(pid_t pid)
{
    int status = 0;
    waitpid(pid, &status, 0);
    return WIFEXITED(status) ? WEXITSTATUS(status) : -1;
}

std::uint64_t seed()
{
    if (const char* s = std::getenv("COLDTIP_TEST_SEED")) return std::strtoull(s, nullptr, 10);
    return std::random_device{}();
}

//! What is compared between a resumed and an uninterrupted run.
struct Answer {
    double cooling_power = 0.0;
    std::vector<double> solid_temperature;
    std::string status;
};

Answer answerOf(const std::string& path)
{
    Hdf5Reader r(path);
    return {r.doubleAttribute("/summary", "cooling_power_W"),
            r.doubles("/profile/solids/mean_temperature"), r.stringAttribute("/summary", "status")};
}

double largestDifference(const std::vector<double>& a, const std::vector<double>& b)
{
    double d = a.size() == b.size() ? 0.0 : HUGE_VAL;
    for (std::size_t i = 0; i < std::min(a.size(), b.size()); ++i) d = std::max(d, std::abs(a[i] - b[i]));
    return d;
}

//! The steady-state tolerance of the small regenerator's case (SteadyOptions default).
constexpr double kTemperatureTolerance = 0.05; // [K]

const std::string kSmallCase = COLDTIP_TEST_DATA "/steady/small-regenerator.yaml";

//! The uninterrupted run and its wall time.
std::pair<Answer, double> reference(const TempFolder& folder)
{
    const auto t0 = Clock::now();
    const ProcessResult p = runColdtip(folder, fmt::format("run {} -o {} --quiet",
                                                           shellQuoted(kSmallCase),
                                                           shellQuoted(folder.file("ref.h5"))));
    REQUIRE(p.exit_code == 0);
    return {answerOf(folder.file("ref.h5")),
            std::chrono::duration<double>(Clock::now() - t0).count()};
}

//! `--resume` from `out` finishes with the uninterrupted run's answer.
void resumeToTheSameAnswer(const TempFolder& folder, const std::string& out, const Answer& ref)
{
    const ProcessResult p = runColdtip(
        folder, fmt::format("run {} -o {} --resume --quiet", shellQuoted(kSmallCase), shellQuoted(out)));
    INFO(p.err);
    CHECK(p.exit_code == 0);
    const Answer resumed = answerOf(out);
    CHECK(resumed.status == "converged");
    CHECK(largestDifference(resumed.solid_temperature, ref.solid_temperature) <= kTemperatureTolerance);
    CHECK(std::abs(resumed.cooling_power - ref.cooling_power) <= 1e-3 * std::abs(ref.cooling_power));
    // The accelerated solver resumes at a restart point of its own path: bit-identical.
    CHECK(resumed.cooling_power == ref.cooling_power);
    CHECK(resumed.solid_temperature == ref.solid_temperature);
}

//! Random moments within a run of `run_seconds` (seeded; the seed is printed on failure).
struct Moments {
    explicit Moments(double run_seconds) : run_seconds(run_seconds) {}
    double next() { return std::uniform_real_distribution<double>(0.05 * run_seconds, 0.9 * run_seconds)(random); }
    double run_seconds;
    std::uint64_t seed_value = seed();
    std::mt19937_64 random{seed_value};
};

struct Cut {
    int exit_code = -1;
    double seconds_to_exit = 0.0;
};

//! Run the small case into `out` and send `signal` at the next random moment.
Cut cutRun(const std::string& out, int signal, Moments& moments, int trial,
           const std::vector<std::string>& extra = {})
{
    const double at = moments.next();
    // Always printed: a failure further on is replayed with the same seed.
    fmt::print(stderr, "CliInterruptTest: seed {} (COLDTIP_TEST_SEED), trial {}: signal {} at "
                       "{:.2f} s of {:.2f} s\n",
               moments.seed_value, trial, signal, at, moments.run_seconds);
    const pid_t pid = startRun(kSmallCase, out, extra);
    std::this_thread::sleep_for(std::chrono::duration<double>(at));
    const auto sent = Clock::now();
    kill(pid, signal);
    Cut cut;
    cut.exit_code = exitCode(pid);
    cut.seconds_to_exit = std::chrono::duration<double>(Clock::now() - sent).count();
    return cut;
}

} // namespace

TEST_CASE("an interrupted plain run exits 3 with a readable file that --resume continues",
          "[cli][interrupt]")
{
    // Plain integration of the small regenerator takes thousands of cycles: long enough to
    // be interrupted after a second.
    TempFolder folder;
    const std::string plain = folder.file("interrupt-test-case.yaml");
    {
        std::ifstream in(kSmallCase);
        std::ofstream outfile(plain);
        std::string line;
        while (std::getline(in, line)) {
            if (line.find("steady:") != std::string::npos)
                line = "  steady: {method: plain, max_cycles: 20000}";
            outfile << line << "\n";
        }
    }
    const std::string out = folder.file("interrupt-test.h5");
    const pid_t pid = startRun(plain, out);
    std::this_thread::sleep_for(std::chrono::milliseconds(1500));
    kill(pid, SIGINT);
    CHECK(exitCode(pid) == 3);
    long cycles = 0;
    {
        Hdf5Reader r(out);
        CHECK(r.stringAttribute("/summary", "status") == "interrupted");
        cycles = r.longAttribute("/state", "cycles");
        CHECK(cycles > 0);
        CHECK(r.doubles("/state/y").size() > 0);
    }
    // The state belongs to its case: resuming it with another case (here the same network
    // solved by the accelerated method) is refused, and the file is left as it was.
    const ProcessResult other = runColdtip(folder, fmt::format("run {} -o {} --resume --quiet",
                                                               shellQuoted(kSmallCase), shellQuoted(out)));
    INFO(other.err);
    CHECK(other.exit_code == 1);
    CHECK(other.err.find("another case") != std::string::npos);
    CHECK(other.err.find(out) != std::string::npos);
    CHECK(Hdf5Reader(out).stringAttribute("/summary", "status") == "interrupted");
    // Its own case continues from the saved state to the periodic steady state, counting
    // cycles and wall time over the whole run.
    const ProcessResult resumed = runColdtip(folder, fmt::format("run {} -o {} --resume --quiet",
                                                                 shellQuoted(plain), shellQuoted(out)));
    INFO(resumed.err);
    CHECK(resumed.exit_code == 0);
    Hdf5Reader r(out);
    CHECK(r.stringAttribute("/summary", "status") == "converged");
    CHECK(r.longAttribute("/state", "period_index") > cycles);
    const std::vector<double> wall = r.doubles("/history/wall_time");
    const std::vector<double> cycle = r.doubles("/history/cycle");
    CHECK(cycle.back() == double(cycle.size()));
    CHECK(std::is_sorted(wall.begin(), wall.end()));
    CHECK(r.doubleAttribute("/summary", "wall_time_s") >= wall.back());
}

TEST_CASE("a resume of a missing file says it starts afresh", "[cli][interrupt]")
{
    TempFolder folder;
    const std::string out = folder.file("missing.h5");
    const ProcessResult p = runColdtip(folder, fmt::format("run {} -o {} --resume --max-cycles 1",
                                                           shellQuoted(kSmallCase), shellQuoted(out)));
    CHECK(p.err.find(out + " does not exist") != std::string::npos);
    CHECK(p.err.find("starting from the initial state") != std::string::npos);
}

TEST_CASE("a resume of a converged result leaves it as it is", "[cli][interrupt]")
{
    // Solving again from its last cycle would start a new path and give another answer.
    TempFolder folder;
    const std::string out = folder.file("done.h5");
    REQUIRE(reference(folder).first.status == "converged");
    std::filesystem::copy_file(folder.file("ref.h5"), out);
    const std::string before = readText(out);
    const ProcessResult p = runColdtip(folder, fmt::format("run {} -o {} --resume",
                                                           shellQuoted(kSmallCase), shellQuoted(out)));
    INFO(p.err);
    CHECK(p.exit_code == 0);
    CHECK(p.err.find("converged already") != std::string::npos);
    CHECK(readText(out) == before);
}

TEST_CASE("a resume refuses a file of another network with exit 1", "[cli][interrupt]")
{
    TempFolder folder;
    const std::string out = folder.file("other.h5");
    REQUIRE(runColdtip(folder, fmt::format("run {} -o {} --max-cycles 1 --quiet",
                                           shellQuoted(COLDTIP_TEST_DATA "/steady/small-orifice-tube.yaml"),
                                           shellQuoted(out)))
                .exit_code == 2);
    const ProcessResult p = runColdtip(folder, fmt::format("run {} -o {} --resume --quiet",
                                                           shellQuoted(kSmallCase), shellQuoted(out)));
    INFO(p.err);
    CHECK(p.exit_code == 1);
    CHECK(p.err.find("cannot resume") != std::string::npos);
}

TEST_CASE("SIGINT and SIGTERM at random moments stop within 2 s, and --resume gives the "
          "uninterrupted answer",
          "[cli][interrupt]")
{
    TempFolder folder;
    const auto [ref, ref_seconds] = reference(folder);
    // Moments spread over the run: the warm-up, the Newton steps (inside GMRES products
    // most of the time), the settle maps.
    Moments moments(ref_seconds);
    for (int trial = 0; trial < 4; ++trial) {
        const int signal = trial % 2 ? SIGTERM : SIGINT;
        const std::string out = folder.file(fmt::format("cut{}.h5", trial));
        const Cut cut = cutRun(out, signal, moments, trial);
        if (cut.exit_code == 0) continue; // finished before the signal (a slow reference run)
        CHECK(cut.exit_code == 3);
        CHECK(cut.seconds_to_exit < 2.0);
        REQUIRE(isColdtipFile(out));
        CHECK(answerOf(out).status == "interrupted");
        resumeToTheSameAnswer(folder, out, ref);
    }
}

TEST_CASE("SIGKILL at random moments leaves no file or a readable one, and nothing a later "
          "run trusts",
          "[cli][interrupt]")
{
    TempFolder folder;
    const auto [ref, ref_seconds] = reference(folder);
    Moments moments(ref_seconds);
    for (int trial = 0; trial < 3; ++trial) {
        const std::string out = folder.file(fmt::format("killed{}.h5", trial));
        // A checkpoint after every cycle: most kills land in or near a checkpoint write.
        const Cut cut = cutRun(out, SIGKILL, moments, trial, {"--checkpoint-every", "0"});
        if (cut.exit_code == 0) continue;
        if (std::filesystem::exists(out)) {
            CHECK(isColdtipFile(out));
            CHECK(answerOf(out).status == "running");
        }
        // A half-written checkpoint may be left as out.partial; the resume neither reads
        // nor keeps it.
        resumeToTheSameAnswer(folder, out, ref);
        CHECK_FALSE(std::filesystem::exists(out + ".partial"));
    }
}

TEST_CASE("SIGTERM stops a cooldown, averaged or plain, within 2 s with a readable file",
          "[cli][interrupt][cooldown]")
{
    TempFolder folder;
    for (const char* method : {"averaged", "plain"}) {
        const std::string out = folder.file(std::string(method) + ".h5");
        const pid_t pid = fork();
        if (pid == 0) {
            const std::string exe = COLDTIP_EXE;
            std::freopen("/dev/null", "w", stderr);
            if (std::string(method) == "plain")
                execl(exe.c_str(), exe.c_str(), "cooldown", COLDTIP_TEST_DATA "/cooldown/small-cold-head.yaml",
                      "-o", out.c_str(), "--quiet", "--plain", static_cast<char*>(nullptr));
            else
                execl(exe.c_str(), exe.c_str(), "cooldown", COLDTIP_TEST_DATA "/cooldown/small-cold-head.yaml",
                      "-o", out.c_str(), "--quiet", static_cast<char*>(nullptr));
            _exit(127);
        }
        // The small cold head's cooldown takes ten seconds and more: one second is inside it.
        std::this_thread::sleep_for(std::chrono::seconds(1));
        const auto sent = Clock::now();
        kill(pid, SIGTERM);
        const int code = exitCode(pid);
        const double seconds = std::chrono::duration<double>(Clock::now() - sent).count();
        INFO(method << ": exit " << code << " " << seconds << " s after SIGTERM");
        CHECK(code == 3);
        CHECK(seconds < 2.0);
        REQUIRE(isColdtipFile(out));
        CHECK(Hdf5Reader(out).stringAttribute("/cooldown", "status") == "interrupted");
    }
}
