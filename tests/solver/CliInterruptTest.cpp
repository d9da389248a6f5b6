// An interrupted run exits 3 and leaves a readable, resumable result file; --resume then
// continues from the saved state to the periodic steady state.
#include <catch2/catch.hpp>

#include <chrono>
#include <csignal>
#include <cstdio>
#include <fmt/format.h>
#include <fstream>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

#include "solver/output/Hdf5File.hpp"

using namespace coldtip;

namespace {

//! Start `coldtip run` on `case_file` writing `out`; returns the child's pid.
pid_t startRun(const std::string& case_file, const std::string& out)
{
    const pid_t pid = fork();
    if (pid == 0) {
        const std::string exe = COLDTIP_EXE;
        execl(exe.c_str(), exe.c_str(), "run", case_file.c_str(), "-o", out.c_str(), "--quiet",
              static_cast<char*>(nullptr));
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

} // namespace

TEST_CASE("an interrupted run exits 3 with a readable file that --resume continues",
          "[cli]")
{
    // Plain integration of the small regenerator takes thousands of cycles: long enough to
    // be interrupted after a second.
    const std::string plain = "interrupt-test-case.yaml";
    {
        std::ifstream in(COLDTIP_TEST_DATA "/steady/small-regenerator.yaml");
        std::ofstream outfile(plain);
        std::string line;
        while (std::getline(in, line)) {
            if (line.find("steady:") != std::string::npos)
                line = "  steady: {method: plain, max_cycles: 20000}";
            outfile << line << "\n";
        }
    }
    const std::string out = "interrupt-test.h5";
    std::remove(out.c_str());
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
    // Resume with the accelerated solver: it starts from the saved state and converges.
    const std::string resume = fmt::format("{} run {}/steady/small-regenerator.yaml -o {} "
                                           "--resume --quiet",
                                           COLDTIP_EXE, COLDTIP_TEST_DATA, out);
    const int status = std::system(resume.c_str());
    REQUIRE(WIFEXITED(status));
    CHECK(WEXITSTATUS(status) == 0);
    Hdf5Reader r(out);
    CHECK(r.stringAttribute("/summary", "status") == "converged");
    CHECK(r.longAttribute("/state", "period_index") > cycles);
    std::remove(out.c_str());
    std::remove(plain.c_str());
}
