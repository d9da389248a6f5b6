#pragma once
//! \file CliSupport.hpp
//! Running the coldtip binary (COLDTIP_EXE) as a process from a test: a private temporary
//! folder, and a command's exit code with its captured stdout and stderr.

#include <sys/wait.h>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <stdexcept>
#include <string>

namespace coldtip::testing {

//! A fresh folder under the system's temporary directory, removed with its contents.
class TempFolder {
public:
    TempFolder()
    {
        std::string pattern =
            (std::filesystem::temp_directory_path() / "coldtip-test-XXXXXX").string();
        if (!mkdtemp(pattern.data())) throw std::runtime_error("mkdtemp failed");
        m_path = pattern;
    }
    ~TempFolder() { std::filesystem::remove_all(m_path); }
    TempFolder(const TempFolder&) = delete;
    TempFolder& operator=(const TempFolder&) = delete;

    const std::filesystem::path& path() const { return m_path; }
    //! Path of `name` inside the folder.
    std::string file(const std::string& name) const { return (m_path / name).string(); }
    //! Write `text` to `name` inside the folder; returns its path.
    std::string write(const std::string& name, const std::string& text) const
    {
        std::ofstream out(file(name), std::ios::binary);
        out << text;
        return file(name);
    }

private:
    std::filesystem::path m_path;
};

inline std::string readText(const std::string& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

//! What a finished process left.
struct ProcessResult {
    int exit_code = -1;
    std::string out, err;
};

//! Single-quoted for the shell.
inline std::string shellQuoted(const std::string& s)
{
    std::string q = "'";
    for (char c : s) q += c == '\'' ? std::string("'\\''") : std::string(1, c);
    return q + "'";
}

//! Runs `COLDTIP_EXE arguments` (arguments already quoted) with stdout and stderr captured
//! in files of `folder`.
inline ProcessResult runColdtip(const TempFolder& folder, const std::string& arguments)
{
    const std::string out = folder.file("stdout.txt"), err = folder.file("stderr.txt");
    const std::string command = shellQuoted(COLDTIP_EXE) + " " + arguments + " >" +
                                shellQuoted(out) + " 2>" + shellQuoted(err) + " </dev/null";
    const int status = std::system(command.c_str());
    ProcessResult r;
    r.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    r.out = readText(out);
    r.err = readText(err);
    std::filesystem::remove(out);
    std::filesystem::remove(err);
    return r;
}

} // namespace coldtip::testing
