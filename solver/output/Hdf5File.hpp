#pragma once
//! \file Hdf5File.hpp
//! A small writer over the HDF5 C++ API: groups by path, double datasets of rank 1 or 2 with
//! a `units` attribute on every one, string datasets, and scalar attributes. Files are
//! written whole to `PATH.partial` in the same folder, synced to disk and renamed over PATH
//! on commit() (then the folder is synced), so a reader (or a kill at any moment, SIGKILL
//! included) only ever sees the last complete file. A `PATH.partial` left by a killed
//! write is never read as a result; the next command writing PATH removes it
//! (checkOutputFile, OutputFile.hpp). Every file carries the root attribute `written_by`
//! ("coldtip VERSION"), by which coldtip knows a file it may overwrite.

#include <H5Cpp.h>
#include <string>
#include <vector>

namespace coldtip {

//! Root attribute naming the writer of every file coldtip writes.
extern const char* const kWrittenByAttribute;
//! Where a file is written before it is moved to `path`.
std::string partialPathOf(const std::string& path);

class Hdf5Writer {
public:
    //! Start a new file (written to `path + ".partial"` until commit()).
    explicit Hdf5Writer(std::string path);
    ~Hdf5Writer();
    Hdf5Writer(const Hdf5Writer&) = delete;
    Hdf5Writer& operator=(const Hdf5Writer&) = delete;

    //! Creates the group and its parents if missing.
    H5::Group group(const std::string& path);
    //! Rank-1 dataset of doubles with units.
    void write(const std::string& path, const std::vector<double>& values, const std::string& units);
    //! Rank-2 dataset (rows x cols, row-major) with units.
    void write(const std::string& path, const std::vector<double>& values, std::size_t rows,
               std::size_t cols, const std::string& units);
    void write(const std::string& path, const std::vector<long>& values, const std::string& units);
    void writeStrings(const std::string& path, const std::vector<std::string>& values);
    void attribute(const std::string& object, const std::string& name, double value);
    void attribute(const std::string& object, const std::string& name, long value);
    void attribute(const std::string& object, const std::string& name, const std::string& value);

    //! Close, sync and atomically move the file into place (std::runtime_error naming the
    //! path if that fails).
    void commit();

private:
    H5::DataSet create(const std::string& path, const H5::DataType& type,
                       const H5::DataSpace& space);
    void units(H5::DataSet& ds, const std::string& units);

    std::string m_path;
    std::string m_partial;
    H5::H5File m_file;
    bool m_committed = false;
};

//! Reader for what coldtip writes: datasets of doubles and attributes.
class Hdf5Reader {
public:
    explicit Hdf5Reader(const std::string& path);
    std::vector<double> doubles(const std::string& path) const;
    std::vector<std::size_t> shape(const std::string& path) const;
    std::string stringAttribute(const std::string& object, const std::string& name) const;
    double doubleAttribute(const std::string& object, const std::string& name) const;
    long longAttribute(const std::string& object, const std::string& name) const;
    std::vector<std::string> strings(const std::string& path) const;
    bool exists(const std::string& path) const;
    bool hasAttribute(const std::string& object, const std::string& name) const;

private:
    H5::H5File m_file;
};

} // namespace coldtip
