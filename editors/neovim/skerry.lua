-- Skerry for Neovim 0.7 and later: `*.skerry` files get the `skerry` filetype, comment settings,
-- the small syntax in syntax/skerry.vim beside this file, and the Skerry language server
-- (`skerry lsp`, LSP over stdio).
--
-- Load it from init.vim with `luafile /path/to/editors/neovim/skerry.lua`, or from init.lua with
-- `dofile('/path/to/editors/neovim/skerry.lua')`. Optional, before loading:
--   vim.g.skerry_server_cmd = { '/opt/skerry/bin/skerry', 'lsp' }
-- Without it the server is the nearest `bin/skerry` above the file (a Skerry checkout), and
-- otherwise `skerry` on PATH.
--
-- Written against the 0.7 API: vim.lsp.start_client + vim.lsp.buf_attach_client (there is no
-- vim.lsp.start and no vim.fs before 0.8).

local skerry = {}

-- syntax/skerry.vim lives beside this file; putting the folder on 'runtimepath' lets Vim's own
-- `:syntax` machinery load it in the right order.
local here = vim.fn.fnamemodify(debug.getinfo(1, 'S').source:sub(2), ':p:h')
if not vim.tbl_contains(vim.opt.runtimepath:get(), here) then
  vim.opt.runtimepath:append(here)
end

-- One server per project root: root directory -> client id.
skerry.clients = {}

local function file_dir(file)
  return vim.fn.fnamemodify(file, ':p:h')
end

-- The nearest executable `bin/skerry` at or above `dir`, as an absolute path, or nil.
local function find_launcher(dir)
  local found = vim.fn.findfile('bin/skerry', dir .. ';')
  if found ~= '' and vim.fn.executable(found) == 1 then
    return vim.fn.fnamemodify(found, ':p')
  end
  return nil
end

-- The command line that starts the server for `file`.
function skerry.server_cmd(file)
  local configured = vim.g.skerry_server_cmd
  if type(configured) == 'table' and #configured > 0 then
    return configured
  end
  local launcher = find_launcher(file_dir(file))
  if launcher then
    return { launcher, 'lsp' }
  end
  return { 'skerry', 'lsp' }
end

-- The project root for `file`: the checkout that holds bin/skerry, else the git work tree
-- (`.git` is a file in a linked work tree), else the file's own directory.
function skerry.root_dir(file)
  local dir = file_dir(file)
  local launcher = find_launcher(dir)
  if launcher then
    return vim.fn.fnamemodify(launcher, ':h:h')
  end
  local git = vim.fn.finddir('.git', dir .. ';')
  if git == '' then
    git = vim.fn.findfile('.git', dir .. ';')
  end
  if git ~= '' then
    return vim.fn.fnamemodify(git, ':p:h:h')
  end
  return dir
end

-- Starts (or reuses) the server of the buffer's project and attaches the buffer to it.
-- Returns the client id, or nil when the launcher cannot be run.
function skerry.attach(bufnr)
  local file = vim.api.nvim_buf_get_name(bufnr)
  local root = skerry.root_dir(file)
  local id = skerry.clients[root]
  if id == nil or vim.lsp.get_client_by_id(id) == nil then
    local cmd = skerry.server_cmd(file)
    if vim.fn.executable(cmd[1]) ~= 1 then
      vim.notify('skerry: cannot run "' .. cmd[1] .. '"; set vim.g.skerry_server_cmd', vim.log.levels.WARN)
      return nil
    end
    local started
    started = vim.lsp.start_client({
      name = 'skerry',
      cmd = cmd,
      root_dir = root,
      on_exit = function()
        if skerry.clients[root] == started then
          skerry.clients[root] = nil
        end
      end,
    })
    if started == nil then
      return nil
    end
    skerry.clients[root] = started
    id = started
  end
  vim.lsp.buf_attach_client(bufnr, id)
  return id
end

local group = vim.api.nvim_create_augroup('skerry', { clear = true })

vim.api.nvim_create_autocmd({ 'BufRead', 'BufNewFile' }, {
  group = group,
  pattern = '*.skerry',
  callback = function(args)
    vim.bo[args.buf].filetype = 'skerry'
  end,
})

vim.api.nvim_create_autocmd('FileType', {
  group = group,
  pattern = 'skerry',
  callback = function(args)
    vim.bo[args.buf].commentstring = '// %s'
    vim.bo[args.buf].comments = 's1:/*,mb:*,ex:*/,://,:#'
    skerry.attach(args.buf)
  end,
})

package.loaded['skerry'] = skerry
return skerry
