#include "solver/output/Hdf5File.hpp"

#include <cerrno>
#include <cstdio>
#include <cstring>
#include <fcntl.h>
#include <filesystem>
#include <stdexcept>
#include <unistd.h>

namespace coldtip {

namespace {
std::string parentOf(const std::string& path)
{
    const auto slash = path.find_last_of('/');
    return slash == 0 || slash == std::string::npos ? "/" : path.substr(0, slash);
}
std::string leafOf(const std::string& path) { return path.substr(path.find_last_of('/') + 1); }
//! HDF5 errors become exceptions with messages; the library's own stack printing is off.
const std::string& quiet(const std::string& path)
{
    H5::Exception::dontPrint();
    return path;
}
H5::H5File createFile(const std::string& path, const std::string& partial)
{
    try {
        return H5::H5File(quiet(partial), H5F_ACC_TRUNC);
    } catch (const H5::Exception& e) {
        throw std::runtime_error(path + ": cannot write " + partial + ": " + e.getDetailMsg());
    }
}
//! Push a file's (or folder's) data to the disk: a rename is only as durable as what it
//! names (POSIX fsync; the usual write-temporary, fsync, rename, fsync-folder sequence).
void syncToDisk(const std::string& path, const std::string& for_file)
{
    const int fd = ::open(path.c_str(), O_RDONLY);
    if (fd < 0 || ::fsync(fd) != 0) {
        const std::string why = std::strerror(errno);
        if (fd >= 0) ::close(fd);
        throw std::runtime_error(for_file + ": cannot sync " + path + " to disk: " + why);
    }
    ::close(fd);
}
} // namespace

const char* const kWrittenByAttribute = "written_by";

std::string partialPathOf(const std::string& path) { return path + ".partial"; }

Hdf5Writer::Hdf5Writer(std::string path)
    : m_path(std::move(path)), m_partial(partialPathOf(m_path)), m_file(createFile(m_path, m_partial))
{
    // The mark by which a later run knows the file as coldtip's own (OutputFile.hpp).
    try {
        attribute("/", kWrittenByAttribute, std::string("coldtip ") + COLDTIP_VERSION);
    } catch (const H5::Exception& e) {
        try {
            m_file.close();
        } catch (const H5::Exception&) {
        }
        std::remove(m_partial.c_str());
        throw std::runtime_error(m_path + ": cannot write " + m_partial + ": " + e.getDetailMsg());
    }
}

Hdf5Writer::~Hdf5Writer()
{
    if (m_committed) return;
    try {
        m_file.close();
    } catch (...) {
    }
    std::remove(m_partial.c_str());
}

H5::Group Hdf5Writer::group(const std::string& path)
{
    if (path == "/" || path.empty()) return m_file.openGroup("/");
    group(parentOf(path)); // parents first: nameExists fails on a missing parent
    if (m_file.nameExists(path)) return m_file.openGroup(path);
    return m_file.createGroup(path);
}

H5::DataSet Hdf5Writer::create(const std::string& path, const H5::DataType& type,
                               const H5::DataSpace& space)
{
    H5::Group g = group(parentOf(path));
    return g.createDataSet(leafOf(path), type, space);
}

void Hdf5Writer::units(H5::DataSet& ds, const std::string& u)
{
    H5::StrType st(H5::PredType::C_S1, u.empty() ? 1 : u.size());
    H5::Attribute a = ds.createAttribute("units", st, H5::DataSpace(H5S_SCALAR));
    a.write(st, u.empty() ? std::string(" ") : u);
}

void Hdf5Writer::write(const std::string& path, const std::vector<double>& values,
                       const std::string& u)
{
    write(path, values, values.size(), 1, u);
}

void Hdf5Writer::write(const std::string& path, const std::vector<double>& values,
                       std::size_t rows, std::size_t cols, const std::string& u)
{
    if (rows * cols != values.size())
        throw std::logic_error("Hdf5Writer: " + path + ": shape does not match the data");
    const hsize_t dims[2] = {rows, cols};
    H5::DataSpace space(cols == 1 ? 1 : 2, dims);
    H5::DataSet ds = create(path, H5::PredType::NATIVE_DOUBLE, space);
    if (!values.empty()) ds.write(values.data(), H5::PredType::NATIVE_DOUBLE);
    units(ds, u);
}

void Hdf5Writer::write(const std::string& path, const std::vector<long>& values,
                       const std::string& u)
{
    const hsize_t dims[1] = {values.size()};
    H5::DataSet ds = create(path, H5::PredType::NATIVE_LONG, H5::DataSpace(1, dims));
    if (!values.empty()) ds.write(values.data(), H5::PredType::NATIVE_LONG);
    units(ds, u);
}

void Hdf5Writer::writeStrings(const std::string& path, const std::vector<std::string>& values)
{
    std::vector<const char*> ptrs;
    for (const auto& s : values) ptrs.push_back(s.c_str());
    const hsize_t dims[1] = {values.size()};
    H5::StrType st(H5::PredType::C_S1, H5T_VARIABLE);
    H5::DataSet ds = create(path, st, H5::DataSpace(1, dims));
    if (!values.empty()) ds.write(ptrs.data(), st);
}

void Hdf5Writer::attribute(const std::string& path, const std::string& name, double value)
{
    H5::Group g = group(path);
    H5::Attribute a = g.createAttribute(name, H5::PredType::NATIVE_DOUBLE, H5::DataSpace(H5S_SCALAR));
    a.write(H5::PredType::NATIVE_DOUBLE, &value);
}

void Hdf5Writer::attribute(const std::string& path, const std::string& name, long value)
{
    H5::Group g = group(path);
    H5::Attribute a = g.createAttribute(name, H5::PredType::NATIVE_LONG, H5::DataSpace(H5S_SCALAR));
    a.write(H5::PredType::NATIVE_LONG, &value);
}

void Hdf5Writer::attribute(const std::string& path, const std::string& name,
                           const std::string& value)
{
    H5::Group g = group(path);
    H5::StrType st(H5::PredType::C_S1, value.empty() ? 1 : value.size());
    H5::Attribute a = g.createAttribute(name, st, H5::DataSpace(H5S_SCALAR));
    a.write(st, value.empty() ? std::string(" ") : value);
}

void Hdf5Writer::commit()
{
    try {
        m_file.flush(H5F_SCOPE_GLOBAL);
        m_file.close();
    } catch (const H5::Exception& e) {
        throw std::runtime_error(m_path + ": cannot write " + m_partial + ": " + e.getDetailMsg());
    }
    syncToDisk(m_partial, m_path);
    if (std::rename(m_partial.c_str(), m_path.c_str()) != 0)
        throw std::runtime_error("cannot move " + m_partial + " to " + m_path + ": " +
                                 std::strerror(errno));
    m_committed = true;
    const std::filesystem::path folder = std::filesystem::path(m_path).parent_path();
    syncToDisk(folder.empty() ? std::string(".") : folder.string(), m_path);
}

Hdf5Reader::Hdf5Reader(const std::string& path) : m_file(quiet(path), H5F_ACC_RDONLY) {}

bool Hdf5Reader::exists(const std::string& path) const
{
    // nameExists checks one link; walk the path so a missing parent is not an error.
    std::string sofar;
    std::size_t start = 1;
    while (start <= path.size()) {
        const auto slash = path.find('/', start);
        sofar = path.substr(0, slash == std::string::npos ? path.size() : slash);
        if (!m_file.nameExists(sofar)) return false;
        if (slash == std::string::npos) break;
        start = slash + 1;
    }
    return true;
}

bool Hdf5Reader::hasAttribute(const std::string& object, const std::string& name) const
{
    return exists(object) && m_file.openGroup(object).attrExists(name);
}

std::vector<std::size_t> Hdf5Reader::shape(const std::string& path) const
{
    H5::DataSet ds = m_file.openDataSet(path);
    H5::DataSpace sp = ds.getSpace();
    std::vector<hsize_t> dims(sp.getSimpleExtentNdims());
    sp.getSimpleExtentDims(dims.data());
    return {dims.begin(), dims.end()};
}

std::vector<double> Hdf5Reader::doubles(const std::string& path) const
{
    H5::DataSet ds = m_file.openDataSet(path);
    std::vector<double> v(ds.getSpace().getSimpleExtentNpoints());
    if (!v.empty()) ds.read(v.data(), H5::PredType::NATIVE_DOUBLE);
    return v;
}

std::vector<std::string> Hdf5Reader::strings(const std::string& path) const
{
    H5::DataSet ds = m_file.openDataSet(path);
    const hssize_t n = ds.getSpace().getSimpleExtentNpoints();
    std::vector<char*> ptrs(n);
    H5::StrType st(H5::PredType::C_S1, H5T_VARIABLE);
    if (n > 0) ds.read(ptrs.data(), st);
    std::vector<std::string> out(ptrs.begin(), ptrs.end());
    H5::DataSet::vlenReclaim(ptrs.data(), st, ds.getSpace());
    return out;
}

std::string Hdf5Reader::stringAttribute(const std::string& object, const std::string& name) const
{
    H5::Attribute a = m_file.openGroup(object).openAttribute(name);
    std::string s;
    a.read(a.getStrType(), s);
    return s;
}

double Hdf5Reader::doubleAttribute(const std::string& object, const std::string& name) const
{
    double v = 0.0;
    m_file.openGroup(object).openAttribute(name).read(H5::PredType::NATIVE_DOUBLE, &v);
    return v;
}

long Hdf5Reader::longAttribute(const std::string& object, const std::string& name) const
{
    long v = 0;
    m_file.openGroup(object).openAttribute(name).read(H5::PredType::NATIVE_LONG, &v);
    return v;
}

} // namespace coldtip
