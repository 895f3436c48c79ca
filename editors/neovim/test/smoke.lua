-- Headless smoke test of editors/neovim/skerry.lua on Neovim 0.7:
--   nvim --headless -u NONE -c "luafile editors/neovim/test/smoke.lua"
-- Checks the filetype, comment settings and syntax of a sample, the choice of launcher, and
-- that the buffer attaches to a language server (a stub: editors/test/stub-lsp-server.mjs) and
-- shows the diagnostic it publishes. Prints "N passed, M failed"; exits non-zero on a failure.

local test_dir = vim.fn.fnamemodify(debug.getinfo(1, 'S').source:sub(2), ':p:h')
local editors = vim.fn.fnamemodify(test_dir, ':h:h')
local sample = editors .. '/vscode/test/samples/harbour_dawn.skerry'

local passed, failed = 0, 0
local function check(name, ok, detail)
  if ok then
    passed = passed + 1
  else
    failed = failed + 1
    io.stdout:write('FAIL ' .. name .. (detail and (': ' .. tostring(detail)) or '') .. '\n')
  end
end

local function finish()
  io.stdout:write(string.format('%d passed, %d failed\n', passed, failed))
  vim.cmd(failed == 0 and 'qa!' or 'cquit!')
end

local ok, skerry = pcall(dofile, editors .. '/neovim/skerry.lua')
check('skerry.lua loads', ok, skerry)
if not ok then
  finish()
end

-- Launcher choice: a checkout's bin/skerry wins over PATH; the setting wins over both.
local checkout = vim.fn.tempname()
vim.fn.mkdir(checkout .. '/bin', 'p')
vim.fn.mkdir(checkout .. '/examples/deep', 'p')
vim.fn.writefile({ '#!/bin/sh' }, checkout .. '/bin/skerry')
vim.fn.setfperm(checkout .. '/bin/skerry', 'rwxr-xr-x')
local nested = checkout .. '/examples/deep/a.skerry'
check('bin/skerry above the file is the launcher',
  vim.deep_equal(skerry.server_cmd(nested), { checkout .. '/bin/skerry', 'lsp' }),
  vim.inspect(skerry.server_cmd(nested)))
check('the checkout is the root', skerry.root_dir(nested) == checkout, skerry.root_dir(nested))
local elsewhere = vim.fn.tempname() .. '/b.skerry'
check('skerry on PATH otherwise', vim.deep_equal(skerry.server_cmd(elsewhere), { 'skerry', 'lsp' }))
vim.g.skerry_server_cmd = { 'node', editors .. '/test/stub-lsp-server.mjs' }
check('the setting wins', skerry.server_cmd(nested)[1] == 'node')
vim.fn.delete(checkout, 'rf')

-- Diagnostics: wrap the handler to know when the stub's list arrived.
local arrived = false
local publish = vim.lsp.handlers['textDocument/publishDiagnostics']
vim.lsp.handlers['textDocument/publishDiagnostics'] = function(err, result, ctx, config)
  publish(err, result, ctx, config)
  arrived = true
end

vim.cmd('syntax on')
vim.cmd('edit ' .. vim.fn.fnameescape(sample))
local buf = vim.api.nvim_get_current_buf()

check('filetype', vim.bo[buf].filetype == 'skerry', vim.bo[buf].filetype)
check('commentstring', vim.bo[buf].commentstring == '// %s', vim.bo[buf].commentstring)

local function syntax_at(line, text)
  local col = vim.fn.getline(line):find(text, 1, true)
  if col == nil then
    return 'text not found: ' .. text
  end
  return vim.fn.synIDattr(vim.fn.synID(line, col, 1), 'name')
end
local line_of = {}
for number, text in ipairs(vim.api.nvim_buf_get_lines(buf, 0, -1, false)) do
  line_of[#line_of + 1] = { number, text }
end
local function line_with(fragment)
  for _, entry in ipairs(line_of) do
    if entry[2]:find(fragment, 1, true) then
      return entry[1]
    end
  end
  return 1
end
for _, case in ipairs({
  { 'vehicle skiff', 'vehicle', 'skerryDeclaration' },
  { 'speed max 3 m/s', 'speed', 'skerryProperty' },
  { 'speed max 3 m/s', 'm/s', 'skerryUnit' },
  { 'accel max 1 m/s^2', 'm/s^2', 'skerryUnit' },
  { 'radius 0.5 m', '0.5', 'skerryNumber' },
  { 'horizon 40', 'horizon', 'skerryOption' },
  { 'gap 0.5%', '%', 'skerryPercent' },
  { 'start (2, 3) at rest', 'rest', 'skerryValue' },
  { 'minimize time + 0.1 fuel', 'fuel', 'skerryValue' },
  { 'minimize time + 0.1 fuel', '0.1', 'skerryNumber' },
  { '// point mass', '// point mass', 'skerryComment' },
}) do
  local got = syntax_at(line_with(case[1]), case[2])
  check('syntax of ' .. case[2], got == case[3], got)
end

arrived = vim.wait(10000, function()
  return arrived
end, 50)
check('diagnostics arrived from the server', arrived)
local clients = vim.lsp.buf_get_clients(buf)
local names = {}
for _, client in pairs(clients) do
  names[#names + 1] = client.name
end
check('buffer attached to the skerry client', vim.deep_equal(names, { 'skerry' }), vim.inspect(names))
local diagnostics = vim.diagnostic.get(buf)
check('one diagnostic', #diagnostics == 1, #diagnostics)
if #diagnostics == 1 then
  check('diagnostic code', diagnostics[1].code == 'stub-opened', diagnostics[1].code)
  check('diagnostic text', diagnostics[1].message:match('^stub server saw %d+ lines$') ~= nil, diagnostics[1].message)
end

-- A second buffer of the same project reuses the client.
vim.cmd('edit ' .. vim.fn.fnameescape(editors .. '/vscode/test/samples/shared_piers.skerry'))
local second = vim.lsp.buf_get_clients(0)
local first_id = next(clients)
check('one server per project', second[first_id] ~= nil, vim.inspect(vim.tbl_keys(second)))

finish()
