# Reference values for the Pitman-Morgan test of a paired variance ratio, computed with base R only:
# the test is cor.test() of the sums and differences; the interval of the ratio var(after)/var(before) and
# the one-sided sd-growth bound are found by inverting that same test with uniroot() (not by the closed
# form the Java code uses), and the sd-growth p is cor.test(after/L + before, after/L - before,
# alternative = "less"). Run from this folder: Rscript make-pitman-morgan-values.R
set.seed(20261205)
h <- function(x) sprintf("%.17g", x)
cases <- list(
  list(id = "pm-12-tight", n = 12, rho = 0.9, ratio = 1.3, limit = 1.5),
  list(id = "pm-30", n = 30, rho = 0.6, ratio = 1.0, limit = 1.25),
  list(id = "pm-5", n = 5, rho = 0.5, ratio = 0.8, limit = 2.0),
  list(id = "pm-80-grow", n = 80, rho = 0.75, ratio = 1.6, limit = 1.2),
  list(id = "pm-20-neg", n = 20, rho = -0.4, ratio = 1.1, limit = 1.5)
)
rows <- c("id,alpha,limit,ratio,r_sd,t,p,ci_lower,ci_upper,growth_bound,growth_p")
srows <- c("id,i,before,after")
tstat <- function(a, b, lam) unname(cor.test(a / sqrt(lam) + b, a / sqrt(lam) - b)$statistic)
for (k in cases) {
  z1 <- rnorm(k$n); z2 <- rnorm(k$n)
  b <- 10 + 0.05 * z1
  a <- 10.01 + 0.05 * sqrt(k$ratio) * (k$rho * z1 + sqrt(1 - k$rho^2) * z2)
  b <- round(b, 5); a <- round(a, 5)
  for (i in seq_len(k$n)) srows <- c(srows, paste(k$id, i, h(b[i]), h(a[i]), sep = ","))
  for (alpha in c(0.05, 0.10)) {
    ct <- cor.test(a + b, a - b)
    f <- var(a) / var(b)
    tc <- qt(1 - alpha / 2, k$n - 2)
    lo <- uniroot(function(l) tstat(a, b, l) - tc, c(f / 1e4, f), tol = 1e-300, maxiter = 10000)$root
    hi <- uniroot(function(l) tstat(a, b, l) + tc, c(f, f * 1e4), tol = 1e-300, maxiter = 10000)$root
    t1 <- qt(1 - alpha, k$n - 2)
    gb <- sqrt(uniroot(function(l) tstat(a, b, l) + t1, c(f, f * 1e4), tol = 1e-300, maxiter = 10000)$root)
    L <- k$limit
    gp <- cor.test(a / L + b, a / L - b, alternative = "less")$p.value
    rows <- c(rows, paste(k$id, alpha, L, h(f), h(unname(ct$estimate)), h(unname(ct$statistic)), h(ct$p.value),
                          h(lo), h(hi), h(gb), h(gp), sep = ","))
  }
}
writeLines(c(paste0("# ", R.version.string, "; base R only; set.seed(20261205); cor.test of sums and differences; ",
                    "interval and bound by inverting cor.test with uniroot(tol = 1e-300)"), rows), "pm-values.csv")
writeLines(c(paste0("# ", R.version.string, "; set.seed(20261205); values rounded to 5 decimals, printed with %.17g"),
             srows), "pm-samples.csv")
