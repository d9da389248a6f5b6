// Where a command writes (DESIGN.md §5, exit codes): an output that cannot be written, or
// whose writing would lose something (a folder, the case file, a file coldtip did not
// write), is refused before any work with exit 1, the path named on stderr and nothing
// written; a coldtip result may be overwritten, and a `.partial` left by a killed write is
// removed by the next command that writes there.
#include <catch2/catch.hpp>

#include <chrono>
#include <filesystem>
#include <fmt/format.h>

#include "solver/output/OutputFile.hpp"
#include "tests/solver/CliSupport.hpp"

using namespace coldtip::testing;

namespace {

constexpr int kBadInput = 1;

struct Refused {
    const char* name;
    std::string command; //!< run | cooldown | linear | compare
    std::string case_file;
    std::string output;  //!< {dir}: the test's folder, {case}: the case file itself
};

std::string expand(std::string s, const TempFolder& folder, const std::string& case_file)
{
    for (auto [key, value] : {std::pair<std::string, std::string>{"{dir}", folder.path().string()},
                              {"{case}", case_file}})
        for (std::size_t at; (at = s.find(key)) != std::string::npos;)
            s.replace(at, key.size(), value);
    return s;
}

double secondsOf(const std::chrono::steady_clock::time_point& t0)
{
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
}

} // namespace

TEST_CASE("an output that cannot be written or would lose a file is refused before any work",
          "[cli][output]")
{
    const std::string steady = COLDTIP_TEST_DATA "/steady/small-regenerator.yaml";
    const std::string cooldown = COLDTIP_TEST_DATA "/cooldown/small-cold-head.yaml";
    const std::string linear = COLDTIP_TEST_DATA "/linear/ideal-pulse-tube.yaml";
    // clang-format off
    const std::vector<Refused> table = {
        {"missing folder", "run", steady, "{dir}/no-such-folder/r.h5"},
        {"folder under a regular file", "run", steady, "{dir}/plain.txt/r.h5"},
        {"a system file's 'folder'", "run", steady, "/etc/hostname/r.h5"},
        {"a pseudo file system", "run", steady, "/proc/coldtip-r.h5"},
        {"an existing folder", "run", steady, "{dir}/folder"},
        {"a file coldtip did not write", "run", steady, "{dir}/foreign.h5"},
        {"the case file itself", "run", "{case}", "{case}"},
        {"the case file by another path", "run", "{case}", "{dir}/./case.yaml"},
        {"cooldown over a foreign file", "cooldown", cooldown, "{dir}/foreign.h5"},
        {"cooldown over its case file", "cooldown", "{case}", "{case}"},
        {"cooldown into a missing folder", "cooldown", cooldown, "{dir}/no-such-folder/c.h5"},
        {"linear over a foreign file", "linear", linear, "{dir}/foreign.h5"},
        {"linear over its case file", "linear", "{case}", "{case}"},
        {"compare over a foreign file", "compare", linear, "{dir}/foreign.h5"},
        {"compare into an existing folder", "compare", linear, "{dir}/folder"},
    };
    // clang-format on
    for (const Refused& r : table) {
        SECTION(r.name)
        {
            TempFolder folder;
            const std::string case_copy =
                folder.write("case.yaml", readText(r.case_file == "{case}" ? steady : r.case_file));
            const std::string foreign_text = "not a result: a user's notes\n";
            folder.write("foreign.h5", foreign_text);
            folder.write("plain.txt", "a regular file\n");
            std::filesystem::create_directory(folder.file("folder"));
            const std::string case_file = expand(r.case_file, folder, case_copy);
            const std::string output = expand(r.output, folder, case_copy);
            const std::string case_text = readText(case_file);
            const auto before = std::filesystem::directory_iterator(folder.path());
            const std::size_t entries = std::distance(before, {});

            const auto t0 = std::chrono::steady_clock::now();
            const ProcessResult p = runColdtip(
                folder, fmt::format("{} {} -o {} --quiet", r.command, shellQuoted(case_file),
                                    shellQuoted(output)));
            const double seconds = secondsOf(t0);
            INFO(r.command << " -o " << output << ": exit " << p.exit_code << ", stderr: " << p.err);
            CHECK(p.exit_code == kBadInput);
            CHECK(p.err.find(output) != std::string::npos); // the path is named
            CHECK(p.err.find("nothing was written") != std::string::npos);
            CHECK(seconds < 5.0); // refused before computing (the runs take longer)
            // Nothing written: the files are as they were, nothing new in the folder.
            CHECK(readText(case_file) == case_text);
            CHECK(readText(folder.file("foreign.h5")) == foreign_text);
            CHECK(std::filesystem::is_directory(folder.file("folder")));
            CHECK(std::filesystem::is_empty(folder.file("folder")));
            CHECK(std::size_t(std::distance(std::filesystem::directory_iterator(folder.path()),
                                            {})) == entries);
        }
    }
}

TEST_CASE("plot refuses an output folder that is a file", "[cli][output]")
{
    TempFolder folder;
    const std::string file = folder.write("plots", "a regular file\n");
    const ProcessResult p =
        runColdtip(folder, fmt::format("plot {} -o {}", shellQuoted(folder.file("r.h5")),
                                       shellQuoted(file)));
    INFO(p.err);
    CHECK(p.exit_code == kBadInput);
    CHECK(p.err.find(file) != std::string::npos);
    CHECK(readText(file) == "a regular file\n");
}

TEST_CASE("a coldtip result is overwritten, and a killed write's leftover is removed",
          "[cli][output]")
{
    TempFolder folder;
    const std::string out = folder.file("r.h5");
    const std::string leftover = out + ".partial";
    folder.write("r.h5.partial", "half an HDF5 file of a killed write");
    // Two cycles: not converged (exit 2), but a complete result file.
    const std::string args = fmt::format("run {} -o {} --max-cycles 2 --quiet",
                                         shellQuoted(COLDTIP_TEST_DATA "/steady/small-regenerator.yaml"),
                                         shellQuoted(out));
    const ProcessResult first = runColdtip(folder, args);
    INFO(first.err);
    CHECK(first.exit_code == 2);
    CHECK(coldtip::isColdtipFile(out));
    CHECK_FALSE(std::filesystem::exists(leftover));
    const ProcessResult second = runColdtip(folder, args);
    INFO(second.err);
    CHECK(second.exit_code == 2);
    CHECK(coldtip::isColdtipFile(out));
    CHECK_FALSE(coldtip::isColdtipFile(folder.write("text.h5", "\x89HDF\r\n\x1a\n but not HDF5")));
}
