#pragma once
//! \file OutputFile.hpp
//! Before any work, a command that writes a file makes sure the file can be written and
//! that writing it loses nothing: the folder exists and takes a file, the path is not a
//! folder, not one of the command's own inputs (the case file), and not an existing file
//! that coldtip did not write (a coldtip file carries the HDF5 signature and the root
//! attribute `written_by`, Hdf5File.hpp). A refusal is bad input (exit 1) naming the path,
//! with nothing written. A `PATH.partial` left by a killed write is removed here.

#include <string>
#include <vector>

namespace coldtip {

//! Throws input::InputError naming `path` if the result may not be written there.
//! `inputs`: the files the command reads (never overwritten; empty entries ignored).
void checkOutputFile(const std::string& path, const std::vector<std::string>& inputs);

//! The same for a folder that will receive files (created if missing).
void checkOutputFolder(const std::string& path);

//! True if `path` is an HDF5 file written by coldtip.
bool isColdtipFile(const std::string& path);

} // namespace coldtip
