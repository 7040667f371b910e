// The nozzle solver of examples/nozzle decomposed over MPI: each process owns a run of grid
// points with one halo point on each side; the halos are exchanged on the state views'
// storage (data() of each component's field view), the time step and the largest Courant
// number are global reductions of typed quantities. Rank 0 gathers the steady solution,
// runs the serial solver on the whole grid and checks that both are equal, number for number
// (the same operations on the same values; a minimum and a maximum are exact in any order).
//
//   mpirun -np 2 ./nozzle_mpi        exit status 0 when the runs agree
#include <mpi.h>

#include <cstddef>
#include <cstdio>
#include <vector>

#include "nozzle/demo_case.hpp"
#include "nozzle/nozzle_flow.hpp"

namespace {

using namespace nondim;

class mpi_comm {
 public:
  explicit mpi_comm(MPI_Comm c) : comm_(c) {
    MPI_Comm_rank(c, &rank_);
    MPI_Comm_size(c, &size_);
  }
  [[nodiscard]] int rank() const { return rank_; }
  [[nodiscard]] int size() const { return size_; }

  /// Blocks of nearly equal size, in rank order.
  [[nodiscard]] nozzle::domain partition(std::size_t points) const {
    const auto p = static_cast<std::size_t>(size_), r = static_cast<std::size_t>(rank_);
    const std::size_t base = points / p, extra = points % p;
    return {r * base + (r < extra ? r : extra), base + (r < extra ? 1 : 0), points};
  }

  /// Fills the halo points of every component from the neighbours' owned points.
  void exchange(const nozzle::state_storage& w) const {
    exchange_component(w.get<nozzle::mass>());
    exchange_component(w.get<nozzle::momentum>());
    exchange_component(w.get<nozzle::energy>());
  }

  template <dimension D>
  quantity<D> global_min(quantity<D> q) const {
    return reduce(q, MPI_MIN);
  }
  template <dimension D>
  quantity<D> global_max(quantity<D> q) const {
    return reduce(q, MPI_MAX);
  }

 private:
  template <dimension D>
  quantity<D> reduce(quantity<D> q, MPI_Op op) const {
    double local = q.si(), global = 0.0;
    MPI_Allreduce(&local, &global, 1, MPI_DOUBLE, op, comm_);
    return quantity<D>::from_si(global);
  }

  /// One component, n = count + 2 values: [halo, owned..., halo].
  template <dimension D>
  void exchange_component(field_view<D> v) const {
    const int left = rank_ > 0 ? rank_ - 1 : MPI_PROC_NULL;
    const int right = rank_ + 1 < size_ ? rank_ + 1 : MPI_PROC_NULL;
    double* s = v.data();
    const std::size_t last = v.size() - 2;  // the last owned point
    MPI_Sendrecv(s + last, 1, MPI_DOUBLE, right, 0, s, 1, MPI_DOUBLE, left, 0, comm_, MPI_STATUS_IGNORE);
    MPI_Sendrecv(s + 1, 1, MPI_DOUBLE, left, 1, s + last + 1, 1, MPI_DOUBLE, right, 1, comm_, MPI_STATUS_IGNORE);
  }

  MPI_Comm comm_;
  int rank_ = 0, size_ = 1;
};

/// The owned values of every process, in rank order, on rank 0.
std::vector<double> gather(const std::vector<double>& mine, const mpi_comm& c) {
  const int n = static_cast<int>(mine.size());
  std::vector<int> counts(static_cast<std::size_t>(c.size())), offsets(counts.size());
  MPI_Gather(&n, 1, MPI_INT, counts.data(), 1, MPI_INT, 0, MPI_COMM_WORLD);
  int total = 0;
  for (std::size_t r = 0; r < counts.size(); ++r) {
    offsets[r] = total;
    total += counts[r];
  }
  std::vector<double> all(c.rank() == 0 ? static_cast<std::size_t>(total) : 0);
  MPI_Gatherv(mine.data(), n, MPI_DOUBLE, all.data(), counts.data(), offsets.data(), MPI_DOUBLE, 0, MPI_COMM_WORLD);
  return all;
}

}  // namespace

int main(int argc, char** argv) {
  MPI_Init(&argc, &argv);
  int status = 0;
  {
    const mpi_comm comm(MPI_COMM_WORLD);
    const nozzle::setup in = nozzle::demo_case(81, 3000);
    const nozzle::domain mine = comm.partition(in.points);
    if (mine.count < 3) {  // the boundary conditions read two points inside the domain
      if (comm.rank() == 0) std::fprintf(stderr, "nozzle_mpi: too many processes for %zu points\n", in.points);
      status = 2;
    } else {
      const nozzle::solution part = nozzle::run(in, mine, comm);
      const std::vector<double> rho = gather(part.rho, comm), v = gather(part.v, comm), p = gather(part.p, comm),
                                t = gather(part.t, comm);
      if (comm.rank() == 0) {
        nozzle::serial one;
        const nozzle::solution whole = nozzle::run(in, nozzle::serial::partition(in.points), one);
        std::size_t differing = 0;
        for (std::size_t i = 0; i < in.points; ++i)
          for (const bool same : {rho[i] == whole.rho[i], v[i] == whole.v[i], p[i] == whole.p[i], t[i] == whole.t[i]})
            differing += same ? 0 : 1;
        const bool courant_equal = part.largest_courant == whole.largest_courant;
        std::printf(
            "%d processes, %zu points, %zu steps: largest Courant number %.6f (serial %.6f); %zu of %zu values "
            "differ from the serial run\n",
            comm.size(), in.points, in.steps, part.largest_courant, whole.largest_courant, differing, 4 * in.points);
        status = (differing == 0 && courant_equal && comm.size() > 1) ? 0 : 1;
      }
    }
    MPI_Bcast(&status, 1, MPI_INT, 0, MPI_COMM_WORLD);
  }
  MPI_Finalize();
  return status;
}
