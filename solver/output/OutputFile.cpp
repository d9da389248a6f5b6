#include "solver/output/OutputFile.hpp"

#include <H5Cpp.h>
#include <array>
#include <cerrno>
#include <cstring>
#include <fcntl.h>
#include <filesystem>
#include <fstream>
#include <unistd.h>

#include "solver/input/InputError.hpp"
#include "solver/output/Hdf5File.hpp"

namespace coldtip {

namespace fs = std::filesystem;

namespace {

[[noreturn]] void refuse(const std::string& path, const std::string& problem,
                         const std::string& expected)
{
    throw input::InputError({path, 0, 0, ""}, problem + "; nothing was written", expected);
}

//! The folder a file goes to ("." for a bare name).
fs::path folderOf(const fs::path& path)
{
    const fs::path parent = path.parent_path();
    return parent.empty() ? fs::path(".") : parent;
}

//! Create and remove `probe`: the one test of writability that holds for root, read-only
//! mounts and pseudo file systems alike (permission bits do not).
void probeWrite(const std::string& path, const fs::path& probe, const std::string& expected)
{
    const int fd = ::open(probe.c_str(), O_WRONLY | O_CREAT | O_TRUNC, 0644);
    if (fd < 0)
        refuse(path, "cannot write in the folder " + folderOf(probe).string() + ": " +
                         std::strerror(errno),
               expected);
    ::close(fd);
    ::unlink(probe.c_str());
}

} // namespace

bool isColdtipFile(const std::string& path)
{
    // The HDF5 format signature at offset 0 (coldtip writes no user block).
    static constexpr std::array<char, 8> kSignature = {'\x89', 'H', 'D', 'F', '\r', '\n', '\x1a', '\n'};
    std::array<char, 8> head{};
    std::ifstream in(path, std::ios::binary);
    if (!in.read(head.data(), head.size()) || head != kSignature) return false;
    try {
        H5::Exception::dontPrint();
        const H5::H5File file(path, H5F_ACC_RDONLY);
        auto startsWithColdtip = [](const H5::Attribute& a) {
            std::string s;
            a.read(a.getStrType(), s);
            return s.rfind("coldtip", 0) == 0;
        };
        const H5::Group root = file.openGroup("/");
        if (root.attrExists(kWrittenByAttribute))
            return startsWithColdtip(root.openAttribute(kWrittenByAttribute));
        // Files written before the mark: the /case group's tool version.
        if (file.nameExists("case")) {
            const H5::Group c = file.openGroup("/case");
            if (c.attrExists("tool_version")) return startsWithColdtip(c.openAttribute("tool_version"));
        }
    } catch (const H5::Exception&) {
    }
    return false;
}

void checkOutputFile(const std::string& path, const std::vector<std::string>& inputs)
{
    const std::string expected = "a new file name, or a coldtip result file, in a folder "
                                 "that exists and can be written";
    if (path.empty()) refuse(path, "the output file name is empty", expected);
    std::error_code ec;
    const fs::file_status st = fs::status(path, ec);
    const bool exists = fs::exists(st);
    if (exists && fs::is_directory(st))
        refuse(path, "the output is a folder, not a file", "a file name, e.g. " +
                                                            (fs::path(path) / "result.h5").string());
    if (exists && !fs::is_regular_file(st))
        refuse(path, "the output exists and is not a regular file", expected);
    for (const std::string& input : inputs)
        if (exists && !input.empty() && fs::equivalent(path, input, ec))
            refuse(path, "the output is the input file " + input + " itself",
                   "another name for the result, e.g. the default (the case name + .h5)");
    if (exists && !isColdtipFile(path))
        refuse(path, "the file exists and is not a coldtip result; it is not overwritten",
               "a new file name, or remove the file first");
    const fs::path folder = folderOf(path);
    const fs::file_status fst = fs::status(folder, ec);
    if (!fs::exists(fst)) refuse(path, "the folder " + folder.string() + " does not exist", expected);
    if (!fs::is_directory(fst)) refuse(path, folder.string() + " is not a folder", expected);
    // The probe is the writer's own temporary name: a leftover of a killed write goes too.
    probeWrite(path, partialPathOf(path), expected);
}

void checkOutputFolder(const std::string& path)
{
    const std::string expected = "a folder that exists or can be created, and can be written";
    std::error_code ec;
    fs::path p = path.empty() ? fs::path(".") : fs::path(path);
    const fs::file_status st = fs::status(p, ec);
    if (fs::exists(st) && !fs::is_directory(st))
        refuse(path, "the output for the plots is a file, not a folder", expected);
    // The nearest folder that exists must take new entries.
    fs::path existing = p;
    while (!fs::exists(existing, ec)) {
        if (!existing.has_parent_path() || existing.parent_path() == existing) {
            existing = ".";
            break;
        }
        existing = existing.parent_path();
    }
    if (!fs::is_directory(existing, ec))
        refuse(path, existing.string() + " is not a folder", expected);
    probeWrite(path, existing / ".coldtip-write-probe", expected);
}

} // namespace coldtip
